// How many days an opened jar has left, in the same words on the fridge, Today and the jar's page.
import { count } from './units';

export type CountdownTone = 'info' | 'soon' | 'past';

/** Tomato red only once the use-by has passed; honey from 3 days before. */
export function countdown(daysLeft: number): { text: string; tone: CountdownTone } {
  if (daysLeft < 0) return { text: `Past use-by by ${count(-daysLeft, 'day')}`, tone: 'past' };
  if (daysLeft === 0) return { text: 'Use today', tone: 'soon' };
  return { text: `${count(daysLeft, 'day')} left`, tone: daysLeft <= 3 ? 'soon' : 'info' };
}
