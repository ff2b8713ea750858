// The service worker: shows reminders pushed by the server and opens the jar's page on a click.
interface PushedReminder {
  title: string;
  body: string;
  url: string;
  tag: string;
}

const worker = globalThis as unknown as ServiceWorkerGlobalScope;

/** Only pages of this app may be opened from a notification. */
function ownPath(url: unknown) {
  return typeof url === 'string' && url.startsWith('/') && !url.startsWith('//') ? url : '/';
}

function readReminder(data: PushMessageData | null): PushedReminder {
  try {
    const parsed = data?.json() as Partial<PushedReminder>;
    return { title: parsed.title ?? 'Larderly', body: parsed.body ?? '', url: ownPath(parsed.url), tag: parsed.tag ?? 'larderly' };
  } catch {
    return { title: 'Larderly', body: data?.text() ?? '', url: '/', tag: 'larderly' };
  }
}

worker.addEventListener('install', () => void worker.skipWaiting());
worker.addEventListener('activate', (event) => event.waitUntil(worker.clients.claim()));

worker.addEventListener('push', (event) => {
  const reminder = readReminder(event.data);
  event.waitUntil(
    (async () => {
      await worker.registration.showNotification(reminder.title, { body: reminder.body, tag: reminder.tag, icon: '/icon-192.png', badge: '/icon-192.png', data: { url: reminder.url } });
      // Open pages refresh what the reminder is about.
      for (const page of await worker.clients.matchAll({ type: 'window', includeUncontrolled: true })) page.postMessage({ type: 'larderly-push', ...reminder });
    })(),
  );
});

worker.addEventListener('notificationclick', (event) => {
  event.notification.close();
  const target = new URL(ownPath(event.notification.data?.url), worker.location.origin).href;
  event.waitUntil(
    (async () => {
      const pages = await worker.clients.matchAll({ type: 'window', includeUncontrolled: true });
      const same = pages.find((page) => page.url === target);
      if (same) await same.focus();
      else await worker.clients.openWindow(target);
    })(),
  );
});
