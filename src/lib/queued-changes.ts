import { ApiError } from './api-client';

/** What every change that may wait for the network carries: its household, its idempotency key and what it does. */
export interface QueuedChange {
  hid: string;
  /** Sent as the Idempotency-Key header; made once when the person acts, so a resend never applies twice. */
  key: string;
  /** What the change does, in words a refusal can start with ("Finishing jar K7 of Pear Butter"). */
  what: string;
}

/** A key the server accepts (16 to 100 letters, digits, "-" or "_"), also where crypto.randomUUID is missing (plain HTTP). */
export function newChangeKey(): string {
  if (typeof crypto.randomUUID === 'function') return crypto.randomUUID();
  return Array.from(crypto.getRandomValues(new Uint8Array(16)), (byte) => byte.toString(16).padStart(2, '0')).join('');
}

/**
 * The options a queued change registers with `queryClient.setMutationDefaults`, so a change restored after a reload
 * (which keeps only its key and variables) knows how to send itself. One scope sends them one after another, in the
 * order they were made; a network failure waits and tries again instead of dropping the change.
 */
export function queuedChangeDefaults<V extends QueuedChange, R>(send: (change: V) => Promise<R>) {
  return {
    mutationFn: send,
    scope: { id: 'queued-changes' },
    meta: { queued: true },
    retry: (failures: number, error: Error) =>
      error instanceof ApiError && (error.status === 0 || (error.status === 503 && failures < 3)),
  };
}
