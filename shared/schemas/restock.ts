import { z } from 'zod';
import type { JarSize, RestockReason } from '../domain';

export const restockProductPatch = z
  .object({
    favourite: z.boolean({ error: 'Favourite is true or false.' }).optional(),
    minJars: z.number({ error: 'Enter the minimum as a number of jars.' }).int('Use a whole number of jars.').min(0, 'The minimum cannot be below 0.').max(500, 'Use at most 500 jars.').optional(),
  })
  .strict()
  .refine((patch) => Object.keys(patch).length > 0, 'Send favourite or minJars.');
export type RestockProductPatch = z.infer<typeof restockProductPatch>;

export interface MonthlyUse {
  /** YYYY-MM */
  month: string;
  tbsp: number;
}

export interface RestockForecastView {
  productId: string;
  productName: string;
  colour: string;
  favourite: boolean;
  minJars: number;
  jarSize: JarSize;
  useWithinDays: number;
  harvestMonths: number[];
  sealedJars: number;
  jarsOnHand: number;
  onHandTbsp: number;
  dailyTbsp: number;
  historyTbspPerDay: number;
  plannedTbspPerDay: number;
  runOutOn: string | null;
  jarSizeAdvice: { size: JarSize | null; cautions: string[] };
  monthlyUse: MonthlyUse[];
  hasRecipe: boolean;
  /** An open restock to-do already planned for it. */
  openTodoId: string | null;
}

export interface RestockSuggestionView {
  productId: string;
  productName: string;
  reason: RestockReason;
  /** The reason in plain words. */
  why: string;
  runOutOn: string | null;
  dailyTbsp: number;
  suggestedJars: number;
  jarSize: JarSize;
  lastsUntil: string;
  hasRecipe: boolean;
  openTodoId: string | null;
}

export interface RestockView {
  today: string;
  forecasts: RestockForecastView[];
  suggestions: RestockSuggestionView[];
}
