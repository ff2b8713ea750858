import { api } from '@/lib/api-client';
import { serviceWorkerRegistration } from '@/lib/service-worker';

export const pushSupported = () => typeof window !== 'undefined' && 'serviceWorker' in navigator && 'PushManager' in window && 'Notification' in window;

function bytesFromBase64Url(text: string) {
  const base64 = (text + '='.repeat((4 - (text.length % 4)) % 4)).replace(/-/g, '+').replace(/_/g, '/');
  return Uint8Array.from(atob(base64), (c) => c.charCodeAt(0));
}

export async function currentSubscription() {
  if (!pushSupported()) return null;
  const registration = await navigator.serviceWorker.getRegistration();
  return registration ? registration.pushManager.getSubscription() : null;
}

/** Asks the browser for permission, subscribes with the server's VAPID key and tells the server. */
export async function subscribeThisDevice() {
  const permission = await Notification.requestPermission();
  if (permission !== 'granted') {
    throw new Error('Notifications are blocked for Larderly in this browser. Allow them in the site settings, then try again.');
  }
  const registration = await serviceWorkerRegistration();
  const { publicKey } = await api.get<{ publicKey: string }>('/push/public-key');
  const subscription = await registration.pushManager.subscribe({ userVisibleOnly: true, applicationServerKey: bytesFromBase64Url(publicKey) });
  await api.post('/push/subscriptions', subscription.toJSON());
  return subscription;
}

export async function unsubscribeThisDevice() {
  const subscription = await currentSubscription();
  if (!subscription) return;
  await api.delete('/push/subscriptions', { endpoint: subscription.endpoint });
  await subscription.unsubscribe();
}

export const sendTestNotification = () => api.post<{ devices: number }>('/push/test');
