// Calendar dates in words, the same on the server (e-mails) and in the browser.
const SHORT_DAY = new Intl.DateTimeFormat('en-US', { weekday: 'short', month: 'short', day: 'numeric', timeZone: 'UTC' });
const SHORT_DAY_WITH_YEAR = new Intl.DateTimeFormat('en-US', { weekday: 'short', month: 'short', day: 'numeric', year: 'numeric', timeZone: 'UTC' });
const MONTH = new Intl.DateTimeFormat('en-US', { month: 'short', timeZone: 'UTC' });

/** "Thu, Dec 10" for 2026-12-10, with the year ("Tue, Aug 31, 2027") when it is not this year. */
export function shortDay(isoDate: string, thisYear = new Date().getUTCFullYear()): string {
  const day = new Date(`${isoDate}T00:00:00Z`);
  return (day.getUTCFullYear() === thisYear ? SHORT_DAY : SHORT_DAY_WITH_YEAR).format(day);
}

/** "Dec" for 2026-12. */
export function shortMonth(isoMonth: string): string {
  return MONTH.format(new Date(`${isoMonth}-01T00:00:00Z`));
}

/** "1 jar", "3 jars". */
export function count(n: number, singular: string, plural = `${singular}s`): string {
  return `${n} ${n === 1 ? singular : plural}`;
}

/** A rate such as 0.35 tablespoons a day, rounded to what a person can picture. */
export function tbspPerDay(rate: number): string {
  const rounded = rate >= 1 ? Math.round(rate * 10) / 10 : Math.round(rate * 100) / 100;
  return `${rounded} tbsp a day`;
}

/** Index 0 = Sunday, as the household's week start and JavaScript's getDay count. */
export const WEEKDAY_NAMES = ['Sunday', 'Monday', 'Tuesday', 'Wednesday', 'Thursday', 'Friday', 'Saturday'] as const;
