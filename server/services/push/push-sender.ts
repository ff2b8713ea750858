import { readFileSync } from 'node:fs';
import https from 'node:https';
import webpush, { WebPushError } from 'web-push';
import type { Config } from '../../config';
import { PushSubscription } from '../../db/models';
import { publicPushAgent } from './endpoint-policy';
import { loadVapidKeys, type VapidKeys } from './vapid-keys';
import type { Logger } from '../../http/logging';

/** What the service worker receives; `url` is the page a click opens. */
export interface PushMessage {
  title: string;
  body: string;
  url: string;
  tag: string;
}

export type PushOutcome = 'sent' | 'gone' | 'failed';

export interface PushSender {
  publicKey(): Promise<string>;
  /** Sends to one subscription; a subscription the push service no longer knows (404, 410) is removed. */
  send(subscription: PushSubscription, message: PushMessage, options?: { topic?: string }): Promise<PushOutcome>;
}

export function createPushSender(config: Config, log?: Logger): PushSender {
  let keys: Promise<VapidKeys> | undefined;
  const vapid = () =>
    (keys ??= loadVapidKeys(config).catch((error) => {
      keys = undefined;
      throw error;
    }));
  // The local push endpoint's self-signed certificate, trusted only for that endpoint outside production.
  const localAgent = config.push.caFile ? new https.Agent({ ca: readFileSync(config.push.caFile) }) : undefined;
  const publicAgent = publicPushAgent();

  return {
    publicKey: async () => (await vapid()).publicKey,
    async send(subscription, message, options = {}) {
      const { publicKey, privateKey } = await vapid();
      const local =
        config.push.localOrigin !== undefined && new URL(subscription.endpoint).origin === config.push.localOrigin;
      const agent = local ? localAgent : publicAgent;
      try {
        await webpush.sendNotification(
          { endpoint: subscription.endpoint, keys: { p256dh: subscription.p256dh, auth: subscription.auth } },
          JSON.stringify(message),
          {
            vapidDetails: { subject: config.push.vapidSubject, publicKey, privateKey },
            TTL: 24 * 60 * 60,
            urgency: 'normal',
            agent,
            timeout: 10_000,
            topic: options.topic,
          },
        );
        return 'sent';
      } catch (error) {
        if (error instanceof WebPushError && (error.statusCode === 404 || error.statusCode === 410)) {
          await subscription.destroy();
          return 'gone';
        }
        const host = new URL(subscription.endpoint).host;
        if (log) log.warn({ err: error, pushHost: host }, 'a push failed');
        else console.warn(`larderly: a push to ${host} failed: ${(error as Error).message}`);
        return 'failed';
      }
    },
  };
}
