import { z } from 'zod';

/** "18:30": when a meal slot is eaten, in the household's time zone. */
const clockTime = z.string().regex(/^([01]\d|2[0-3]):[0-5]\d$/, 'Enter a time such as 07:30 or 18:30.');

export const mealTimesBody = z
  .object({ breakfast: clockTime, lunch: clockTime, snack: clockTime, dinner: clockTime })
  .strict();
export type MealTimes = z.infer<typeof mealTimesBody>;

export const DEFAULT_MEAL_TIMES: MealTimes = { breakfast: '08:00', lunch: '12:30', snack: '15:30', dinner: '18:30' };

/** The signed-in person's calendar address for a household. The address itself is shown once, when made. */
export interface CalendarFeedView {
  on: boolean;
  createdAt: string | null;
  lastFetchedAt: string | null;
  mealTimes: MealTimes;
  /** Only in the answer that turns the address on or renews it. */
  address?: string;
}
