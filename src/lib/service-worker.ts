import { queryClient } from './query-client';

// Vite serves the source in development; the build writes the worker to /sw.js.
const WORKER_URL = import.meta.env.DEV ? '/src/sw.ts' : '/sw.js';

/** Registers the service worker (the offline shell, push notifications, installing the app) and listens for pushes it passes on. */
export function registerServiceWorker() {
  if (!('serviceWorker' in navigator)) return;
  void serviceWorkerRegistration()
    .then((registration) => registration.active?.postMessage({ type: 'larderly-keep-assets', paths: loadedAssets() }))
    .catch(() => {});
  navigator.serviceWorker.addEventListener('message', (event: MessageEvent<{ type?: string }>) => {
    // A reminder arrived while the app is open: what it is about may have changed.
    if (event.data?.type === 'larderly-push') void queryClient.invalidateQueries();
  });
}

/** The hashed files this page has loaded so far, some maybe before the worker took charge of it. */
function loadedAssets() {
  return performance
    .getEntriesByType('resource')
    .map((entry) => new URL(entry.name))
    .filter((url) => url.origin === location.origin && url.pathname.startsWith('/assets/'))
    .map((url) => url.pathname);
}

export async function serviceWorkerRegistration() {
  await navigator.serviceWorker.register(WORKER_URL, { type: import.meta.env.DEV ? 'module' : 'classic', scope: '/' });
  return navigator.serviceWorker.ready;
}
