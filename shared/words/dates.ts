// The one way Larderly writes a calendar date, on screens, in e-mails, push messages and CSV help, in US English.
// Written from the two name tables below, not with Intl or a date library's locale: the browser's Intl loads its
// locale data on the first date a screen shows (23-67 ms of the main thread in Chromium here, measured, on every
// first page load), and date-fns's format with its en-US locale adds 4.6 KB (brotli) to the signed-in code.
// tests/unit/words.test.ts checks every day of three years against Intl's en-US words.

/** Index 0 = Sunday, as the household's week start and JavaScript's getDay count. */
export const WEEKDAY_NAMES = ['Sunday', 'Monday', 'Tuesday', 'Wednesday', 'Thursday', 'Friday', 'Saturday'] as const;
const MONTH_NAMES = ['Jan', 'Feb', 'Mar', 'Apr', 'May', 'Jun', 'Jul', 'Aug', 'Sep', 'Oct', 'Nov', 'Dec'] as const;

/** Year, month (1-12), day and weekday (0 = Sunday) of a YYYY-MM-DD date, the calendar day whatever the zone. */
function partsOf(isoDate: string) {
  const [year, month, day] = (
    /^\d{4}-\d{2}-\d{2}$/.test(isoDate) ? isoDate.split('-').map(Number) : [NaN, NaN, NaN]
  ) as [number, number, number];
  // Noon UTC of that day: its UTC weekday is the date's own.
  const noon = new Date(Date.UTC(year, month - 1, day, 12));
  // The words the platform's Date and Intl throw, with the value: not a date, or a day the month does not have.
  if (noon.getUTCDate() !== day || noon.getUTCMonth() !== month - 1)
    throw new RangeError(`Invalid time value: "${isoDate}" is not a date (YYYY-MM-DD)`);
  return { year, month, day, weekday: noon.getUTCDay() };
}
const shortWeekday = (weekday: number) => WEEKDAY_NAMES[weekday]!.slice(0, 3);

/** "Tue, Jun 9" for 2026-06-09; with the year ("Tue, Aug 31, 2027") when it is not `thisYear`. */
export function dateWords(isoDate: string, thisYear = new Date().getFullYear()): string {
  const { year, month, day, weekday } = partsOf(isoDate);
  return `${shortWeekday(weekday)}, ${MONTH_NAMES[month - 1]} ${day}${year === thisYear ? '' : `, ${year}`}`;
}

/** "Jul 31, 2026": a printed label's date, which is read for a year or more, so it always carries the year. */
export function labelDateWords(isoDate: string): string {
  const { year, month, day } = partsOf(isoDate);
  return `${MONTH_NAMES[month - 1]} ${day}, ${year}`;
}

/** "Jun 9", for the week board's column heads and a week's range. */
export function monthDayWords(isoDate: string): string {
  const { month, day } = partsOf(isoDate);
  return `${MONTH_NAMES[month - 1]} ${day}`;
}

/** "Tuesday", or "T" when `narrow`. */
export function weekdayWords(isoDate: string, narrow = false): string {
  const name = WEEKDAY_NAMES[partsOf(isoDate).weekday]!;
  return narrow ? name[0]! : name;
}

/** "Dec" for 2026-12. */
export function monthWords(isoMonth: string): string {
  return MONTH_NAMES[partsOf(`${isoMonth}-01`).month - 1]!;
}
