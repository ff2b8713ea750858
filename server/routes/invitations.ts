import { Router } from 'express';
import { z } from 'zod';
import { acceptInvitationBody, invitationBody } from '../../shared/schemas/invitations';
import { currentMembership, householdAccess } from '../auth/guards';
import type { AppContext } from '../context';
import { AppError } from '../http/errors';
import { byPerson, limit, MINUTE, passwordHashingLimit } from '../http/rate-limits';
import { body, params } from '../http/validate';
import { accept, invite, listPending, preview, revoke } from '../services/invitations';
import { signIn } from './auth';

/** A keeper's invitations, under /api/households/:hid. */
export function householdInvitationsRouter(ctx: AppContext) {
  const router = Router({ mergeParams: true });
  // Each invitation sends an e-mail: a day's worth per person, per address and per invited address.
  const perPerson = limit(ctx.sequelize, 'invitations-person', {
    windowMs: 24 * 60 * MINUTE,
    limit: 30,
    what: 'invitations today',
    key: byPerson,
  });
  const perAddress = limit(ctx.sequelize, 'invitations-address', {
    windowMs: 24 * 60 * MINUTE,
    limit: 100,
    what: 'invitations from this network today',
  });
  const perInvitee = limit(ctx.sequelize, 'invitations-invitee', {
    windowMs: 24 * 60 * MINUTE,
    limit: 5,
    what: 'invitations to that address today',
    key: (req) => (typeof req.body?.email === 'string' ? `invitee:${req.body.email.trim().toLowerCase()}` : undefined),
  });

  router.get('/invitations', householdAccess('manage'), async (req, res) => {
    res.json({ invitations: await listPending(currentMembership(req).householdId) });
  });

  router.post('/invitations', householdAccess('manage'), perPerson, perAddress, perInvitee, async (req, res) => {
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

const tokenParams = z.object({ token: z.string().min(20).max(100) });

/** /api/invitations/:token: public, because the invitee may not have an account yet. */
export function acceptInvitationRouter(ctx: AppContext, options: { authLimit: number }) {
  const router = Router();
  // Tokens are 32 random bytes; the limit keeps guessing, and the hashing behind a new account, slow.
  const lookups = limit(ctx.sequelize, 'invitation-lookup', {
    windowMs: 15 * MINUTE,
    limit: 100,
    what: 'invitation look-ups',
  });
  const hashing = passwordHashingLimit(ctx.sequelize, options.authLimit);

  router.get('/:token', lookups, async (req, res) => {
    const { token } = params(req, tokenParams);
    res.json({ invitation: await preview(token) });
  });

  router.post('/:token/accept', hashing, async (req, res) => {
    const { token } = params(req, tokenParams);
    const input = body(req, acceptInvitationBody);
    if (!req.user && !('password' in input)) {
      throw new AppError(401, 'signed_out', 'Sign in to join, or choose a name and password to create your account.');
    }
    const who = req.user
      ? { user: req.user, confirmOtherAddress: 'confirmOtherAddress' in input && input.confirmOtherAddress === true }
      : (input as { name: string; password: string });
    const { accepted, user } = await accept(ctx, token, who);
    if (!req.user) await signIn(req, user);
    res.json({ invitation: accepted });
  });
  return router;
}
