import { onlineManager } from '@tanstack/react-query';

/** A store that does not answer (a private window, a full disk) must not keep the app from opening. */
const GIVE_UP_AFTER_MS = 3000;

/**
 * Before the first render: TanStack Query knows whether there is a network (it assumes one until told), and what the
 * person last read is put back from IndexedDB with the changes still waiting. That part is a chunk of its own
 * (./restore-offline), so the first screen's JavaScript stays small.
 */
export async function startOffline() {
  onlineManager.setOnline(navigator.onLine);
  const restored = import('./restore-offline').then(({ restoreOffline }) => restoreOffline());
  await Promise.race([restored.catch(() => {}), new Promise((resolve) => setTimeout(resolve, GIVE_UP_AFTER_MS))]);
}
