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
import { bothVersions, frozen, householdMemo, type HouseholdVersions } from '../household-memo';

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
  readonly products: readonly Product[];
  /** Sealed and opened jars. */
  readonly shelfJars: readonly ShelfJar[];
  /** Jars finished since the start of the chart's first month, each counted as a full jar. */
  readonly finished: readonly FinishedPortion[];
  /** Jars given away since the earlier of the history's start and the first of this year: not eaten, counted apart. */
  readonly given: readonly GivenJar[];
  /** Every pairing of a plan entry from today on: the pairing's portion per serving times the entry's servings. */
  readonly planned: readonly PlannedPortion[];
  /** The plan entry each planned portion (by pairing id) belongs to. */
  readonly entryOf: ReadonlyMap<string, PlanEntry>;
}

export function useWithinDaysOf(product: Product): number {
  return product.useWithinDays ?? defaultUseWithinDays(product.kind);
}

function historyStart(today: string): string {
  const chartStart = `${addMonths(today, 1 - CHART_MONTHS).slice(0, 7)}-01`;
  const forecastStart = addDays(today, -HISTORY_DAYS);
  return chartStart < forecastStart ? chartStart : forecastStart;
}

/** The shelf's part of the snapshot: products, jars and their history; none of it reads the plan. */
async function shelfPart(householdId: string, today: string) {
  const yearStart = `${today.slice(0, 4)}-01-01`;
  const givenFrom = historyStart(today) < yearStart ? historyStart(today) : yearStart;
  const [products, shelfJars, finishedJars, givenJars] = await Promise.all([
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
  ]);
  return frozen({
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
  });
}

/** The plan's part: every pairing of a plan entry from today on. */
async function planPart(householdId: string, today: string) {
  const entries = await PlanEntry.findAll({
    where: { householdId, date: { [Op.gte]: today } },
    include: [{ model: Pairing, as: 'pairings', required: true }],
  });
  return frozen({
    planned: entries.flatMap((entry) =>
      (entry.pairings ?? []).map((pairing) => ({
        id: pairing.id,
        date: entry.date,
        productId: pairing.productId,
        tbsp: pairing.tbspPerServing * entry.servings,
      })),
    ),
    entryOf: new Map(entries.flatMap((entry) => (entry.pairings ?? []).map((pairing) => [pairing.id, entry] as const))),
  });
}

const shelfParts = householdMemo<Awaited<ReturnType<typeof shelfPart>>>();
const planParts = householdMemo<Awaited<ReturnType<typeof planPart>>>();

/**
 * The snapshot for `today`. With the request's versions, each part is kept until the versions it reads move, so a
 * meal edited on the board reads the shelf's jars again only when they changed too; without, both are read now.
 */
export async function stockSnapshot(
  householdId: string,
  today: string,
  versions?: HouseholdVersions,
): Promise<StockSnapshot> {
  const key = `${householdId} ${today}`;
  const [shelf, plan] = await Promise.all([
    shelfParts(key, versions?.data, () => shelfPart(householdId, today)),
    // The plan's rows only, but kept on both versions: a data write that cascades into them moves plan_version too.
    planParts(key, versions && bothVersions(versions), () => planPart(householdId, today)),
  ]);
  return { householdId, today, ...shelf, ...plan };
}
