// The one way Larderly writes a calendar date, on screens, in e-mails, push messages and CSV help.
import { format, parseISO } from 'date-fns';

/** "Tue, Jun 9" for 2026-06-09; with the year ("Tue, Aug 31, 2027") when it is not `thisYear`. */
export function dateWords(isoDate: string, thisYear = new Date().getFullYear()): string {
  const day = parseISO(isoDate);
  return format(day, day.getFullYear() === thisYear ? 'EEE, MMM d' : 'EEE, MMM d, yyyy');
}

/** "Jun 9", for the week board's column heads and a week's range. */
export function monthDayWords(isoDate: string): string {
  return format(parseISO(isoDate), 'MMM d');
}

/** "Tuesday", or "T" when `narrow`. */
export function weekdayWords(isoDate: string, narrow = false): string {
  return format(parseISO(isoDate), narrow ? 'EEEEE' : 'EEEE');
}

/** "Dec" for 2026-12. */
export function monthWords(isoMonth: string): string {
  return format(parseISO(`${isoMonth}-01`), 'MMM');
}

/** Index 0 = Sunday, as the household's week start and JavaScript's getDay count. */
export const WEEKDAY_NAMES = ['Sunday', 'Monday', 'Tuesday', 'Wednesday', 'Thursday', 'Friday', 'Saturday'] as const;
