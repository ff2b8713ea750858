import type { PushSubscriptionBody } from '../../../shared/schemas/notifications';
import { PushSubscription } from '../../db/models';

/** Keeps a browser's subscription for the person; the same endpoint moves to whoever subscribed last. */
export async function saveSubscription(userId: string, body: PushSubscriptionBody, userAgent: string) {
  const values = { userId, endpoint: body.endpoint, p256dh: body.keys.p256dh, auth: body.keys.auth, userAgent: userAgent.slice(0, 300) };
  const [subscription] = await PushSubscription.upsert(values, { conflictFields: ['endpoint'] });
  return subscription;
}

export async function removeSubscription(userId: string, endpoint: string) {
  return PushSubscription.destroy({ where: { userId, endpoint } });
}

export function subscriptionsOf(userIds: string[]) {
  return PushSubscription.findAll({ where: { userId: userIds } });
}
