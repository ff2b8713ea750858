import { z } from 'zod';
import { ROLES, type Role } from '../roles';
import { email, newPassword, personName } from './auth';

export const DEFAULT_DAYS_BEFORE = 2;
export const DEFAULT_REMINDER_HOUR = 8;

export const notificationPatch = z
  .object({
    emailReminders: z.boolean({ error: 'Choose on or off.' }).optional(),
    weeklyDigest: z.boolean({ error: 'Choose on or off.' }).optional(),
    reminderHour: z.number({ error: 'Choose an hour.' }).int('Choose a whole hour.').min(0, 'Choose an hour from 0 to 23.').max(23, 'Choose an hour from 0 to 23.').optional(),
    daysBefore: z.number({ error: 'Choose how many days before.' }).int('Use whole days.').min(1, 'Use at least 1 day.').max(14, 'Use at most 14 days.').optional(),
  })
  .strict();
export type NotificationPatch = z.infer<typeof notificationPatch>;

export interface NotificationSettings {
  emailReminders: boolean;
  weeklyDigest: boolean;
  reminderHour: number;
  daysBefore: number;
  /** how many browsers of this person receive push notifications */
  pushDevices: number;
}

const base64url = (what: string) => z.string({ error: `The subscription has no ${what} key.` }).regex(/^[A-Za-z0-9_-]+={0,2}$/, `The ${what} key is not base64url.`);

/** What PushSubscription.toJSON() gives in a browser. */
export const pushSubscriptionBody = z.object({
  endpoint: z.url({ protocol: /^https$/, error: 'A push endpoint must be an https:// address.' }).max(2000),
  expirationTime: z.number().nullable().optional(),
  // A P-256 public key is 65 bytes starting 0x04 (87 base64url characters from 'B'); the auth secret is 16 bytes.
  keys: z.object({
    p256dh: base64url('p256dh').regex(/^B[A-Za-z0-9_-]{86}=?$/, 'The p256dh key must be a 65-byte P-256 public key.'),
    auth: base64url('auth').regex(/^[A-Za-z0-9_-]{22}(==)?$/, 'The auth secret must be 16 bytes.'),
  }),
});
export type PushSubscriptionBody = z.infer<typeof pushSubscriptionBody>;

export const pushUnsubscribeBody = z.object({ endpoint: z.string().min(1, 'Say which subscription to remove.').max(2000) });

export const invitationBody = z.object({ email, role: z.enum(ROLES, { error: 'Choose keeper, cook or helper.' }) }).strict();
export type InvitationBody = z.infer<typeof invitationBody>;

/** Signed in: no body. Signed out: a new account for the invited address. */
export const acceptInvitationBody = z.union([z.object({}).strict(), z.object({ name: personName, password: newPassword }).strict()]);

export interface InvitationView {
  id: string;
  email: string;
  role: Role;
  invitedBy: string | null;
  expiresAt: string;
  createdAt: string;
}

export interface AcceptedInvitation {
  householdId: string;
  householdName: string;
  role: Role;
}

export interface FridgeJar {
  jarId: string;
  code: string;
  productId: string;
  productName: string;
  productColour: string;
  openedOn: string;
  useBy: string;
  daysOpen: number;
  /** negative once the use-by has passed */
  daysLeft: number;
  unsealed: boolean;
  capacityTbsp: number;
  remainingTbsp: number;
  /** what the week's plan takes from this jar before its use-by */
  plannedTbsp: number;
  /** what will be left on the use-by day: the plan's estimate, or what is in the jar when nothing is planned */
  estimateTbsp: number;
  estimateFrom: 'plan' | 'jar';
}

export interface FridgeView {
  today: string;
  jars: FridgeJar[];
  unsealedAdvice: string;
}

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
