import { Router } from 'express';
import { householdAccess } from '../auth/guards';
import type { AppContext } from '../context';
import { AppError } from '../http/errors';
import { readCaughtMail } from '../services/caught-mail';

/** Development only: what the local mail catcher received, for a keeper to read. */
export function devMailRouter(ctx: AppContext) {
  const router = Router({ mergeParams: true });
  router.get('/dev/mail', householdAccess('manage'), async (_req, res) => {
    const dir = ctx.config.mail.catcherDir;
    if (ctx.config.isProduction || !dir) throw new AppError(404, 'not_found', 'The caught-mail page exists only in development, with the local mail catcher running.');
    res.json({ messages: await readCaughtMail(dir) });
  });
  return router;
}
