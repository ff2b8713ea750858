import { Router } from 'express';
import { currentMembership, householdAccess } from '../auth/guards';
import type { AppContext } from '../context';
import { AppError } from '../http/errors';
import { mailboxAddresses, readCaughtMail } from '../services/caught-mail';

/**
 * Development only (never mounted in production): what the local mail catcher received for the
 * household's members or the keeper reading it.
 */
export function devMailRouter(ctx: AppContext) {
  const router = Router({ mergeParams: true });
  router.get('/dev/mail', householdAccess('manage'), async (req, res) => {
    const dir = ctx.config.mail.catcherDir;
    if (!dir)
      throw new AppError(
        404,
        'not_found',
        'The caught-mail page exists only in development, with the local mail catcher running.',
      );
    res.json({
      messages: await readCaughtMail(dir, await mailboxAddresses(currentMembership(req).householdId, req.user!.email)),
    });
  });
  return router;
}
