// The restock list: each product's forecast, the favourites that need a batch and why, in plain words.
import { Op } from 'sequelize';
import {
  addMonths,
  jarSizeAdvice,
  yearOf,
  restockSuggestions,
  type Id,
  type RestockForecast,
  type RestockSuggestion,
} from '../../../shared/domain';
import { count, dateWords, tbspPerDay } from '../../../shared/words';
import type {
  MonthlyUse,
  RestockForecastView,
  RestockSuggestionView,
  RestockView,
} from '../../../shared/schemas/restock';
import type { UnitSystem } from '../../../shared/domain';
import { Household, Recipe, Todo, type Product } from '../../db/models';
import { todayIn } from '../clock';
import { bothVersions, frozen, householdMemo, type HouseholdVersions } from '../household-memo';
import { CHART_MONTHS, stockSnapshot, useWithinDaysOf, type StockSnapshot } from './stock-snapshot';

function whyInWords(
  today: string,
  suggestion: RestockSuggestion,
  forecast: RestockForecast,
  product: Product,
  system: UnitSystem,
): string {
  if (suggestion.reason === 'runs-out-soon') {
    if (forecast.jarsOnHand === 0) return 'None left on the shelf or in the fridge.';
    return `At about ${tbspPerDay(forecast.dailyTbsp, system)}, the last jar is empty by ${dateWords(suggestion.runOutOn!, yearOf(today))}.`;
  }
  return `${count(forecast.sealedJars, 'sealed jar')} left; you keep at least ${product.minJars}.`;
}

function monthlyUse(snapshot: StockSnapshot, productId: string): MonthlyUse[] {
  const months = Array.from({ length: CHART_MONTHS }, (_, i) =>
    addMonths(snapshot.today, i + 1 - CHART_MONTHS).slice(0, 7),
  );
  const byMonth = new Map(months.map((month) => [month, 0]));
  for (const entry of snapshot.finished) {
    const month = entry.finishedOn.slice(0, 7);
    if (entry.productId === productId && byMonth.has(month)) byMonth.set(month, byMonth.get(month)! + entry.tbsp);
  }
  return months.map((month) => ({ month, tbsp: byMonth.get(month)! }));
}

async function planningState(householdId: string) {
  const [recipes, todos] = await Promise.all([
    Recipe.findAll({ where: { householdId }, attributes: ['productId'] }),
    Todo.findAll({
      where: { householdId, kind: 'restock', done: false, productId: { [Op.ne]: null } },
      attributes: ['id', 'productId'],
      order: [['position', 'ASC']],
    }),
  ]);
  const openTodo = new Map<string, string>();
  for (const todo of todos) if (!openTodo.has(todo.productId!)) openTodo.set(todo.productId!, todo.id);
  return { withRecipe: new Set(recipes.map((recipe) => recipe.productId)), openTodo };
}

/**
 * The household's restock list for today, worked out over its real shelf, history and plan; with the request's
 * versions, once per change of the household (Today shows the same list).
 */
export async function restockView(household: Household, versions?: HouseholdVersions): Promise<RestockView> {
  const today = todayIn(household.timeZone);
  const snapshot = await stockSnapshot(household.id, today, versions);
  return restockFromSnapshot(snapshot, household.unitSystem, versions);
}

const restockLists = householdMemo<RestockView>();

/** The restock list from a snapshot; `versions` must be the ones the snapshot was read at. */
export function restockFromSnapshot(
  snapshot: StockSnapshot,
  system: UnitSystem = 'us',
  versions?: HouseholdVersions,
): Promise<RestockView> {
  return restockLists(
    `${snapshot.householdId} ${snapshot.today} ${system}`,
    versions && bothVersions(versions),
    async () => frozen(await restockListOf(snapshot, system)),
  );
}

async function restockListOf(snapshot: StockSnapshot, system: UnitSystem): Promise<RestockView> {
  const { products, today } = snapshot;
  const { withRecipe, openTodo } = await planningState(snapshot.householdId);
  const result = restockSuggestions({
    today,
    products: products.map((p) => ({
      id: p.id,
      favourite: p.favourite,
      minJars: p.minJars,
      harvestMonths: p.harvestMonths,
      jarSize: p.jarSize,
    })),
    jars: snapshot.shelfJars.map((jar) => ({
      productId: jar.productId,
      state: jar.state,
      remainingTbsp: jar.remainingTbsp,
    })),
    finished: snapshot.finished,
    given: snapshot.given,
    planned: snapshot.planned,
  });
  const yearStart = `${today.slice(0, 4)}-01-01`;
  const givenThisYear = snapshot.given.filter((gift) => gift.givenOn >= yearStart);
  const byId = new Map<Id, Product>(products.map((p) => [p.id, p]));
  const forecastOf = new Map<Id, RestockForecast>(result.forecasts.map((f) => [f.productId, f]));

  const suggestions: RestockSuggestionView[] = result.suggestions.map((suggestion) => {
    const product = byId.get(suggestion.productId)!;
    return {
      ...suggestion,
      productId: product.id,
      productName: product.name,
      why: whyInWords(today, suggestion, forecastOf.get(product.id)!, product, system),
      jarSize: product.jarSize,
      hasRecipe: withRecipe.has(product.id),
      openTodoId: openTodo.get(product.id) ?? null,
    };
  });
  const suggested = new Set(suggestions.map((s) => s.productId));

  const forecasts: RestockForecastView[] = result.forecasts.map((forecast) => {
    const product = byId.get(forecast.productId)!;
    const useWithinDays = useWithinDaysOf(product);
    return {
      productId: product.id,
      productName: product.name,
      colour: product.colour,
      favourite: product.favourite,
      minJars: product.minJars,
      jarSize: product.jarSize,
      useWithinDays,
      harvestMonths: product.harvestMonths,
      sealedJars: forecast.sealedJars,
      jarsOnHand: forecast.jarsOnHand,
      onHandTbsp: forecast.onHandTbsp,
      dailyTbsp: forecast.dailyTbsp,
      historyTbspPerDay: forecast.historyTbspPerDay,
      givenJarsInHistory: forecast.givenJarsInHistory,
      givenThisYear: givenThisYear.filter((gift) => gift.productId === product.id).length,
      plannedTbspPerDay: forecast.plannedTbspPerDay,
      runOutOn: forecast.runOutOn,
      jarSizeAdvice: jarSizeAdvice(forecast.dailyTbsp, useWithinDays),
      monthlyUse: monthlyUse(snapshot, product.id),
      hasRecipe: withRecipe.has(product.id),
      openTodoId: openTodo.get(product.id) ?? null,
    };
  });
  // Favourites that need a batch first, then the other favourites, then the rest; by name within each.
  const rank = (f: RestockForecastView) => (suggested.has(f.productId) ? 0 : f.favourite ? 1 : 2);
  forecasts.sort((a, b) => rank(a) - rank(b) || a.productName.localeCompare(b.productName));
  return { today, givenThisYear: givenThisYear.length, forecasts, suggestions };
}

/** The restock suggestions for one household, for the weekly digest and other callers outside a request. */
export async function restockFor(householdId: string, today?: string): Promise<RestockSuggestionView[]> {
  const household = await Household.findByPk(householdId);
  if (!household) return [];
  const snapshot = await stockSnapshot(household.id, today ?? todayIn(household.timeZone));
  return (await restockFromSnapshot(snapshot, household.unitSystem)).suggestions;
}
