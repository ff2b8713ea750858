// Calendar dates as ISO YYYY-MM-DD strings, counted in whole UTC days so no time zone can shift them.
import { describeValue, requireWholeNumber } from './validate';

const ISO_DATE = /^(\d{4})-(\d{2})-(\d{2})$/;
const MS_PER_DAY = 86_400_000;

interface CalendarDate {
  year: number;
  month: number;
  day: number;
}

function utcMs(year: number, month: number, day: number): number {
  // setUTCFullYear, unlike Date.UTC, does not map years 0-99 to the 1900s.
  const date = new Date(0);
  date.setUTCFullYear(year, month - 1, day);
  return date.getTime();
}

function parseIsoDate(isoDate: unknown, label: string): CalendarDate {
  const match = typeof isoDate === 'string' ? ISO_DATE.exec(isoDate) : null;
  if (!match) throw new RangeError(`${label} must be a date written YYYY-MM-DD; got ${describeValue(isoDate)}`);
  const [year, month, day] = [Number(match[1]), Number(match[2]), Number(match[3])];
  if (month < 1 || month > 12 || day < 1 || day > daysInMonth(year, month)) {
    throw new RangeError(`${label} ${isoDate} is not a real calendar date`);
  }
  return { year, month, day };
}

function format({ year, month, day }: CalendarDate): string {
  return `${String(year).padStart(4, '0')}-${String(month).padStart(2, '0')}-${String(day).padStart(2, '0')}`;
}

export function daysInMonth(year: number, month: number): number {
  return new Date(utcMs(year, month + 1, 0)).getUTCDate();
}

/** Throws a RangeError unless the value is a real YYYY-MM-DD calendar date; returns it unchanged. */
export function requireIsoDate(isoDate: unknown, label = 'date'): string {
  parseIsoDate(isoDate, label);
  return isoDate as string;
}

/** Whole days since 1970-01-01. */
export function dayNumber(isoDate: string, label = 'date'): number {
  const { year, month, day } = parseIsoDate(isoDate, label);
  return utcMs(year, month, day) / MS_PER_DAY;
}

export function isoDateFromDayNumber(days: number): string {
  const date = new Date(days * MS_PER_DAY);
  return format({ year: date.getUTCFullYear(), month: date.getUTCMonth() + 1, day: date.getUTCDate() });
}

export function addDays(isoDate: string, days: number): string {
  requireWholeNumber(days, 'days', -Infinity);
  return isoDateFromDayNumber(dayNumber(isoDate) + days);
}

/** Adds calendar months; a day the target month lacks clamps to its last day (Jan 31 + 1 month = Feb 28 or 29). */
export function addMonths(isoDate: string, months: number): string {
  requireWholeNumber(months, 'months', -Infinity);
  const { year, month, day } = parseIsoDate(isoDate, 'date');
  const monthIndex = year * 12 + (month - 1) + months;
  const targetYear = Math.floor(monthIndex / 12);
  const targetMonth = monthIndex - targetYear * 12 + 1;
  return format({ year: targetYear, month: targetMonth, day: Math.min(day, daysInMonth(targetYear, targetMonth)) });
}

/** Days from `from` to `to`: positive when `to` is later, 0 on the same day. */
export function daysBetween(from: string, to: string): number {
  return dayNumber(to, 'to') - dayNumber(from, 'from');
}

export function monthOf(isoDate: string): number {
  return parseIsoDate(isoDate, 'date').month;
}

export function yearOf(isoDate: string): number {
  return parseIsoDate(isoDate, 'date').year;
}

export function lastDayOfMonth(year: number, month: number): string {
  return format({ year, month, day: daysInMonth(year, month) });
}

/** 1970-01-01, day 0 of the calendar count, was a Thursday (4); 0 = Sunday. */
export function dayOfWeek(isoDate: string): number {
  return (((dayNumber(isoDate) + 4) % 7) + 7) % 7;
}

/** The first day of the week (the household's week start, 0 = Sunday) that holds `isoDate`. */
export function weekStartOf(isoDate: string, weekStartsOn: number): string {
  return addDays(isoDate, -((dayOfWeek(isoDate) - weekStartsOn + 7) % 7));
}

/** The seven dates of the week that starts on `start`. */
export function weekDates(start: string): string[] {
  return Array.from({ length: 7 }, (_, i) => addDays(start, i));
}
