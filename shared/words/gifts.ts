// The words of a jar given away: the jar's page, the shelf, the restock screen and the jar's history.
import { count } from './units';

export const GIFT_WORDS = {
  action: 'Give away',
  to: 'Given to (optional)',
  toHint: 'A name or a few words, such as “the Okafors next door”.',
  confirm: 'Give it away',
  cancel: 'Keep it',
  /** The ending, beside finished and discarded. */
  ended: 'Given away',
  why: 'A jar given away leaves the shelf and its empty jar does not come back. It is counted apart from what you ate, so it does not raise the eating rate.',
} as const;

/** "Given away Dec 1 to the Okafors" for a jar's page and history. */
export function givenWords(dateInWords: string, to: string | null): string {
  return `${GIFT_WORDS.ended} ${dateInWords}${to ? ` to ${to}` : ''}`;
}

/** "3 jars given away this year" (Shelf, Restock); "none given away this year yet". */
export function giftsThisYearWords(jars: number, year: number): string {
  return jars === 0 ? `No jars given away in ${year} yet.` : `${count(jars, 'jar')} given away in ${year}.`;
}
