// Loaded on its own before the first render (see src/app/offline.ts), so the first screen's chunk stays small.
import { createAsyncStoragePersister } from '@tanstack/query-async-storage-persister';
import { onlineManager, type QueryClient } from '@tanstack/react-query';
import { persistQueryClientRestore, persistQueryClientSubscribe } from '@tanstack/react-query-persist-client';
import { createStore, del, get, set } from 'idb-keyval';
import type { MeResponse } from '@shared/schemas/auth';
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
  if (onlineManager.isOnline()) {
    const signedOut = personOf(queryClient) === null;
    queryClient.removeQueries({ predicate: (query) => signedOut || query.queryKey[0] !== authKeys.me[0] });
  }
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
  // Restored changes carry on: those that were sending send again, the paused ones wait for the network.
  // One scope keeps them in the order they were made; offline, each pauses again until the network returns.
  for (const mutation of queryClient.getMutationCache().getAll())
    if (mutation.state.status === 'pending') void mutation.continue().catch(() => {});
}
