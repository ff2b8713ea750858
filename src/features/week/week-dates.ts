import { addDays } from '@shared/domain';
import { weekStartOf } from '@shared/schemas/week';

/** Today's date in the household's time zone, as the server counts it. */
export function householdToday(timeZone: string) {
  return new Intl.DateTimeFormat('en-CA', { timeZone, year: 'numeric', month: '2-digit', day: '2-digit' }).format(new Date());
}

export const currentWeekStart = (timeZone: string, weekStartsOn: number) => weekStartOf(householdToday(timeZone), weekStartsOn);
export const shiftWeek = (start: string, weeks: number) => addDays(start, weeks * 7);
