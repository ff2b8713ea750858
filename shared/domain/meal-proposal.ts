// Proposes meals for a week's open slots so the plan eats what must go first, breaks no flag and never overdraws the shelf.
import type { AllocationJar, PlannedPortion } from './allocation';
import { daysBetween, requireIsoDate } from './dates';
import { compareIds, requireId, type Id } from './ids';
import { allocationOutcome, type AllocationOutcome, type PlanWaste } from './plan-waste';
import { useBy } from './shelf-life';
import { requireList, requireNonNegative, requirePositive, requireRecord, requireWholeNumber } from './validate';

export const DEFAULT_VARIETY_DAYS = 3;

export interface ProposalSlot {
  date: string;
  /** the slot kind: breakfast, lunch, dinner, snack */
  slot: string;
}

export interface ProposalMeal {
  id: Id;
  tags: string[];
  usualServings: number;
  products: { productId: Id; tbspPerServing: number }[];
  /** who usually eats it; null for everybody */
  eaters: Id[] | null;
}

export interface ProposalProduct {
  id: Id;
  heat: number;
  /** the diet tags its recipe goes against (the board's diet flags) */
  dietConflicts: string[];
}

export interface ProposalMember {
  id: Id;
  heatTolerance: number;
  dietTags: string[];
}

export interface MealProposalInput {
  today: string;
  /** the last day the proposal and its waste figures look at: the week's last day */
  until: string;
  jars: AllocationJar[];
  /** the plan's portions as it stands, from today to `until` */
  portions: PlannedPortion[];
  /** the plan's meals as it stands, around the week, for variety */
  planned: { date: string; mealId: Id }[];
  /** the slots to fill, all dated from today to `until` */
  open: ProposalSlot[];
  /** every slot kind; a meal tagged with none of them fits any slot */
  slotKinds: readonly string[];
  meals: ProposalMeal[];
  products: ProposalProduct[];
  members: ProposalMember[];
  /** no meal twice within this many days (1: not twice on one day) */
  varietyDays?: number;
  /** slots whose meal the cook has kept */
  keep?: (ProposalSlot & { mealId: Id })[];
  /** meals the cook turned down in a slot */
  avoid?: (ProposalSlot & { mealId: Id })[];
}

export type ProposalReason =
  | { kind: 'opened-jar'; productId: Id; jarId: Id; openedOn: string; useBy: string }
  | { kind: 'past-best'; productId: Id; jarId: Id; bestBy: string }
  | { kind: 'nearest-best'; productId: Id; jarId: Id; bestBy: string }
  | { kind: 'variety' };

export interface ProposedMeal extends ProposalSlot {
  mealId: Id;
  servings: number;
  eaters: Id[] | null;
  draws: { productId: Id; jarId: Id; tbsp: number; opens: boolean }[];
  reason: ProposalReason;
  /** the next best meals for this slot, best first */
  alternatives: Id[];
}

export interface MealProposal {
  proposed: ProposedMeal[];
  /** open slots no meal suits without breaking a flag, the variety or the shelf */
  unfilled: ProposalSlot[];
  before: PlanWaste;
  after: PlanWaste;
}

/** Lexicographic: waste, sealed jars past best, then more slots filled, fewer fresh jars opened, more urgency. */
type Score = [number, number, number, number, number];
const EPSILON = 1e-9;
const better = (a: Score, b: Score) => {
  for (let i = 0; i < a.length; i++) if (Math.abs(a[i] - b[i]) > EPSILON) return a[i] < b[i];
  return false;
};
const LOCAL_ROUNDS = 4;
const ALTERNATIVES = 3;

interface ProductState {
  jars: AllocationJar[];
  base: PlannedPortion[];
  baseShort: number;
  outcome: AllocationOutcome;
}

const slotKey = (s: ProposalSlot) => `${s.date}|${s.slot}`;
const portionId = (s: ProposalSlot, productId: Id) => `proposed|${s.date}|${s.slot}|${productId}`;

function groupBy<T>(list: T[], keyOf: (item: T) => Id): Map<Id, T[]> {
  const groups = new Map<Id, T[]>();
  for (const item of list) {
    const key = keyOf(item);
    const group = groups.get(key);
    if (group) group.push(item);
    else groups.set(key, [item]);
  }
  return groups;
}

function readInput(input: MealProposalInput) {
  requireRecord(input, 'meal proposal input');
  const today = requireIsoDate(input.today, 'today');
  const until = requireIsoDate(input.until, 'until');
  const varietyDays = requireWholeNumber(input.varietyDays ?? DEFAULT_VARIETY_DAYS, 'varietyDays', 1);
  const open = requireList<ProposalSlot>(input.open, 'open').map((s, i) => {
    const date = requireIsoDate(s.date, `open[${i}].date`);
    if (date < today || date > until)
      throw new RangeError(`open[${i}].date (${date}) must fall from today (${today}) to until (${until})`);
    return { date, slot: String(s.slot) };
  });
  const meals = requireList<ProposalMeal>(input.meals, 'meals').map((m, i) => {
    requireRecord(m, `meals[${i}]`);
    return {
      id: requireId(m.id, `meals[${i}].id`),
      tags: requireList<string>(m.tags, `meals[${i}].tags`),
      usualServings: requirePositive(m.usualServings, `meals[${i}].usualServings`),
      products: requireList<ProposalMeal['products'][number]>(m.products, `meals[${i}].products`).map((p, j) => ({
        productId: requireId(p.productId, `meals[${i}].products[${j}].productId`),
        tbspPerServing: requireNonNegative(p.tbspPerServing, `meals[${i}].products[${j}].tbspPerServing`),
      })),
      eaters: m.eaters === null ? null : requireList<Id>(m.eaters, `meals[${i}].eaters`),
    };
  });
  return { today, until, varietyDays, open, meals };
}

/** A meal breaks a flag when a paired product is hotter than an eater keeps to or goes against their diet. */
export function breaksFlag(meal: ProposalMeal, products: Map<Id, ProposalProduct>, members: ProposalMember[]): boolean {
  const eaters = meal.eaters === null ? members : members.filter((m) => meal.eaters!.includes(m.id));
  return meal.products.some(({ productId }) => {
    const product = products.get(productId);
    if (!product) return true;
    return eaters.some(
      (e) => product.heat > e.heatTolerance || product.dietConflicts.some((tag) => e.dietTags.includes(tag)),
    );
  });
}

export function fitsSlot(meal: Pick<ProposalMeal, 'tags'>, slot: string, slotKinds: readonly string[]): boolean {
  return meal.tags.includes(slot) || !meal.tags.some((tag) => slotKinds.includes(tag));
}

export function proposeMeals(input: MealProposalInput): MealProposal {
  const { today, until, varietyDays, open, meals } = readInput(input);
  const products = new Map(requireList<ProposalProduct>(input.products, 'products').map((p) => [p.id, p]));
  const members = requireList<ProposalMember>(input.members, 'members');
  const slotKinds = requireList<string>(input.slotKinds, 'slotKinds');
  const portions = requireList<PlannedPortion>(input.portions, 'portions');
  const jars = requireList<AllocationJar>(input.jars, 'jars');
  const mealById = new Map(meals.map((m) => [m.id, m]));
  const kept = new Map((input.keep ?? []).map((k) => [slotKey(k), k.mealId]));
  const avoided = new Set((input.avoid ?? []).map((a) => `${slotKey(a)}|${a.mealId}`));

  // Waste decomposes by product, so each product keeps its own allocation and a change rescores only its products.
  const state = new Map<Id, ProductState>();
  const productIds = new Set<Id>([...jars.map((j) => j.productId), ...portions.map((p) => p.productId)]);
  const jarsOf = groupBy(jars, (j) => j.productId);
  const portionsByProduct = groupBy(portions, (p) => p.productId);
  for (const productId of productIds) {
    const own = jarsOf.get(productId) ?? [];
    const base = portionsByProduct.get(productId) ?? [];
    const outcome = allocationOutcome(today, until, own, base);
    state.set(productId, { jars: own, base, baseShort: outcome.shortTbsp, outcome });
  }
  const before = sumWaste([...state.values()].map((s) => s.outcome));

  const slots = [...new Map(open.map((s) => [slotKey(s), s])).values()].sort((a, b) =>
    a.date < b.date ? -1 : a.date > b.date ? 1 : slotKinds.indexOf(a.slot) - slotKinds.indexOf(b.slot),
  );
  const choice = new Map<string, Id | null>(slots.map((s) => [slotKey(s), null]));
  const planned = requireList<{ date: string; mealId: Id }>(input.planned, 'planned');

  const eligible = new Map<string, ProposalMeal[]>(
    slots.map((s) => [
      slotKey(s),
      meals
        .filter(
          (m) =>
            !avoided.has(`${slotKey(s)}|${m.id}`) &&
            fitsSlot(m, s.slot, slotKinds) &&
            !breaksFlag(m, products, members),
        )
        .filter((m) => m.products.every((p) => productIds.has(p.productId)))
        .sort((a, b) => compareIds(a.id, b.id)),
    ]),
  );

  const varietyAllows = (slot: ProposalSlot, mealId: Id) => {
    const near = (date: string) => Math.abs(daysBetween(date, slot.date)) < varietyDays;
    if (planned.some((p) => p.mealId === mealId && near(p.date))) return false;
    return slots.every((other) => other === slot || choice.get(slotKey(other)) !== mealId || !near(other.date));
  };

  const portionsOf = (productId: Id) => {
    const proposed: PlannedPortion[] = [];
    for (const s of slots) {
      const mealId = choice.get(slotKey(s));
      const meal = mealId === null || mealId === undefined ? undefined : mealById.get(mealId);
      for (const p of meal?.products ?? []) {
        if (p.productId === productId)
          proposed.push({
            id: portionId(s, productId),
            date: s.date,
            productId,
            tbsp: p.tbspPerServing * meal!.usualServings,
          });
      }
    }
    return proposed;
  };

  // Running sums over every product, so scoring a change costs only the products it touches.
  const sums = { tbsp: 0, sealed: 0, fresh: 0, urgency: 0, filled: 0 };
  const add = (o: AllocationOutcome, sign: 1 | -1) => {
    sums.tbsp += sign * o.waste.tbspPastUseBy;
    sums.sealed += sign * o.waste.sealedJarsPastBest;
    sums.fresh += sign * o.freshOpenings;
    sums.urgency += sign * o.urgency;
  };
  for (const product of state.values()) add(product.outcome, 1);
  const total = (): Score => [sums.tbsp, sums.sealed, -sums.filled, sums.fresh, -sums.urgency];
  const setOutcome = (product: ProductState, outcome: AllocationOutcome) => {
    add(product.outcome, -1);
    product.outcome = outcome;
    add(outcome, 1);
  };
  // The same proposed portions of a product always allocate the same way; the local pass asks again and again.
  const outcomes = new Map<string, AllocationOutcome>();
  const outcomeOf = (productId: Id, product: ProductState, proposed: PlannedPortion[]) => {
    const key = `${productId}|${proposed.map((p) => `${p.id}:${p.tbsp}`).join(',')}`;
    let outcome = outcomes.get(key);
    if (!outcome) {
      outcome = allocationOutcome(today, until, product.jars, [...product.base, ...proposed]);
      outcomes.set(key, outcome);
    }
    return outcome;
  };

  /** Puts `mealId` in the slot and rescores its products; null when that overdraws the shelf (and nothing changes). */
  const tryChoice = (slot: ProposalSlot, mealId: Id | null): Score | null => {
    const key = slotKey(slot);
    const was = choice.get(key)!;
    const touched = new Set<Id>(
      [
        ...(was === null ? [] : mealById.get(was)!.products),
        ...(mealId === null ? [] : mealById.get(mealId)!.products),
      ].map((p) => p.productId),
    );
    choice.set(key, mealId);
    sums.filled += (mealId === null ? 0 : 1) - (was === null ? 0 : 1);
    const previous = new Map<Id, AllocationOutcome>();
    for (const productId of touched) {
      const product = state.get(productId)!;
      const proposed = portionsOf(productId);
      const outcome = outcomeOf(productId, product, proposed);
      previous.set(productId, product.outcome);
      setOutcome(product, outcome);
      if (outcome.shortTbsp > product.baseShort + EPSILON || proposed.some((p) => outcome.shortPortions.has(p.id))) {
        for (const [id, o] of previous) setOutcome(state.get(id)!, o);
        choice.set(key, was);
        sums.filled -= (mealId === null ? 0 : 1) - (was === null ? 0 : 1);
        return null;
      }
    }
    return total();
  };

  /** The best meal for one slot with the others as they are; leaves the slot holding it. */
  const bestFor = (slot: ProposalSlot) => {
    const key = slotKey(slot);
    const current = choice.get(key)!;
    let bestMeal: Id | null = current;
    let bestScore = tryChoice(slot, current)!;
    for (const meal of [null, ...eligible.get(key)!]) {
      const mealId = meal === null ? null : meal.id;
      if (mealId === current || (mealId !== null && !varietyAllows(slot, mealId))) continue;
      const score = tryChoice(slot, mealId);
      if (score && better(score, bestScore)) [bestMeal, bestScore] = [mealId, score];
    }
    tryChoice(slot, bestMeal);
    return bestMeal !== current;
  };

  // Greedy by urgency: the earliest slots first, since an opened jar is eaten in date order.
  for (const slot of slots) {
    const keptMeal = kept.get(slotKey(slot));
    const keepable =
      keptMeal !== undefined && mealById.get(keptMeal)?.products.every((p) => productIds.has(p.productId));
    if (!keepable || tryChoice(slot, keptMeal!) === null) bestFor(slot);
  }
  // Local improvement: change one slot at a time while that lowers the score.
  for (let round = 0; round < LOCAL_ROUNDS; round++) {
    let changed = false;
    for (const slot of slots)
      if (choice.get(slotKey(slot)) !== kept.get(slotKey(slot)) && bestFor(slot)) changed = true;
    if (!changed) break;
  }

  const after = sumWaste([...state.values()].map((s) => s.outcome));
  const jarById = new Map(jars.map((j) => [j.id, j]));
  const proposed: ProposedMeal[] = [];
  const unfilled: ProposalSlot[] = [];
  for (const slot of slots) {
    const mealId = choice.get(slotKey(slot))!;
    if (mealId === null) {
      unfilled.push(slot);
      continue;
    }
    const meal = mealById.get(mealId)!;
    const draws = meal.products.flatMap(({ productId }) => {
      const { allocation } = state.get(productId)!.outcome;
      const ownId = portionId(slot, productId);
      return allocation.assignments
        .filter((a) => a.portionId === ownId && a.jarId !== null)
        .map((a) => ({
          productId,
          jarId: a.jarId!,
          tbsp: a.tbsp,
          opens: allocation.openings.some((o) => o.jarId === a.jarId && o.date === slot.date),
        }));
    });
    proposed.push({
      ...slot,
      mealId,
      servings: meal.usualServings,
      eaters: meal.eaters,
      draws,
      reason: reasonFor(slot, draws, jarById, state),
      alternatives: alternativesFor(slot, mealId),
    });
  }
  return { proposed, unfilled, before, after };

  function alternativesFor(slot: ProposalSlot, mealId: Id): Id[] {
    const ranked: { id: Id; score: Score }[] = [];
    for (const meal of eligible.get(slotKey(slot))!) {
      if (meal.id === mealId || !varietyAllows(slot, meal.id)) continue;
      const score = tryChoice(slot, meal.id);
      if (score) ranked.push({ id: meal.id, score });
    }
    tryChoice(slot, mealId);
    return ranked
      .sort((a, b) => (better(a.score, b.score) ? -1 : better(b.score, a.score) ? 1 : compareIds(a.id, b.id)))
      .slice(0, ALTERNATIVES)
      .map((r) => r.id);
  }
}

/** The most pressing jar a proposed meal draws on, in the order the proposal cares: fridge first, then past best, then oldest. */
function reasonFor(
  slot: ProposalSlot,
  draws: ProposedMeal['draws'],
  jarById: Map<Id, AllocationJar>,
  state: Map<Id, ProductState>,
): ProposalReason {
  const reasons: ProposalReason[] = draws.map((draw) => {
    const jar = jarById.get(draw.jarId)!;
    const opening = state.get(draw.productId)!.outcome.allocation.openings.find((o) => o.jarId === draw.jarId);
    const openedOn =
      jar.state === 'opened' ? jar.openedOn! : opening && opening.date < slot.date ? opening.date : undefined;
    if (openedOn !== undefined) {
      return {
        kind: 'opened-jar',
        productId: draw.productId,
        jarId: draw.jarId,
        openedOn,
        useBy: useBy(openedOn, jar.useWithinDays),
      };
    }
    return {
      kind: jar.bestBy < slot.date ? 'past-best' : 'nearest-best',
      productId: draw.productId,
      jarId: draw.jarId,
      bestBy: jar.bestBy,
    };
  });
  const rank = (r: ProposalReason) =>
    r.kind === 'opened-jar'
      ? `0${r.useBy}`
      : r.kind === 'past-best'
        ? `1${r.bestBy}`
        : r.kind === 'nearest-best'
          ? `2${r.bestBy}`
          : '3';
  return reasons.sort((a, b) => (rank(a) < rank(b) ? -1 : rank(a) > rank(b) ? 1 : 0))[0] ?? { kind: 'variety' };
}

function sumWaste(outcomes: AllocationOutcome[]): PlanWaste {
  const jars = outcomes.flatMap((o) => o.waste.jars);
  return {
    tbspPastUseBy: outcomes.reduce((n, o) => n + o.waste.tbspPastUseBy, 0),
    sealedJarsPastBest: outcomes.reduce((n, o) => n + o.waste.sealedJarsPastBest, 0),
    jars,
  };
}
