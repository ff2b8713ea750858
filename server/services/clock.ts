import { calendarDateIn, hourOfDayIn } from '../../shared/time-zones';

/** The one place the server asks what time it is, so tests can set the clock. */
export const clock = {
  now: () => new Date(),
};

/** Today's calendar date in a time zone, as YYYY-MM-DD. */
export function todayIn(timeZone: string, now = clock.now()) {
  return calendarDateIn(timeZone, now);
}

/** The hour of the day (0-23) in a time zone. */
export function hourIn(timeZone: string, now = clock.now()) {
  return hourOfDayIn(timeZone, now);
}
