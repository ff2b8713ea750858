import { z } from 'zod';
import { LIMITS } from './limits';

export const email = z
  .string({ error: 'Enter an e-mail address.' })
  .trim()
  .toLowerCase()
  .max(254, 'That e-mail address is too long.')
  .pipe(z.email({ error: 'Enter an e-mail address like name@example.com.' }));

export const newPassword = z
  .string({ error: 'Choose a password.' })
  .min(10, 'Use at least 10 characters for your password.')
  .max(200, 'Use at most 200 characters for your password.');

export const personName = z
  .string({ error: 'Enter your name.' })
  .trim()
  .min(1, 'Enter your name.')
  .max(LIMITS.length.personName, `Use at most ${LIMITS.length.personName} characters.`);

export const householdName = z
  .string({ error: 'Name your household.' })
  .trim()
  .min(1, 'Name your household.')
  .max(LIMITS.length.householdName, `Use at most ${LIMITS.length.householdName} characters.`);

export const signupBody = z.object({ email, password: newPassword, name: personName, householdName });
export type SignupBody = z.infer<typeof signupBody>;

/** The answer to every sign-up, whether or not the address has an account: the link is in the mail. */
export interface SignUpSent {
  email: string;
  message: string;
}

export const signUpToken = z.object({
  token: z
    .string({ error: 'That sign-up link is not complete.' })
    .min(20, 'That sign-up link is not complete.')
    .max(100),
});

export const loginBody = z.object({
  email: z
    .string({ error: 'Enter your e-mail address.' })
    .trim()
    .toLowerCase()
    .min(1, 'Enter your e-mail address.')
    .max(254),
  password: z.string({ error: 'Enter your password.' }).min(1, 'Enter your password.').max(200),
});
export type LoginBody = z.infer<typeof loginBody>;

export interface PublicUser {
  id: string;
  email: string;
  name: string;
}

export interface MembershipSummary {
  householdId: string;
  householdName: string;
  role: import('../roles').Role;
}

export interface MeResponse {
  user: PublicUser;
  memberships: MembershipSummary[];
}
