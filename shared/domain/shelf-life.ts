// How long a jar keeps: best quality for a sealed jar, use-by for an opened one, and what to do with an unsealed one.
import { addDays, addMonths, requireIsoDate } from './dates';
import { requireWholeNumber } from './validate';

/** A jar's life: on the shelf (sealed), in the fridge (opened), and its three endings: eaten, thrown out, given away. */
export const JAR_STATES = ['sealed', 'opened', 'finished', 'discarded', 'given'] as const;
export type JarState = (typeof JAR_STATES)[number];

/** NCHFP, "Storing Home Canned Foods": for best quality, use home-canned food within one year. */
export const BEST_QUALITY_MONTHS = 12;

/** NCHFP, "Storing Home Canned Foods": what to do with a jar whose lid did not seal. */
export const UNSEALED_JAR_ADVICE =
  'This jar did not seal. Refrigerate it and use it within several days, or reprocess it within 24 hours.';

/** The last day of best quality for a jar canned on `cannedOn`; month ends clamp (Feb 29 + 12 months = Feb 28). */
export function bestQualityBy(cannedOn: string, months: number = BEST_QUALITY_MONTHS): string {
  return addMonths(requireIsoDate(cannedOn, 'cannedOn'), requireWholeNumber(months, 'months'));
}

/** The last day to eat from a jar opened on `openedOn` that keeps `useWithinDays` days once open. */
export function useBy(openedOn: string, useWithinDays: number): string {
  return addDays(requireIsoDate(openedOn, 'openedOn'), requireWholeNumber(useWithinDays, 'useWithinDays'));
}
