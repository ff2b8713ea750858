// The seal check after processing: when jars may be checked, and until when a jar that did not seal may be reprocessed.

/**
 * Jars cool undisturbed 12 to 24 hours before their seals are checked
 * (USDA Complete Guide to Home Canning, 2015, "Cooling jars" and "Testing jar seals").
 */
export const SEAL_CHECK_AFTER_HOURS = 12;
/** A jar that did not seal may be reprocessed within 24 hours, with a new lid and the full time (NCHFP, "Reprocessing unsealed jars"). */
export const REPROCESS_WITHIN_HOURS = 24;
/** A jar is processed at most twice: one that fails after its reprocess goes to the fridge (NCHFP gives one reprocess). */
export const MAX_PROCESSINGS = 2;

const HOUR_MS = 3_600_000;

/** The earliest moment the jars of a processing may be checked. */
export function sealCheckFrom(processedAt: Date): Date {
  return new Date(processedAt.getTime() + SEAL_CHECK_AFTER_HOURS * HOUR_MS);
}

/** The last moment a jar first processed at `firstProcessedAt` may be reprocessed. */
export function reprocessUntil(firstProcessedAt: Date): Date {
  return new Date(firstProcessedAt.getTime() + REPROCESS_WITHIN_HOURS * HOUR_MS);
}

export function mayReprocess(firstProcessedAt: Date, now: Date, processingsSoFar: number): boolean {
  return processingsSoFar < MAX_PROCESSINGS && now.getTime() <= reprocessUntil(firstProcessedAt).getTime();
}
