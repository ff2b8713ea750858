import { z } from 'zod';

export const DEFAULT_DAYS_BEFORE = 2;
export const DEFAULT_REMINDER_HOUR = 8;

export const notificationPatch = z
  .object({
    emailReminders: z.boolean({ error: 'Choose on or off.' }).optional(),
    weeklyDigest: z.boolean({ error: 'Choose on or off.' }).optional(),
    reminderHour: z
      .number({ error: 'Choose an hour.' })
      .int('Choose a whole hour.')
      .min(0, 'Choose an hour from 0 to 23.')
      .max(23, 'Choose an hour from 0 to 23.')
      .optional(),
    daysBefore: z
      .number({ error: 'Choose how many days before.' })
      .int('Use whole days.')
      .min(1, 'Use at least 1 day.')
      .max(14, 'Use at most 14 days.')
      .optional(),
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

const base64url = (what: string) =>
  z
    .string({ error: `The subscription has no ${what} key.` })
    .regex(/^[A-Za-z0-9_-]+={0,2}$/, `The ${what} key is not base64url.`);

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

export const pushUnsubscribeBody = z.object({
  endpoint: z.string().min(1, 'Say which subscription to remove.').max(2000),
});
