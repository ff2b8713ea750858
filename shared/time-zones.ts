// Time zones the same way on both sides: whether a name is one the runtime knows, and the date there.
import { dateFormatter } from './words/intl-format';

export function isTimeZone(zone: string): boolean {
  try {
    new Intl.DateTimeFormat('en', { timeZone: zone });
    return true;
  } catch {
    return false;
  }
}

/** The calendar date at an instant in a time zone, as YYYY-MM-DD (the household's today, given now; 'en-CA' writes it so). */
export function calendarDateIn(timeZone: string, at: Date = new Date()): string {
  return dateFormatter('en-CA', { timeZone, year: 'numeric', month: '2-digit', day: '2-digit' }).format(at);
}

/** The hour of the day (0-23) at an instant in a time zone (a plain number in any locale with hourCycle h23). */
export function hourOfDayIn(timeZone: string, at: Date = new Date()): number {
  return Number(dateFormatter('en-CA', { timeZone, hour: '2-digit', hourCycle: 'h23' }).format(at));
}
