// The service worker: keeps the app's shell so it opens without a network, shows reminders pushed by the server and
// opens the jar's page on a click. What the API answered is never kept here: the query cache (IndexedDB) holds that.
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
    return {
      title: parsed.title ?? 'Larderly',
      body: parsed.body ?? '',
      url: ownPath(parsed.url),
      tag: parsed.tag ?? 'larderly',
    };
  } catch {
    return { title: 'Larderly', body: data?.text() ?? '', url: '/', tag: 'larderly' };
  }
}

// Raised when what is kept changes shape; activate drops every other version.
const SHELL = 'larderly-shell-1';
const ASSETS = 'larderly-assets-1';
/** Every address outside /api answers the same page, so one copy of it serves them all. */
const PAGE = '/';
/** Hashed files pile up across releases; the oldest beyond this many are dropped. */
const MOST_ASSETS = 200;

const isAsset = (url: URL) => url.pathname.startsWith('/assets/');

worker.addEventListener('install', (event) => {
  // Keep the page and the files it names now, so the first visit is enough to open offline next time.
  event.waitUntil(
    (async () => {
      try {
        const page = await fetch(PAGE, { cache: 'no-cache' });
        if (page.ok) {
          const html = await page.clone().text();
          await (await caches.open(SHELL)).put(PAGE, page);
          await keepAssets([...html.matchAll(/(?:src|href)="(\/assets\/[^"]+)"/g)].map((match) => match[1]!));
        }
      } catch {
        // No network while installing: the pages kept later fill the cache instead.
      }
      await worker.skipWaiting();
    })(),
  );
});

worker.addEventListener('activate', (event) =>
  event.waitUntil(
    (async () => {
      for (const name of await caches.keys()) if (name !== SHELL && name !== ASSETS) await caches.delete(name);
      await worker.clients.claim();
    })(),
  ),
);

async function keepAssets(paths: string[]) {
  const cache = await caches.open(ASSETS);
  for (const path of new Set(paths)) {
    if (await cache.match(path)) continue;
    const response = await fetch(path).catch(() => null);
    if (response?.ok) await cache.put(path, response);
  }
  const kept = await cache.keys();
  for (const old of kept.slice(0, Math.max(0, kept.length - MOST_ASSETS))) await cache.delete(old);
}

/** Pages: the network first, so a new release shows at once; the kept page when there is none. */
async function page(request: Request) {
  try {
    const response = await fetch(request);
    if (response.ok && response.headers.get('Content-Type')?.includes('text/html'))
      await (await caches.open(SHELL)).put(PAGE, response.clone());
    return response;
  } catch (error) {
    const kept = await caches.match(PAGE, { cacheName: SHELL });
    if (kept) return kept;
    throw error;
  }
}

/** Hashed files never change under their name: the kept copy first, the network once. */
async function asset(request: Request) {
  const cache = await caches.open(ASSETS);
  const kept = await cache.match(request);
  if (kept) return kept;
  const response = await fetch(request);
  if (response.ok) await cache.put(request, response.clone());
  return response;
}

/** Icons and the manifest: the network first, the kept copy offline. */
async function other(request: Request) {
  const cache = await caches.open(SHELL);
  try {
    const response = await fetch(request);
    if (response.ok) await cache.put(request, response.clone());
    return response;
  } catch (error) {
    const kept = await cache.match(request);
    if (kept) return kept;
    throw error;
  }
}

worker.addEventListener('fetch', (event) => {
  const { request } = event;
  const url = new URL(request.url);
  if (request.method !== 'GET' || url.origin !== worker.location.origin || url.pathname.startsWith('/api/')) return;
  if (request.mode === 'navigate') event.respondWith(page(request));
  else if (isAsset(url)) event.respondWith(asset(request));
  else if (/^\/(icon[^/]*\.(png|svg)|manifest\.webmanifest)$/.test(url.pathname)) event.respondWith(other(request));
});

// The page names the files it loaded before this worker took charge of it (the first visit's screen chunks).
worker.addEventListener('message', (event) => {
  const data = event.data as { type?: string; paths?: unknown };
  if (data?.type !== 'larderly-keep-assets' || !Array.isArray(data.paths)) return;
  const paths = data.paths.filter(
    (path): path is string => typeof path === 'string' && path.startsWith('/assets/') && !path.includes('..'),
  );
  event.waitUntil(keepAssets(paths));
});

worker.addEventListener('push', (event) => {
  const reminder = readReminder(event.data);
  event.waitUntil(
    (async () => {
      await worker.registration.showNotification(reminder.title, {
        body: reminder.body,
        tag: reminder.tag,
        icon: '/icon-192.png',
        badge: '/icon-192.png',
        data: { url: reminder.url },
      });
      // Open pages refresh what the reminder is about.
      for (const page of await worker.clients.matchAll({ type: 'window', includeUncontrolled: true }))
        page.postMessage({ type: 'larderly-push', ...reminder });
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
