import { z } from 'zod';
import { ROLES, type Role } from '../roles';
import { email, newPassword, personName } from './auth';

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
