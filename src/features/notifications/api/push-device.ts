import { api } from '@/lib/api-client';
import { serviceWorkerRegistration } from '@/lib/service-worker';
import { ALLOW_NOTIFICATIONS, PUSH_BROWSERS, PushSetupError, pushSetupError } from '../push-errors';

export const pushSupported = () =>
  typeof window !== 'undefined' && 'serviceWorker' in navigator && 'PushManager' in window && 'Notification' in window;

function bytesFromBase64Url(text: string) {
  const base64 = (text + '='.repeat((4 - (text.length % 4)) % 4)).replace(/-/g, '+').replace(/_/g, '/');
  return Uint8Array.from(atob(base64), (c) => c.charCodeAt(0));
}

export async function currentSubscription() {
  if (!pushSupported()) return null;
  const registration = await navigator.serviceWorker.getRegistration();
  return registration ? registration.pushManager.getSubscription() : null;
}

/** Asks the browser for permission, subscribes with the server's VAPID key and tells the server; a failure says what to do. */
export async function subscribeThisDevice() {
  if (!pushSupported())
    throw new PushSetupError('unsupported', `This browser cannot receive push notifications. ${PUSH_BROWSERS}`);
  try {
    const permission = await Notification.requestPermission();
    if (permission === 'denied') throw new PushSetupError('blocked', ALLOW_NOTIFICATIONS);
    if (permission !== 'granted')
      throw new PushSetupError('dismissed', 'The browser asked without an answer. Tap Turn on again and choose Allow.');
    const registration = await serviceWorkerRegistration();
    const { publicKey } = await api.get<{ publicKey: string }>('/push/public-key');
    const subscription = await registration.pushManager.subscribe({
      userVisibleOnly: true,
      applicationServerKey: bytesFromBase64Url(publicKey),
    });
    await api.post('/push/subscriptions', subscription.toJSON());
    return subscription;
  } catch (cause) {
    throw pushSetupError(cause);
  }
}

export async function unsubscribeThisDevice() {
  const subscription = await currentSubscription();
  if (!subscription) return;
  await api.delete('/push/subscriptions', { endpoint: subscription.endpoint });
  await subscription.unsubscribe();
}

export const sendTestNotification = () => api.post<{ devices: number }>('/push/test');
