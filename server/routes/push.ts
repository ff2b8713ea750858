import { Router } from 'express';
import { pushSubscriptionBody, pushUnsubscribeBody } from '../../shared/schemas/notifications';
import { requireUser } from '../auth/guards';
import type { AppContext } from '../context';
import { AppError } from '../http/errors';
import { body } from '../http/validate';
import { removeSubscription, saveSubscription, subscriptionsOf } from '../services/push/subscriptions';

/** /api/push: the VAPID public key, this person's browser subscriptions and a test notification. */
export function pushRouter(ctx: AppContext) {
  const router = Router();

  router.get('/public-key', async (_req, res) => {
    res.json({ publicKey: await ctx.push.publicKey() });
  });

  router.post('/subscriptions', requireUser, async (req, res) => {
    await saveSubscription(req.user!.id, body(req, pushSubscriptionBody), req.get('user-agent') ?? '');
    res.status(201).json({ subscribed: true });
  });

  router.delete('/subscriptions', requireUser, async (req, res) => {
    await removeSubscription(req.user!.id, body(req, pushUnsubscribeBody).endpoint);
    res.status(204).end();
  });

  router.post('/test', requireUser, async (req, res) => {
    const subscriptions = await subscriptionsOf([req.user!.id]);
    if (subscriptions.length === 0) throw new AppError(409, 'conflict', 'Notifications are not on for any of your devices. Turn them on first.');
    const message = { title: 'Notifications are on', body: 'Larderly will remind you here before an opened jar reaches its use-by.', url: '/', tag: 'test' };
    const outcomes = await Promise.all(subscriptions.map((s) => ctx.push.send(s, message)));
    res.json({ sent: outcomes.filter((o) => o === 'sent').length, removed: outcomes.filter((o) => o === 'gone').length, failed: outcomes.filter((o) => o === 'failed').length });
  });

  return router;
}
