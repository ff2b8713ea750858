// Today: what to open and use from the week's allocation, the fridge countdowns, restock and my to-dos, in one read.
import { addDays, allocateWeek, daysBetween, type Id, type PlannedPortion } from '../../shared/domain';
import type { TodayFridgeJar, TodayUse, TodayView } from '../../shared/schemas/today';
import { placeWords } from '../../shared/words/shelf-places';
import { Household, Place, Product, Todo } from '../db/models';
import { todayIn } from './clock';
import type { HouseholdVersions } from './household-memo';
import { keepsDays } from './plan-allocation';
import { sealChecksOf } from './shelf/seal-check';
import { restockFromSnapshot } from './restock/view';
import { stockSnapshot, useWithinDaysOf, type ShelfJar, type StockSnapshot } from './restock/stock-snapshot';

/** The fridge jars shown first; the Fridge screen has the rest. */
const FRIDGE_SHOWN = 5;
const SLOT_ORDER = ['breakfast', 'lunch', 'dinner', 'snack'];

function openedDaysLeft(jar: ShelfJar | undefined, today: string): number | null {
  return jar?.state === 'opened' && jar.useBy ? daysBetween(today, jar.useBy) : null;
}

/** Where a jar Today draws from is kept, by name and in words. */
function placeOf(name: string | null) {
  return { jarPlaceName: name, jarPlaceWords: name ? placeWords(name) : null };
}

function todaysUse(
  snapshot: StockSnapshot,
  placeNames: Map<string, string>,
): { use: TodayUse[]; short: TodayView['short'] } {
  const { today, products, shelfJars, planned, entryOf } = snapshot;
  const productOf = new Map<Id, Product>(products.map((p) => [p.id, p]));
  // The week ahead decides which jar today draws from: opened jars first, then the oldest sealed one.
  const allocation = allocateWeek({
    today,
    jars: shelfJars.map((jar) => ({
      id: jar.id,
      productId: jar.productId,
      state: jar.state as 'sealed' | 'opened',
      capacityTbsp: jar.capacityTbsp,
      remainingTbsp: Math.min(jar.remainingTbsp, jar.capacityTbsp),
      bestBy: jar.bestBy,
      openedOn: jar.openedOn ?? undefined,
      useWithinDays: keepsDays(jar.openedOn, jar.useBy, useWithinDaysOf(productOf.get(jar.productId)!)),
    })),
    portions: planned.filter((portion) => portion.date <= addDays(today, 6)),
  });
  const jarOf = new Map<Id, ShelfJar>(shelfJars.map((jar) => [jar.id, jar]));
  const openedToday = new Set<Id>(allocation.openings.filter((o) => o.date === today).map((o) => o.jarId));
  const todays = new Map<Id, PlannedPortion>(planned.filter((p) => p.date === today).map((p) => [p.id, p]));

  const use: TodayUse[] = allocation.assignments.flatMap((assignment) => {
    const portion = todays.get(assignment.portionId);
    if (!portion) return [];
    const entry = entryOf.get(String(portion.id))!;
    return [
      {
        portionId: String(portion.id),
        slot: entry.slot,
        mealTitle: entry.title,
        productId: String(portion.productId),
        productName: productOf.get(portion.productId)?.name ?? 'A product',
        tbsp: assignment.tbsp,
        jarId: assignment.jarId === null ? null : String(assignment.jarId),
        jarCode: assignment.jarId === null ? null : jarOf.get(assignment.jarId)!.code,
        ...placeOf(placeNames.get(jarOf.get(assignment.jarId ?? '')?.placeId ?? '') ?? null),
        openedJarDaysLeft: openedDaysLeft(jarOf.get(assignment.jarId ?? ''), today),
        opensToday: assignment.jarId !== null && openedToday.has(assignment.jarId),
      },
    ];
  });
  use.sort((a, b) => SLOT_ORDER.indexOf(a.slot) - SLOT_ORDER.indexOf(b.slot));
  const short = allocation.warnings.flatMap((w) =>
    w.kind === 'short' && w.date === today
      ? [{ productName: productOf.get(w.productId)?.name ?? 'A product', tbsp: w.tbsp }]
      : [],
  );
  return { use, short };
}

function fridgeCountdowns(snapshot: StockSnapshot): TodayFridgeJar[] {
  const nameOf = new Map(snapshot.products.map((p) => [p.id, p.name]));
  return snapshot.shelfJars
    .filter(
      (jar): jar is ShelfJar & { openedOn: string; useBy: string } =>
        jar.state === 'opened' && jar.useBy !== null && jar.openedOn !== null,
    )
    .sort((a, b) => (a.useBy < b.useBy ? -1 : a.useBy > b.useBy ? 1 : a.code.localeCompare(b.code)))
    .map((jar) => ({
      jarId: jar.id,
      code: jar.code,
      productName: nameOf.get(jar.productId) ?? 'A product',
      openedOn: jar.openedOn,
      useBy: jar.useBy,
      daysLeft: daysBetween(snapshot.today, jar.useBy),
      remainingTbsp: jar.remainingTbsp,
      capacityTbsp: jar.capacityTbsp,
    }));
}

/** Today for one person; with the request's versions, the shelf, plan and restock parts are shared with /restock. */
export async function todayView(
  household: Household,
  userId: string,
  versions?: HouseholdVersions,
): Promise<TodayView> {
  const today = todayIn(household.timeZone);
  const [snapshot, myTodos, openTodoCount, sealChecks, places] = await Promise.all([
    stockSnapshot(household.id, today, versions),
    Todo.findAll({
      where: { householdId: household.id, done: false, assigneeId: userId },
      attributes: ['id', 'title', 'dueOn', 'kind'],
      order: [['position', 'ASC']],
    }),
    Todo.count({ where: { householdId: household.id, done: false } }),
    sealChecksOf(household),
    Place.findAll({ where: { householdId: household.id }, attributes: ['id', 'name'] }),
  ]);
  const fridge = fridgeCountdowns(snapshot);
  const restock = await restockFromSnapshot(snapshot, household.unitSystem, versions);
  return {
    today,
    ...todaysUse(snapshot, new Map(places.map((place) => [place.id, place.name]))),
    fridge: fridge.slice(0, FRIDGE_SHOWN),
    fridgeCount: fridge.length,
    restock: restock.suggestions,
    myTodos: myTodos.map((t) => ({ id: t.id, title: t.title, dueOn: t.dueOn ?? null, kind: t.kind })),
    openTodoCount,
    sealChecks,
  };
}
