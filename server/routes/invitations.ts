import { Router } from 'express';
import { z } from 'zod';
import { acceptInvitationBody, invitationBody } from '../../shared/schemas/invitations';
import { currentMembership, householdAccess } from '../auth/guards';
import type { AppContext } from '../context';
import { AppError } from '../http/errors';
import { body, params } from '../http/validate';
import { accept, invite, listPending, revoke } from '../services/invitations';
import { signIn } from './auth';

/** A keeper's invitations, under /api/households/:hid. */
export function householdInvitationsRouter(ctx: AppContext) {
  const router = Router({ mergeParams: true });

  router.get('/invitations', householdAccess('manage'), async (req, res) => {
    res.json({ invitations: await listPending(currentMembership(req).householdId) });
  });

  router.post('/invitations', householdAccess('manage'), async (req, res) => {
    const invitation = await invite(ctx, currentMembership(req).household, req.user!, body(req, invitationBody));
    res.status(201).json({ invitation });
  });

  router.delete('/invitations/:id', householdAccess('manage'), async (req, res) => {
    const { id } = params(req, z.object({ id: z.uuid({ error: 'That invitation was not found.' }) }).loose());
    await revoke(currentMembership(req).householdId, id);
    res.status(204).end();
  });

  return router;
}

/** /api/invitations/:token/accept: public, because the invitee may not have an account yet. */
export function acceptInvitationRouter(ctx: AppContext) {
  const router = Router();
  router.post('/:token/accept', async (req, res) => {
    const { token } = params(req, z.object({ token: z.string().min(20).max(100) }));
    const input = body(req, acceptInvitationBody);
    if (!req.user && !('password' in input)) {
      throw new AppError(401, 'signed_out', 'Sign in to join, or choose a name and password to create your account.');
    }
    const { accepted, user } = await accept(ctx, token, req.user ? { user: req.user } : (input as { name: string; password: string }));
    if (!req.user) await signIn(req, user);
    res.json({ invitation: accepted });
  });
  return router;
}
