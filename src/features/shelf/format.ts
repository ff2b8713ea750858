// Dates, jar sizes and processing words as the shelf screens show them.
import { JAR_SIZE_NAMES } from '@shared/jar-size-names';
import type { JarSize } from '@shared/domain';

const LONG_DATE = new Intl.DateTimeFormat('en-US', { month: 'short', day: 'numeric', year: 'numeric', timeZone: 'UTC' });

/** "Sep 14, 2025" for 2025-09-14. */
export function longDate(isoDate: string): string {
  return LONG_DATE.format(new Date(`${isoDate}T00:00:00Z`));
}

export function jarSizeName(size: JarSize): string {
  return JAR_SIZE_NAMES[size];
}

export { feet } from '@shared/shelf-words';

export function heatWords(heat: number): string {
  return ['not hot', 'a little warm', 'warm', 'hot', 'very hot', 'fiery'][heat] ?? `heat ${heat}`;
}
