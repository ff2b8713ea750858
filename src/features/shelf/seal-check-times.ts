import type { SealCheckView } from '@shared/schemas/batches';

/** Whether the jars have cooled long enough, and whether reprocessing is still offered, by this browser's clock. */
export function sealCheckTimes(check: SealCheckView, now = new Date()) {
  return {
    ready: now >= new Date(check.checkFrom),
    reprocessOpen: check.reprocessUntil !== null && now <= new Date(check.reprocessUntil),
  };
}
