import webpush from 'web-push';
import type { Config } from '../../config';
import { AppSetting } from '../../db/models';

export interface VapidKeys {
  publicKey: string;
  privateKey: string;
}

const SETTING = 'vapid-keys';

/**
 * The environment's keys when set; otherwise the pair kept in the database, made on first start.
 * Two processes starting at once keep whichever pair was stored first.
 */
export async function loadVapidKeys(config: Config): Promise<VapidKeys> {
  const { vapidPublicKey, vapidPrivateKey } = config.push;
  if (vapidPublicKey && vapidPrivateKey) return { publicKey: vapidPublicKey, privateKey: vapidPrivateKey };
  const kept = await AppSetting.findByPk(SETTING);
  if (kept) return kept.value as VapidKeys;
  await AppSetting.findOrCreate({
    where: { key: SETTING },
    defaults: { key: SETTING, value: webpush.generateVAPIDKeys() },
  }).catch(() => null);
  const stored = await AppSetting.findByPk(SETTING);
  if (!stored) throw new Error('The VAPID keys could not be stored in app_settings.');
  return stored.value as VapidKeys;
}
