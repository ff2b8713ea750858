import nodemailer from 'nodemailer';
import type { Config } from '../../config';

export interface MailMessage {
  to: string;
  subject: string;
  text: string;
  html: string;
  /** a fixed Message-ID, so a retried send is recognisably the same message */
  messageId?: string;
}

export interface Mailer {
  /** false when SMTP_HOST is not set: nothing can be sent, and callers say so */
  readonly enabled: boolean;
  send(message: MailMessage): Promise<void>;
  close(): void;
}

/** Sends through the SMTP server in the configuration: the local catcher in development and tests. */
export function createMailer(config: Config): Mailer {
  const { host, port, secure, user, pass, from } = config.mail;
  if (!host) {
    return {
      enabled: false,
      send: async () => {
        throw new Error('E-mail is not set up: set SMTP_HOST (and SMTP_PORT, SMTP_USER, SMTP_PASS, SMTP_FROM).');
      },
      close: () => {},
    };
  }
  const transport = nodemailer.createTransport({
    host,
    port,
    secure,
    auth: user ? { user, pass } : undefined,
    connectionTimeout: 10_000,
    greetingTimeout: 10_000,
  });
  return {
    enabled: true,
    async send(message) {
      await transport.sendMail({ from, ...message });
    },
    close: () => transport.close(),
  };
}
