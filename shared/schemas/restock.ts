import type { JarSize, RestockReason } from '../domain';

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
  /** What the household ate: finished jars only, never the ones given away. */
  historyTbspPerDay: number;
  /** Jars given away in the 84 days the eating rate looks back over, counted apart. */
  givenJarsInHistory: number;
  /** Jars of this product given away this calendar year. */
  givenThisYear: number;
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
  /** Jars of every product given away this calendar year. */
  givenThisYear: number;
  forecasts: RestockForecastView[];
  suggestions: RestockSuggestionView[];
}
