// Straight from the modules that define them, not the features' entries: this runs before every first render, sign-in's
// too, and an entry would bring the feature's screens' code with it.
import { jarChangeDefaults } from '@/features/shelf/api/jar-change';
import { todoTickDefaults } from '@/features/todos/api/update-todo';
import { watchQueuedChanges } from '@/lib/offline-state';
import { restoreCache } from '@/lib/persisted-cache';
import { queryClient } from '@/lib/query-client';
import { changeKeys } from '@/lib/query-keys';

/**
 * A change restored from IndexedDB keeps only its key and variables: the defaults registered under its key say how
 * to send it, so they are registered before the restore. The watcher refetches once the queue has drained and says
 * why a change that waited was refused.
 */
export async function restoreOffline() {
  queryClient.setMutationDefaults(changeKeys.jarAction, jarChangeDefaults);
  queryClient.setMutationDefaults(changeKeys.todoTick, todoTickDefaults);
  watchQueuedChanges(queryClient);
  if (typeof indexedDB !== 'undefined') await restoreCache(queryClient);
}
