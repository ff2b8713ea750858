// GET /week: the board's days, the members at the table, the shelf, and which jar serves each portion.
import type { Sequelize } from 'sequelize';
import {
  addDays,
  allocateWeek,
  defaultUseWithinDays,
  type AllocationJar,
  type Id,
  type PlannedPortion,
  type WeekAllocation,
} from '../../../shared/domain';
import {
  SLOTS,
  weekDates,
  type PlanEntryView,
  type WeekJar,
  type WeekMember,
  type WeekView,
} from '../../../shared/schemas/week';
import type { Household } from '../../db/models';
import { todayIn } from '../clock';
import { keepsDays } from '../plan-allocation';
import { eaterFlags } from './eater-flags';
import {
  currentJarRows,
  entryRows,
  memberRows,
  productRows,
  recipeRows,
  type EntryRow,
  type JarRow,
  type ProductRow,
} from './week-rows';

export async function readWeek(sequelize: Sequelize, household: Household, start: string): Promise<WeekView> {
  const today = todayIn(household.timeZone);
  const end = addDays(start, 6);
  // Portions from today on draw from the shelf before this week's do, so they are read too.
  const from = today < start ? today : start;
  const rows = await entryRows(sequelize, household.id, from, end);
  // Only the products the plan draws on from today need their sealed jars one by one.
  const drawn = [...new Set(rows.filter((r) => r.product_id && r.date >= today).map((r) => r.product_id!))];
  const [jarRows, products, recipes, memberList] = await Promise.all([
    currentJarRows(sequelize, household.id, drawn),
    productRows(sequelize, household.id),
    recipeRows(sequelize, household.id),
    memberRows(sequelize, household.id),
  ]);

  const members: WeekMember[] = memberList.map((m) => ({
    userId: m.user_id,
    name: m.name,
    heatTolerance: m.heat_tolerance,
    dietTags: m.diet_tags ?? [],
  }));
  const productById = new Map(products.map((p) => [p.id, p]));
  const entries = entryViews(
    rows,
    productById,
    recipes.map((r) => ({ productId: r.product_id, name: r.name, ingredients: r.ingredients })),
    members,
  );

  const allocation = allocateWeek({
    today,
    jars: jarRows.map((j) => allocationJar(j, productById)),
    portions: portionsOf(entries),
  });
  const inWeek = (date: string) => date >= start && date <= end;
  const weekEntries = entries.filter((e) => inWeek(e.date));
  const weekPortionIds = new Set<string>(weekEntries.flatMap((e) => e.pairings.map((p) => p.id)));
  const weekAllocation: WeekAllocation = {
    assignments: allocation.assignments.filter((a) => weekPortionIds.has(String(a.portionId))),
    openings: allocation.openings.filter((o) => inWeek(o.date)),
    warnings: allocation.warnings.filter((w) => inWeek(w.date)),
  };

  return {
    start,
    end,
    today,
    weekStartsOn: household.weekStartsOn,
    days: weekDates(start).map((date) => ({ date, entries: weekEntries.filter((e) => e.date === date) })),
    allocation: weekAllocation,
    jars: jarsNamedIn(weekAllocation, jarRows),
    products: products.map((p) => ({
      id: p.id,
      name: p.name,
      kind: p.kind,
      heat: p.heat,
      colour: p.colour,
      openedJars: p.opened_jars,
      sealedJars: p.sealed_jars,
    })),
    members,
  };
}

function entryViews(
  rows: EntryRow[],
  productById: Map<string, ProductRow>,
  recipes: Parameters<typeof eaterFlags>[1],
  members: WeekMember[],
): PlanEntryView[] {
  const byId = new Map<string, PlanEntryView>();
  for (const row of rows) {
    let entry = byId.get(row.id);
    if (!entry) {
      entry = {
        id: row.id,
        date: row.date,
        slot: row.slot,
        position: row.position,
        title: row.title,
        mealId: row.meal_id,
        servings: row.servings,
        eaters: row.eaters,
        pairings: [],
      };
      byId.set(row.id, entry);
    }
    const product = row.product_id ? productById.get(row.product_id) : undefined;
    if (row.pairing_id && product) {
      const eaters = entry.eaters === null ? members : members.filter((m) => entry.eaters!.includes(m.userId));
      entry.pairings.push({
        id: row.pairing_id,
        productId: product.id,
        tbspPerServing: Number(row.tbsp_per_serving),
        flags: eaterFlags(product, recipes, eaters),
      });
    }
  }
  const slotOrder = (slot: string) => SLOTS.indexOf(slot as (typeof SLOTS)[number]);
  return [...byId.values()].sort((a, b) =>
    a.date < b.date ? -1 : a.date > b.date ? 1 : slotOrder(a.slot) - slotOrder(b.slot) || a.position - b.position,
  );
}

/** Each pairing is one portion: its tablespoons per serving times the servings planned. */
function portionsOf(entries: PlanEntryView[]): PlannedPortion[] {
  return entries.flatMap((e) =>
    e.pairings.map((p) => ({ id: p.id, date: e.date, productId: p.productId, tbsp: p.tbspPerServing * e.servings })),
  );
}

export function allocationJar(jar: JarRow, productById: Map<string, ProductRow>): AllocationJar {
  const product = productById.get(jar.product_id)!;
  return {
    id: jar.id,
    productId: jar.product_id,
    state: jar.state,
    capacityTbsp: Number(jar.capacity_tbsp),
    remainingTbsp: Number(jar.remaining_tbsp),
    bestBy: jar.best_by,
    openedOn: jar.opened_on ?? undefined,
    useWithinDays: keepsDays(jar.opened_on, jar.use_by, product.use_within_days ?? defaultUseWithinDays(product.kind)),
  };
}

/** Only the jars the week's allocation names: the board says which jar, not the whole shelf. */
function jarsNamedIn(allocation: WeekAllocation, jarRows: JarRow[]): Record<string, WeekJar> {
  const named = new Set<Id>([
    ...allocation.assignments.flatMap((a) => (a.jarId ? [a.jarId] : [])),
    ...allocation.openings.map((o) => o.jarId),
    ...allocation.warnings.flatMap((w) => (w.kind === 'will-expire' ? [w.jarId] : [])),
  ]);
  const jars: Record<string, WeekJar> = {};
  for (const jar of jarRows) {
    if (!named.has(jar.id)) continue;
    jars[jar.id] = {
      id: jar.id,
      code: jar.code,
      productId: jar.product_id,
      state: jar.state,
      openedOn: jar.opened_on,
      bestBy: jar.best_by,
      remainingTbsp: Number(jar.remaining_tbsp),
      capacityTbsp: Number(jar.capacity_tbsp),
    };
  }
  return jars;
}
