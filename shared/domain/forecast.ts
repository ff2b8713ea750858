// A product's consumption forecast: history rate, planned rate, and the day the shelf runs out.
import { dayNumber, isoDateFromDayNumber, requireIsoDate } from './dates';
import { requireId, type Id } from './ids';
import { JAR_STATES, type JarState } from './shelf-life';
import { requireNonNegative, requireOneOf, requireRecord } from './validate';

/** The history rate looks back over the 84 days (twelve weeks) before today. */
export const HISTORY_DAYS = 84;

// A rate so small that the run-out falls past 9999-12-31 cannot be written as a date: it counts as never.
const LAST_WRITABLE_DAY = dayNumber('9999-12-31');

// Tablespoon sums carry floating-point crumbs; a shortfall smaller than this is no shortfall.
const CRUMB_TBSP = 1e-9;

export interface ForecastJar {
  productId: Id;
  state: JarState;
  remainingTbsp: number;
}

export interface FinishedPortion {
  productId: Id;
  finishedOn: string;
  tbsp: number;
}

/** A jar given away: it left the shelf, but nobody in the household ate it. */
export interface GivenJar {
  productId: Id;
  givenOn: string;
}

export interface PlannedDraw {
  productId: Id;
  date: string;
  tbsp: number;
}

export interface ProductForecast {
  productId: Id;
  /** Tablespoons finished in the 84 days before today, divided by 84. Gifts are not in it. */
  historyTbspPerDay: number;
  /** Jars given away in the same 84 days, counted apart from what the household ate. */
  givenJarsInHistory: number;
  /** Planned tablespoons divided by the days from today to the last planned date, both included. */
  plannedTbspPerDay: number;
  /** The larger of the two rates. */
  dailyTbsp: number;
  onHandTbsp: number;
  sealedJars: number;
  /** Sealed and opened jars. */
  jarsOnHand: number;
  runOutOn: string | null;
  /** Tablespoons left after the draw on the horizon day. */
  tbspLeftOnHorizon: number;
}

export function readForecastJar(jar: ForecastJar, index: number): ForecastJar {
  const label = `jars[${index}]`;
  requireRecord(jar, label);
  return {
    productId: requireId(jar.productId, `${label}.productId`),
    state: requireOneOf(jar.state, JAR_STATES, `${label}.state`),
    remainingTbsp: requireNonNegative(jar.remainingTbsp, `${label}.remainingTbsp`),
  };
}

export function readFinishedPortion(entry: FinishedPortion, index: number): FinishedPortion {
  const label = `finished[${index}]`;
  requireRecord(entry, label);
  return {
    productId: requireId(entry.productId, `${label}.productId`),
    finishedOn: requireIsoDate(entry.finishedOn, `${label}.finishedOn`),
    tbsp: requireNonNegative(entry.tbsp, `${label}.tbsp`),
  };
}

export function readGivenJar(entry: GivenJar, index: number): GivenJar {
  const label = `given[${index}]`;
  requireRecord(entry, label);
  return {
    productId: requireId(entry.productId, `${label}.productId`),
    givenOn: requireIsoDate(entry.givenOn, `${label}.givenOn`),
  };
}

export function readPlannedDraw(entry: PlannedDraw, index: number): PlannedDraw {
  const label = `planned[${index}]`;
  requireRecord(entry, label);
  return {
    productId: requireId(entry.productId, `${label}.productId`),
    date: requireIsoDate(entry.date, `${label}.date`),
    tbsp: requireNonNegative(entry.tbsp, `${label}.tbsp`),
  };
}

interface ForecastQuestion {
  productId: Id;
  today: string;
  horizonDays: number;
  jars: readonly ForecastJar[];
  finished: readonly FinishedPortion[];
  /** Jars given away; they leave the shelf (so they are not in `jars`) and never raise the eating rate. */
  given?: readonly GivenJar[];
  planned: readonly PlannedDraw[];
}

/**
 * Walks forward from today: planned days draw what is planned, days after the last planned date draw
 * the history rate, and the run-out date is the first day whose draw what is left cannot cover.
 */
export function forecastProduct({
  productId,
  today,
  horizonDays,
  jars,
  finished,
  given = [],
  planned,
}: ForecastQuestion): ProductForecast {
  const todayDay = dayNumber(today, 'today');
  const shelfJars = jars.filter(
    (jar) => jar.productId === productId && (jar.state === 'sealed' || jar.state === 'opened'),
  );
  const onHandTbsp = shelfJars.reduce((sum, jar) => sum + jar.remainingTbsp, 0);

  const inHistory = (date: string) => {
    const day = dayNumber(date);
    return day >= todayDay - HISTORY_DAYS && day < todayDay;
  };
  // The eating rate is what the household finished. A jar given away left the shelf without being eaten, so a
  // generous month lowers what is on hand but not the rate at which the household eats (common practice).
  const historyTbsp = finished
    .filter((entry) => entry.productId === productId && inHistory(entry.finishedOn))
    .reduce((sum, entry) => sum + entry.tbsp, 0);
  const historyTbspPerDay = historyTbsp / HISTORY_DAYS;
  const givenJarsInHistory = given.filter((entry) => entry.productId === productId && inHistory(entry.givenOn)).length;

  const plannedByDay = new Map<number, number>();
  for (const entry of planned) {
    const day = dayNumber(entry.date);
    if (entry.productId !== productId || day < todayDay) continue;
    plannedByDay.set(day, (plannedByDay.get(day) ?? 0) + entry.tbsp);
  }
  const lastPlannedDay = plannedByDay.size > 0 ? Math.max(...plannedByDay.keys()) : null;
  const plannedTbsp = [...plannedByDay.values()].reduce((sum, tbsp) => sum + tbsp, 0);
  const plannedTbspPerDay = lastPlannedDay === null ? 0 : plannedTbsp / (lastPlannedDay - todayDay + 1);

  const drawOn = (day: number) =>
    lastPlannedDay !== null && day <= lastPlannedDay ? (plannedByDay.get(day) ?? 0) : historyTbspPerDay;
  const horizonDay = todayDay + horizonDays;
  const walkEnd = Math.max(horizonDay, lastPlannedDay ?? todayDay);
  let left = onHandTbsp;
  let runOutDay: number | null = null;
  let tbspLeftOnHorizon = 0;
  for (let day = todayDay; day <= walkEnd; day += 1) {
    const draw = drawOn(day);
    if (runOutDay === null && draw > left + CRUMB_TBSP) runOutDay = day;
    left = Math.max(0, left - draw);
    if (day === horizonDay) tbspLeftOnHorizon = left;
  }
  if (runOutDay === null && historyTbspPerDay > 0) {
    // Past the walk every day draws the history rate, so the days still covered can be counted at once.
    runOutDay = walkEnd + 1 + Math.floor(left / historyTbspPerDay + CRUMB_TBSP);
  }

  return {
    productId,
    historyTbspPerDay,
    givenJarsInHistory,
    plannedTbspPerDay,
    dailyTbsp: Math.max(historyTbspPerDay, plannedTbspPerDay),
    onHandTbsp,
    sealedJars: shelfJars.filter((jar) => jar.state === 'sealed').length,
    jarsOnHand: shelfJars.length,
    runOutOn: runOutDay === null || runOutDay > LAST_WRITABLE_DAY ? null : isoDateFromDayNumber(runOutDay),
    tbspLeftOnHorizon,
  };
}
