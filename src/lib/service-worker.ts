import { queryClient } from './query-client';

// Vite serves the source in development; the build writes the worker to /sw.js.
const WORKER_URL = import.meta.env.DEV ? '/src/sw.ts' : '/sw.js';

/** Registers the service worker (the offline shell, push notifications, installing the app) and listens for pushes it passes on. */
export function registerServiceWorker() {
  if (!('serviceWorker' in navigator)) return;
  // Files loaded before the worker took charge of this page went past it: name them, once it is active and again
  // once it controls the page, and name any file that finishes loading in between (a lazy chunk of the first
  // screen), so the first visit is enough to open that screen offline.
  const keep = async (paths: string[]) => {
    if (paths.length === 0) return;
    const registration = await navigator.serviceWorker.ready;
    registration.active?.postMessage({ type: 'larderly-keep-assets', paths });
  };
  void serviceWorkerRegistration()
    .then(() => keep(loadedAssets()))
    .catch(() => {});
  if (!navigator.serviceWorker.controller && 'PerformanceObserver' in window) {
    const observer = new PerformanceObserver((list) => {
      if (navigator.serviceWorker.controller) return observer.disconnect();
      void keep(assetPaths(list.getEntries()));
    });
    observer.observe({ type: 'resource' });
    navigator.serviceWorker.addEventListener('controllerchange', () => {
      observer.disconnect();
      void keep(loadedAssets());
    });
  }
  navigator.serviceWorker.addEventListener('message', (event: MessageEvent<{ type?: string }>) => {
    // A reminder arrived while the app is open: what it is about may have changed.
    if (event.data?.type === 'larderly-push') void queryClient.invalidateQueries();
  });
}

/** The hashed files this page has loaded so far, some maybe before the worker took charge of it. */
function loadedAssets() {
  return assetPaths(performance.getEntriesByType('resource'));
}

function assetPaths(entries: PerformanceEntryList) {
  return entries
    .map((entry) => new URL(entry.name))
    .filter((url) => url.origin === location.origin && url.pathname.startsWith('/assets/'))
    .map((url) => url.pathname);
}

export async function serviceWorkerRegistration() {
  await navigator.serviceWorker.register(WORKER_URL, { type: import.meta.env.DEV ? 'module' : 'classic', scope: '/' });
  return navigator.serviceWorker.ready;
}
