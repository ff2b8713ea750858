import { z } from 'zod';
import { ROLES, type Role } from '../roles';
import { email, newPassword, personName } from './auth';

export const invitationBody = z
  .object({ email, role: z.enum(ROLES, { error: 'Choose keeper, cook or helper.' }) })
  .strict();
export type InvitationBody = z.infer<typeof invitationBody>;

/**
 * Signed in: no body, or `confirmOtherAddress` to join with an account whose address is not the
 * invited one. Signed out: a new account for the invited address.
 */
export const acceptInvitationBody = z.union([
  z.object({ confirmOtherAddress: z.literal(true).optional() }).strict(),
  z.object({ name: personName, password: newPassword }).strict(),
]);

/** The invitation page's view of a link, before joining. */
export interface InvitationPreview {
  householdName: string;
  inviterName: string | null;
  /** the address the invitation was sent to */
  email: string;
  role: Role;
  state: 'pending' | 'used' | 'expired' | 'withdrawn';
  expiresAt: string;
  /** why the link no longer works, when it does not */
  message: string | null;
}

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
