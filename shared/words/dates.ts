// The one way Larderly writes a calendar date, on screens, in e-mails, push messages and CSV help.
// The platform's Intl (en-US) writes the words, so no locale tables ship to the browser; each kind of date words
// keeps its one formatter (a to-do list's plans and a week's board write dozens of dates per answer).
import { dateFormatter } from './intl-format';

function intlFormat(date: Date, options: Intl.DateTimeFormatOptions): string {
  return dateFormatter('en-US', options).format(date);
}

/** Local midnight of a YYYY-MM-DD date (the words name the calendar day, whatever the zone). */
function parseISO(isoDate: string): Date {
  const [year, month, day] = isoDate.split('-').map(Number);
  const date = new Date(2000, 0, 1);
  date.setFullYear(year!, month! - 1, day);
  return date;
}

/** "Tue, Jun 9" for 2026-06-09; with the year ("Tue, Aug 31, 2027") when it is not `thisYear`. */
export function dateWords(isoDate: string, thisYear = new Date().getFullYear()): string {
  const day = parseISO(isoDate);
  return intlFormat(day, {
    weekday: 'short',
    month: 'short',
    day: 'numeric',
    year: day.getFullYear() === thisYear ? undefined : 'numeric',
  });
}

/** "Jul 31, 2026": a printed label's date, which is read for a year or more, so it always carries the year. */
export function labelDateWords(isoDate: string): string {
  return intlFormat(parseISO(isoDate), { month: 'short', day: 'numeric', year: 'numeric' });
}

/** "Jun 9", for the week board's column heads and a week's range. */
export function monthDayWords(isoDate: string): string {
  return intlFormat(parseISO(isoDate), { month: 'short', day: 'numeric' });
}

/** "Tuesday", or "T" when `narrow`. */
export function weekdayWords(isoDate: string, narrow = false): string {
  return intlFormat(parseISO(isoDate), { weekday: narrow ? 'narrow' : 'long' });
}

/** "Dec" for 2026-12. */
export function monthWords(isoMonth: string): string {
  return intlFormat(parseISO(`${isoMonth}-01`), { month: 'short' });
}

/** Index 0 = Sunday, as the household's week start and JavaScript's getDay count. */
export const WEEKDAY_NAMES = ['Sunday', 'Monday', 'Tuesday', 'Wednesday', 'Thursday', 'Friday', 'Saturday'] as const;
