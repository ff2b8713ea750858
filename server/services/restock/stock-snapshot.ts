// One read of what the forecast, the restock list and Today work from: products, jars, history and plan.
import { Op } from 'sequelize';
import {
  addDays,
  addMonths,
  defaultUseWithinDays,
  HISTORY_DAYS,
  type FinishedPortion,
  type GivenJar,
  type PlannedPortion,
} from '../../../shared/domain';
import { Jar, Pairing, PlanEntry, Product } from '../../db/models';

/** The months a use chart shows, the current one included. */
export const CHART_MONTHS = 6;

/** What the forecast, the restock list and Today read of a sealed or opened jar. */
const SHELF_JAR_COLUMNS = [
  'id',
  'productId',
  'code',
  'state',
  'capacityTbsp',
  'remainingTbsp',
  'bestBy',
  'openedOn',
  'useBy',
  'placeId',
] as const;
export type ShelfJar = Pick<Jar, (typeof SHELF_JAR_COLUMNS)[number]>;

export interface StockSnapshot {
  householdId: string;
  today: string;
  products: Product[];
  /** Sealed and opened jars. */
  shelfJars: ShelfJar[];
  /** Jars finished since the start of the chart's first month, each counted as a full jar. */
  finished: FinishedPortion[];
  /** Jars given away since the earlier of the history's start and the first of this year: not eaten, counted apart. */
  given: GivenJar[];
  /** Every pairing of a plan entry from today on: the pairing's portion per serving times the entry's servings. */
  planned: PlannedPortion[];
  /** The plan entry each planned portion (by pairing id) belongs to. */
  entryOf: Map<string, PlanEntry>;
}

export function useWithinDaysOf(product: Product): number {
  return product.useWithinDays ?? defaultUseWithinDays(product.kind);
}

function historyStart(today: string): string {
  const chartStart = `${addMonths(today, 1 - CHART_MONTHS).slice(0, 7)}-01`;
  const forecastStart = addDays(today, -HISTORY_DAYS);
  return chartStart < forecastStart ? chartStart : forecastStart;
}

export async function stockSnapshot(householdId: string, today: string): Promise<StockSnapshot> {
  const yearStart = `${today.slice(0, 4)}-01-01`;
  const givenFrom = historyStart(today) < yearStart ? historyStart(today) : yearStart;
  const [products, shelfJars, finishedJars, givenJars, entries] = await Promise.all([
    Product.findAll({ where: { householdId }, order: [['name', 'ASC']] }),
    // Plain rows, not model instances: every Today and Restock answer worked out reads these, and uses no model method.
    Jar.findAll({
      where: { householdId, state: ['sealed', 'opened'] },
      attributes: [...SHELF_JAR_COLUMNS],
      raw: true,
    }),
    Jar.findAll({
      where: { householdId, state: 'finished', finishedOn: { [Op.gte]: historyStart(today), [Op.lt]: today } },
      attributes: ['productId', 'finishedOn', 'capacityTbsp'],
      raw: true,
    }),
    Jar.findAll({
      where: { householdId, state: 'given', givenOn: { [Op.gte]: givenFrom, [Op.lte]: today } },
      attributes: ['productId', 'givenOn'],
      raw: true,
    }),
    PlanEntry.findAll({
      where: { householdId, date: { [Op.gte]: today } },
      include: [{ model: Pairing, as: 'pairings', required: true }],
    }),
  ]);
  const entryOf = new Map(
    entries.flatMap((entry) => (entry.pairings ?? []).map((pairing) => [pairing.id, entry] as const)),
  );
  return {
    householdId,
    today,
    products,
    // A raw row skips the model's getters: its decimals come as strings (columns.ts's `decimal` makes them numbers).
    shelfJars: shelfJars.map((jar) => ({
      ...jar,
      capacityTbsp: Number(jar.capacityTbsp),
      remainingTbsp: Number(jar.remainingTbsp),
    })),
    finished: finishedJars.map((jar) => ({
      productId: jar.productId,
      finishedOn: jar.finishedOn!,
      tbsp: Number(jar.capacityTbsp),
    })),
    given: givenJars.map((jar) => ({ productId: jar.productId, givenOn: jar.givenOn! })),
    planned: entries.flatMap((entry) =>
      (entry.pairings ?? []).map((pairing) => ({
        id: pairing.id,
        date: entry.date,
        productId: pairing.productId,
        tbsp: pairing.tbspPerServing * entry.servings,
      })),
    ),
    entryOf,
  };
}
