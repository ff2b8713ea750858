import type { PushSubscriptionBody } from '../../../shared/schemas/notifications';
import { PushSubscription } from '../../db/models';
import { AppError, conflict } from '../../http/errors';
import { checkEndpoint, type LocalPushOrigin } from './endpoint-policy';

/** Browsers one person may have notifications on in at a time. */
export const MAX_PUSH_DEVICES = 10;

/**
 * Keeps a browser's subscription for the person. An endpoint another person holds stays theirs:
 * knowing an endpoint is not enough to take over its notifications.
 */
export async function saveSubscription(
  userId: string,
  body: PushSubscriptionBody,
  userAgent: string,
  localOrigin: LocalPushOrigin,
) {
  await checkEndpoint(body.endpoint, localOrigin);
  const existing = await PushSubscription.findOne({ where: { endpoint: body.endpoint } });
  if (existing && existing.userId !== userId) {
    throw conflict(
      'This browser already gets notifications for another Larderly account. Sign in as that person and turn them off there first.',
    );
  }
  const values = { p256dh: body.keys.p256dh, auth: body.keys.auth, userAgent: userAgent.slice(0, 300) };
  if (existing) return existing.update(values);
  if ((await PushSubscription.count({ where: { userId } })) >= MAX_PUSH_DEVICES) {
    throw new AppError(
      409,
      'conflict',
      `Notifications are already on for ${MAX_PUSH_DEVICES} of your devices. Turn them off on one you no longer use, then try again.`,
    );
  }
  return PushSubscription.create({ userId, endpoint: body.endpoint, ...values });
}

export async function removeSubscription(userId: string, endpoint: string) {
  return PushSubscription.destroy({ where: { userId, endpoint } });
}

export function subscriptionsOf(userIds: string[]) {
  return PushSubscription.findAll({ where: { userId: userIds } });
}
