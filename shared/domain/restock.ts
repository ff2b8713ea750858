// Restock suggestions: which favourites need a new batch, why, and how many jars last until the next harvest.
import { addDays, daysBetween, lastDayOfMonth, monthOf, requireIsoDate, yearOf } from './dates';
import {
  forecastProduct,
  readFinishedPortion,
  readForecastJar,
  readGivenJar,
  readPlannedDraw,
  type FinishedPortion,
  type ForecastJar,
  type GivenJar,
  type PlannedDraw,
  type ProductForecast,
} from './forecast';
import { requireId, type Id } from './ids';
import { JAR_SIZES, jarCapacityTbsp, type JarSize } from './units';
import { requireBoolean, requireList, requireOneOf, requireRecord, requireWholeNumber } from './validate';

/** Two weeks: time to gather produce and make a batch. */
export const DEFAULT_LEAD_DAYS = 14;

export const RESTOCK_REASONS = ['runs-out-soon', 'below-minimum'] as const;
export type RestockReason = (typeof RESTOCK_REASONS)[number];

export interface RestockProduct {
  id: Id;
  favourite: boolean;
  minJars: number;
  /** Months (1-12) when the produce comes in; none listed means it can be made any month. */
  harvestMonths: number[];
  jarSize: JarSize;
}

export interface RestockInput {
  today: string;
  products: RestockProduct[];
  jars: readonly ForecastJar[];
  finished: readonly FinishedPortion[];
  /** Jars given away: counted apart, never as eaten. */
  given?: readonly GivenJar[];
  planned: readonly PlannedDraw[];
  leadDays?: number;
}

export interface RestockForecast extends ProductForecast {
  /** Whole jars of the product's size left after the draw on today + leadDays. */
  projectedJars: number;
}

export interface RestockSuggestion {
  productId: Id;
  reason: RestockReason;
  runOutOn: string | null;
  dailyTbsp: number;
  suggestedJars: number;
  /** The last day of the next harvest month, which the suggested jars are meant to reach. */
  lastsUntil: string;
}

export interface RestockResult {
  forecasts: RestockForecast[];
  suggestions: RestockSuggestion[];
}

const ALL_MONTHS = [1, 2, 3, 4, 5, 6, 7, 8, 9, 10, 11, 12];
// Sums of fractional tablespoons must not tip an exact whole number of jars over to the next one.
const CRUMB_JARS = 1e-9;

function readProduct(product: RestockProduct, index: number): RestockProduct {
  const label = `products[${index}]`;
  requireRecord(product, label);
  return {
    id: requireId(product.id, `${label}.id`),
    favourite: requireBoolean(product.favourite, `${label}.favourite`),
    minJars: requireWholeNumber(product.minJars, `${label}.minJars`),
    harvestMonths: requireList<number>(product.harvestMonths, `${label}.harvestMonths`).map((month, at) => {
      const checked = requireWholeNumber(month, `${label}.harvestMonths[${at}]`, 1);
      if (checked > 12)
        throw new RangeError(`${label}.harvestMonths[${at}] must be a month from 1 to 12; got ${checked}`);
      return checked;
    }),
    jarSize: requireOneOf(product.jarSize, JAR_SIZES, `${label}.jarSize`),
  };
}

/** The last day of the first harvest month after the current one, next year's where needed. */
export function endOfNextHarvestMonth(today: string, harvestMonths: number[]): string {
  const months = [...new Set(harvestMonths.length > 0 ? harvestMonths : ALL_MONTHS)].sort((a, b) => a - b);
  const current = monthOf(today);
  const later = months.find((month) => month > current);
  return later === undefined ? lastDayOfMonth(yearOf(today) + 1, months[0]) : lastDayOfMonth(yearOf(today), later);
}

function suggestedJars(
  today: string,
  product: RestockProduct,
  forecast: ProductForecast,
): { jars: number; lastsUntil: string } {
  const lastsUntil = endOfNextHarvestMonth(today, product.harvestMonths);
  const days = daysBetween(today, lastsUntil) + 1;
  const jarsNeeded = Math.ceil((forecast.dailyTbsp * days) / jarCapacityTbsp(product.jarSize) - CRUMB_JARS);
  return { jars: Math.max(1, jarsNeeded - forecast.jarsOnHand + product.minJars), lastsUntil };
}

function reasonFor(product: RestockProduct, forecast: RestockForecast, horizon: string): RestockReason | null {
  if (forecast.runOutOn !== null && forecast.runOutOn < horizon) return 'runs-out-soon';
  if (forecast.sealedJars < product.minJars || forecast.projectedJars < product.minJars) return 'below-minimum';
  return null;
}

export function restockSuggestions(input: RestockInput): RestockResult {
  requireRecord(input, 'restock input');
  const today = requireIsoDate(input.today, 'today');
  const leadDays = requireWholeNumber(input.leadDays ?? DEFAULT_LEAD_DAYS, 'leadDays');
  const products = requireList<RestockProduct>(input.products, 'products').map(readProduct);
  const jars = requireList<ForecastJar>(input.jars, 'jars').map(readForecastJar);
  const finished = requireList<FinishedPortion>(input.finished, 'finished').map(readFinishedPortion);
  const given = requireList<GivenJar>(input.given ?? [], 'given').map(readGivenJar);
  const planned = requireList<PlannedDraw>(input.planned, 'planned').map(readPlannedDraw);
  const horizon = addDays(today, leadDays);

  const forecasts: RestockForecast[] = [];
  const suggestions: RestockSuggestion[] = [];
  for (const product of products) {
    const base = forecastProduct({
      productId: product.id,
      today,
      horizonDays: leadDays,
      jars,
      finished,
      given,
      planned,
    });
    const forecast = {
      ...base,
      projectedJars: Math.floor(base.tbspLeftOnHorizon / jarCapacityTbsp(product.jarSize) + CRUMB_JARS),
    };
    forecasts.push(forecast);
    const reason = product.favourite ? reasonFor(product, forecast, horizon) : null;
    if (reason === null) continue;
    const { jars: jarCount, lastsUntil } = suggestedJars(today, product, forecast);
    suggestions.push({
      productId: product.id,
      reason,
      runOutOn: forecast.runOutOn,
      dailyTbsp: forecast.dailyTbsp,
      suggestedJars: jarCount,
      lastsUntil,
    });
  }
  return { forecasts, suggestions };
}
