import { Router } from 'express';
import { pushSubscriptionBody, pushUnsubscribeBody } from '../../shared/schemas/notifications';
import { requireUser } from '../auth/guards';
import type { AppContext } from '../context';
import { AppError } from '../http/errors';
import { byPerson, limit, MINUTE } from '../http/rate-limits';
import { body } from '../http/validate';
import { removeSubscription, saveSubscription, subscriptionsOf } from '../services/push/subscriptions';

/** /api/push: the VAPID public key, this person's browser subscriptions and a test notification. */
export function pushRouter(ctx: AppContext) {
  const router = Router();
  const subscribing = limit(ctx.sequelize, 'push-subscribe', {
    windowMs: 60 * MINUTE,
    limit: 30,
    what: 'notification changes',
    key: byPerson,
  });
  const testing = limit(ctx.sequelize, 'push-test', {
    windowMs: 15 * MINUTE,
    limit: 5,
    what: 'test notifications',
    key: byPerson,
  });

  router.get('/public-key', async (_req, res) => {
    res.json({ publicKey: await ctx.push.publicKey() });
  });

  router.post('/subscriptions', requireUser, subscribing, async (req, res) => {
    await saveSubscription(
      req.user!.id,
      body(req, pushSubscriptionBody),
      req.get('user-agent') ?? '',
      ctx.config.push.localOrigin,
    );
    res.status(201).json({ subscribed: true });
  });

  router.delete('/subscriptions', requireUser, async (req, res) => {
    await removeSubscription(req.user!.id, body(req, pushUnsubscribeBody).endpoint);
    res.status(204).end();
  });

  // Answers before the sends finish, and only with the number of devices: never which push service replied.
  router.post('/test', requireUser, testing, async (req, res) => {
    const subscriptions = await subscriptionsOf([req.user!.id]);
    if (subscriptions.length === 0)
      throw new AppError(409, 'conflict', 'Notifications are not on for any of your devices. Turn them on first.');
    const message = {
      title: 'Notifications are on',
      body: 'Larderly will remind you here before an opened jar reaches its use-by.',
      url: '/',
      tag: 'test',
    };
    void Promise.allSettled(subscriptions.map((s) => ctx.push.send(s, message)));
    res.status(202).json({ devices: subscriptions.length });
  });

  return router;
}
