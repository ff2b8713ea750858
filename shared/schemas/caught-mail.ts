/** A message the local mail catcher kept (development and tests only). */
export interface CaughtMail {
  id: string;
  receivedAt: string;
  from: string;
  to: string[];
  subject: string;
  text: string;
  html: string;
}
