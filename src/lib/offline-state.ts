// What the offline banner shows and the watcher behind it; loaded after the first render (src/app/offline.ts).
import { onlineManager, useIsMutating, type Mutation, type QueryClient } from '@tanstack/react-query';
import { useSyncExternalStore } from 'react';
import { ApiError } from './api-client';
import { changeKeys, householdKeys, shelfKeys } from './query-keys';
import type { QueuedChange } from './queued-changes';

const isQueued = (mutation: Mutation<unknown, unknown, unknown, unknown>) => mutation.options.meta?.queued === true;

// Changes the server refused after they had waited for the network: the person was not there to see the answer.
interface RefusedChange {
  id: number;
  words: string;
}
let refused: RefusedChange[] = [];
const listeners = new Set<() => void>();
const setRefused = (next: RefusedChange[]) => {
  refused = next;
  listeners.forEach((listener) => listener());
};

/** The refusals to show, newest last, each until the person dismisses it. */
export function useRefusedChanges() {
  const list = useSyncExternalStore(
    (listener) => {
      listeners.add(listener);
      return () => listeners.delete(listener);
    },
    () => refused,
  );
  return { refused: list, dismiss: (id: number) => setRefused(refused.filter((r) => r.id !== id)) };
}

/** Why a change that waited was refused: the server's words, which already say what state the thing is in now. */
function refusalWords(change: QueuedChange, error: unknown) {
  const why =
    error instanceof ApiError ? error.message.replace(/\s*Refresh[^.]*\.$/, '') : 'The server could not apply it.';
  return `${change.what} was not applied: ${why} What you see now is up to date.`;
}

/**
 * Watches the queued changes: notes which had to wait (paused offline, or restored after a reload), says why the
 * server refused one of those, and refetches the household once the queue has drained, so what the person sees
 * is the server's again. Returns the unsubscribe.
 */
export function watchQueuedChanges(queryClient: QueryClient) {
  const waited = new Set<number>();
  const mutations = queryClient.getMutationCache();
  let nextId = 1;
  return mutations.subscribe((event) => {
    const mutation = event.mutation;
    if (!mutation || !isQueued(mutation)) return;
    if (event.type === 'added' && mutation.state.status === 'pending') waited.add(mutation.mutationId);
    if (event.type !== 'updated') return;
    if (event.action.type === 'pause' || event.action.type === 'failed') waited.add(mutation.mutationId);
    if (event.action.type !== 'success' && event.action.type !== 'error') return;
    const change = mutation.state.variables as QueuedChange;
    if (event.action.type === 'error' && waited.has(mutation.mutationId)) {
      setRefused([...refused, { id: nextId++, words: refusalWords(change, event.action.error) }]);
    }
    waited.delete(mutation.mutationId);
    const stillWaiting = mutations.findAll({ mutationKey: changeKeys.all, status: 'pending' }).length;
    if (stillWaiting === 0 || event.action.type === 'error') {
      void queryClient.invalidateQueries({ queryKey: householdKeys.all(change.hid) });
      void queryClient.invalidateQueries({ queryKey: shelfKeys.jarsByCode() });
    }
  });
}

/** The changes not yet answered by the server: waiting for the network or on their way. */
export const useWaitingChangeCount = () => useIsMutating({ mutationKey: changeKeys.all });

/** Whether the browser says it has a network, as TanStack Query sees it. */
export const useOnline = () =>
  useSyncExternalStore(onlineManager.subscribe.bind(onlineManager), () => onlineManager.isOnline());
