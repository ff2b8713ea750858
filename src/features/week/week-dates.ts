import { addDays } from '@shared/domain';
import { calendarDateIn } from '@shared/time-zones';
import { weekStartOf } from '@shared/domain';

export const currentWeekStart = (timeZone: string, weekStartsOn: number) =>
  weekStartOf(calendarDateIn(timeZone), weekStartsOn);
export const shiftWeek = (start: string, weeks: number) => addDays(start, weeks * 7);
