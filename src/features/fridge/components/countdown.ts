import { count } from '@shared/day-words';

export type CountdownTone = 'info' | 'soon' | 'past';

/** How urgent an opened jar is: tomato red only once its use-by has passed. */
export function countdown(daysLeft: number): { text: string; tone: CountdownTone } {
  if (daysLeft < 0) return { text: `Past use-by by ${count(-daysLeft, 'day')}`, tone: 'past' };
  if (daysLeft === 0) return { text: 'Use today', tone: 'soon' };
  if (daysLeft <= 3) return { text: `${count(daysLeft, 'day')} left`, tone: 'soon' };
  return { text: `${daysLeft} days left`, tone: 'info' };
}
