// Loaded on its own before the first render (see src/app/offline.ts), so the first screen's chunk stays small.
import { createAsyncStoragePersister } from '@tanstack/query-async-storage-persister';
import { dehydrate, hydrate, onlineManager, type DehydratedState, type QueryClient } from '@tanstack/react-query';
import { persistQueryClientRestore, persistQueryClientSubscribe } from '@tanstack/react-query-persist-client';
import { createStore, del, get, set } from 'idb-keyval';
import type { MeResponse } from '@shared/schemas/auth';
import { ApiError } from './api-client';
import { KEPT_FOR_MS } from './query-client';
import { authKeys } from './query-keys';

// Raised when the shape of a cached answer changes, so an older copy is never shown as the new one.
const SHAPE = 'larderly-1';

const store = createStore('larderly', 'query-cache');
const persister = createAsyncStoragePersister({
  storage: {
    getItem: (key) => get<string>(key, store),
    setItem: (key, value: string) => set(key, value, store),
    removeItem: (key) => del(key, store),
  },
  key: 'cache',
  throttleTime: 500,
});

const personOf = (queryClient: QueryClient) =>
  queryClient.getQueryData<MeResponse | null>(authKeys.me)?.user.id ?? null;

/**
 * The browser may say it is online with no network to be had (a weak signal, a network that leads nowhere; some
 * browsers after a reload offline). Until a read has an answer, the saved copy is kept aside and the changes still
 * waiting wait: the first read that fails for want of a network puts the copy back and tells TanStack Query it is
 * offline, as if the browser had said so, and the changes pause again; the first read answered sends them.
 */
function untilTheNetworkAnswers(queryClient: QueryClient, saved: DehydratedState, carryOn: () => void) {
  const stop = queryClient.getQueryCache().subscribe((event) => {
    if (event.type !== 'updated') return;
    if (event.action.type === 'success') {
      stop();
      return carryOn();
    }
    if (event.action.type !== 'error') return;
    const { error } = event.action;
    if (!(error instanceof ApiError) || error.code !== 'offline') return;
    stop();
    onlineManager.setOnline(false);
    probeUntilOnline();
    // The reads still under way began before the saved copy was back: cancelled first, none of them can later put
    // its empty start back over it (a change made offline cancels the reads it touches, and they revert).
    void queryClient
      .cancelQueries()
      .then(() => hydrate(queryClient, saved))
      .then(carryOn);
  });
}

/** How often the app asks whether the server answers again, once a failed read put it offline. */
const PROBE_EVERY_MS = 5_000;

/**
 * Offline on a failed read's word, no browser event says when the network is back (the browser never said it was
 * gone): every few seconds the app asks the server's health address, and the first answer puts it online again.
 */
function probeUntilOnline() {
  const timer = setInterval(() => {
    if (onlineManager.isOnline()) return clearInterval(timer);
    void fetch('/api/health', { cache: 'no-store' }).then(
      (response) => {
        if (!response.ok || onlineManager.isOnline()) return;
        clearInterval(timer);
        onlineManager.setOnline(true);
      },
      () => {},
    );
  }, PROBE_EVERY_MS);
}

/**
 * Puts back the changes still waiting and, when the app starts without a network, what the person last read; keeps
 * both saved as they change, and forgets them when the person signs out or another signs in: one person's shelf is
 * not the next one's to see.
 */
export async function restoreCache(queryClient: QueryClient) {
  const options = {
    queryClient,
    persister,
    maxAge: KEPT_FOR_MS,
    buster: SHAPE,
    dehydrateOptions: {
      // Changes in flight too, not only paused ones: a tab closed mid-send sends again, and the key keeps it once.
      shouldDehydrateMutation: (mutation: { state: { status: string }; options: { meta?: Record<string, unknown> } }) =>
        mutation.state.status === 'pending' && mutation.options.meta?.queued === true,
    },
  };
  await persistQueryClientRestore(options);
  // With a network, a new page load reads afresh (the saved copy would show an older state first); the session
  // is kept to open without a flash, and read again too. A saved "signed out" is not kept: trusted, it would send a
  // person whose cookie is still good to sign-in and back before the first screen.
  // Restored changes carry on: those that were sending send again, the paused ones wait for the network.
  // One scope keeps them in the order they were made; offline, each pauses again until the network returns.
  const carryOn = () => {
    for (const mutation of queryClient.getMutationCache().getAll())
      if (mutation.state.status === 'pending') void mutation.continue().catch(() => {});
  };
  const signedOut = personOf(queryClient) === null;
  const waitForTheNetwork = onlineManager.isOnline() && !signedOut;
  // The queries only: the restored changes are in the cache already.
  if (waitForTheNetwork)
    untilTheNetworkAnswers(queryClient, dehydrate(queryClient, { shouldDehydrateMutation: () => false }), carryOn);
  if (onlineManager.isOnline())
    queryClient.removeQueries({ predicate: (query) => signedOut || query.queryKey[0] !== authKeys.me[0] });
  await queryClient.invalidateQueries({ refetchType: 'none' });
  let person = personOf(queryClient);
  queryClient.getQueryCache().subscribe((event) => {
    if (event.query.queryHash !== JSON.stringify(authKeys.me) || event.type !== 'updated') return;
    const now = personOf(queryClient);
    if (now === person || event.query.state.status !== 'success') return;
    const signedIn = person === null;
    person = now;
    if (signedIn && now !== null) return;
    // Signed out, or someone else is signed in: nothing of the last person's stays, here or on disk.
    queryClient.getMutationCache().clear();
    queryClient.removeQueries({ predicate: (query) => query.queryKey[0] !== authKeys.me[0] });
    void persister.removeClient();
  });
  persistQueryClientSubscribe(options);
  if (!waitForTheNetwork) carryOn();
}
