import { MutationCache, QueryCache, QueryClient } from '@tanstack/react-query';
import { ApiError } from './api-client';
import { authKeys } from './query-keys';

/**
 * A read or a change answered "signed out" (401) while the client still held a session: it has expired or was
 * ended elsewhere. Forgetting the person once sends every signed-in screen to sign-in, with ?next= back to where
 * they were (see src/app/layouts/require-auth.tsx), instead of each screen saying "Please sign in first.".
 * Signed-out pages (sign-in, an invitation) get 401s that mean something else, and are left to show them.
 */
function onSignedOut(error: Error) {
  if (!(error instanceof ApiError) || error.status !== 401) return;
  if (!queryClient.getQueryData(authKeys.me)) return;
  queryClient.setQueryData(authKeys.me, null);
  // What the old session read is not the next person's to see; sign-in reads afresh.
  queueMicrotask(() => queryClient.removeQueries({ predicate: (query) => query.queryKey[0] !== authKeys.me[0] }));
}

/** What was read is kept this long, in memory and saved for offline use (src/lib/persisted-cache.ts). */
export const KEPT_FOR_MS = 7 * 24 * 60 * 60 * 1000;

export const queryClient: QueryClient = new QueryClient({
  queryCache: new QueryCache({ onError: onSignedOut }),
  mutationCache: new MutationCache({ onError: onSignedOut }),
  defaultOptions: {
    queries: {
      staleTime: 30_000,
      // As long as the saved copy, so a screen read days ago still opens offline.
      gcTime: KEPT_FOR_MS,
      retry: (failureCount, error) =>
        !(error instanceof ApiError && error.status >= 400 && error.status < 500) && failureCount < 2,
    },
  },
});
