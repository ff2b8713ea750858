// Small generated households for the meal proposal's tests: shelves, meal libraries and open slots, plus an exhaustive search.
import fc from 'fast-check';
import {
  addDays,
  allocateWeek,
  planWaste,
  type AllocationJar,
  type MealProposalInput,
  type PlannedPortion,
  type ProposalMeal,
  type ProposalSlot,
} from '@shared/domain';

export const TODAY = '2026-11-30';
export const UNTIL = addDays(TODAY, 6);
export const SLOT_KINDS = ['breakfast', 'lunch', 'dinner', 'snack'] as const;

const productIds = ['p0', 'p1', 'p2'];
const memberIds = ['m0', 'm1'];

const jarArb = (id: string) =>
  fc
    .record({
      productId: fc.constantFrom(...productIds),
      opened: fc.boolean(),
      capacityTbsp: fc.constantFrom(16, 32),
      fill: fc.constantFrom(0.25, 0.5, 1),
      openedDaysAgo: fc.integer({ min: 0, max: 20 }),
      bestByIn: fc.integer({ min: -30, max: 40 }),
      useWithinDays: fc.constantFrom(7, 10, 21),
    })
    .map((j): AllocationJar => ({
      id,
      productId: j.productId,
      state: j.opened ? 'opened' : 'sealed',
      capacityTbsp: j.capacityTbsp,
      remainingTbsp: j.opened ? j.capacityTbsp * j.fill : j.capacityTbsp,
      bestBy: addDays(TODAY, j.bestByIn),
      ...(j.opened ? { openedOn: addDays(TODAY, -j.openedDaysAgo) } : {}),
      useWithinDays: j.useWithinDays,
    }));

const mealArb = (id: string) =>
  fc
    .record({
      tags: fc.subarray(['lunch', 'dinner', 'quick'], { maxLength: 2 }),
      usualServings: fc.integer({ min: 1, max: 4 }),
      products: fc.uniqueArray(
        fc.record({ productId: fc.constantFrom(...productIds), tbspPerServing: fc.constantFrom(0.5, 1, 2, 3) }),
        {
          selector: (p) => p.productId,
          maxLength: 2,
        },
      ),
      eaters: fc.option(fc.subarray(memberIds, { minLength: 1 }), { nil: null }),
    })
    .map((m): ProposalMeal => ({ id, ...m }));

/** A household small enough to search every plan: up to 4 open slots, 4 meals, 5 jars. */
export const smallHousehold = (sizes = { jars: 5, meals: 4, slots: 4 }) =>
  fc
    .record({
      jars: fc
        .tuple(...Array.from({ length: sizes.jars }, (_, i) => jarArb(`j${i}`)))
        .chain((all) => fc.subarray(all, { minLength: 1 })),
      meals: fc
        .tuple(...Array.from({ length: sizes.meals }, (_, i) => mealArb(`meal${i}`)))
        .chain((all) => fc.subarray(all, { minLength: 1 })),
      open: fc.uniqueArray(
        fc.record({ day: fc.integer({ min: 0, max: 6 }), slot: fc.constantFrom('lunch', 'dinner') }),
        {
          selector: (s) => `${s.day}${s.slot}`,
          minLength: 1,
          maxLength: sizes.slots,
        },
      ),
      existing: fc.array(
        fc.record({
          day: fc.integer({ min: 0, max: 6 }),
          productId: fc.constantFrom(...productIds),
          tbsp: fc.constantFrom(1, 2, 4),
        }),
        { maxLength: 2 },
      ),
      products: fc.tuple(
        ...productIds.map(() => fc.record({ heat: fc.integer({ min: 0, max: 4 }), salty: fc.boolean() })),
      ),
      members: fc.tuple(
        ...memberIds.map(() => fc.record({ heatTolerance: fc.integer({ min: 1, max: 5 }), lowSalt: fc.boolean() })),
      ),
      varietyDays: fc.integer({ min: 1, max: 4 }),
    })
    .map((h): MealProposalInput => ({
      today: TODAY,
      until: UNTIL,
      jars: h.jars,
      portions: h.existing.map((e, i): PlannedPortion => ({
        id: `planned${i}`,
        date: addDays(TODAY, e.day),
        productId: e.productId,
        tbsp: e.tbsp,
      })),
      planned: [],
      open: h.open.map((s) => ({ date: addDays(TODAY, s.day), slot: s.slot })),
      slotKinds: SLOT_KINDS,
      meals: h.meals,
      products: productIds.map((id, i) => ({
        id,
        heat: h.products[i].heat,
        dietConflicts: h.products[i].salty ? ['low-salt'] : [],
      })),
      members: memberIds.map((id, i) => ({
        id,
        heatTolerance: h.members[i].heatTolerance,
        dietTags: h.members[i].lowSalt ? ['low-salt'] : [],
      })),
      varietyDays: h.varietyDays,
    }));

/** The test's own reading of the flags: hotter than an eater keeps to, or against an eater's diet. */
export function flagged(input: MealProposalInput, meal: ProposalMeal): boolean {
  const eaters = input.members.filter((m) => meal.eaters === null || meal.eaters.includes(m.id));
  return meal.products.some(({ productId }) => {
    const product = input.products.find((p) => p.id === productId)!;
    return eaters.some(
      (e) => product.heat > e.heatTolerance || product.dietConflicts.some((t) => e.dietTags.includes(t)),
    );
  });
}

export const fits = (meal: ProposalMeal, slot: string) =>
  meal.tags.includes(slot) || !meal.tags.some((t) => (SLOT_KINDS as readonly string[]).includes(t));

/** The plan's portions with these meals in these slots. */
export function portionsWith(
  input: MealProposalInput,
  chosen: { slot: ProposalSlot; meal: ProposalMeal }[],
): PlannedPortion[] {
  return [
    ...input.portions,
    ...chosen.flatMap(({ slot, meal }) =>
      meal.products.map((p) => ({
        id: `chosen|${slot.date}|${slot.slot}|${p.productId}`,
        date: slot.date,
        productId: p.productId,
        tbsp: p.tbspPerServing * meal.usualServings,
      })),
    ),
  ];
}

const shortTbsp = (input: MealProposalInput, portions: PlannedPortion[]) =>
  allocateWeek({ today: input.today, jars: input.jars, portions })
    .assignments.filter((a) => a.jarId === null)
    .reduce((n, a) => n + a.tbsp, 0);

/** Whether these choices keep every rule: flags, slot kinds, variety, and a shelf that serves every portion it served before. */
export function allowed(input: MealProposalInput, chosen: { slot: ProposalSlot; meal: ProposalMeal }[]): boolean {
  const variety = input.varietyDays ?? 3;
  for (const [i, a] of chosen.entries()) {
    if (flagged(input, a.meal) || !fits(a.meal, a.slot.slot)) return false;
    for (const b of chosen.slice(i + 1)) {
      if (a.meal.id === b.meal.id && Math.abs(Date.parse(a.slot.date) - Date.parse(b.slot.date)) / 86_400_000 < variety)
        return false;
    }
  }
  const portions = portionsWith(input, chosen);
  const allocation = allocateWeek({ today: input.today, jars: input.jars, portions });
  if (allocation.assignments.some((a) => a.jarId === null && String(a.portionId).startsWith('chosen|'))) return false;
  return shortTbsp(input, portions) <= shortTbsp(input, input.portions) + 1e-9;
}

export const wasteOf = (input: MealProposalInput, chosen: { slot: ProposalSlot; meal: ProposalMeal }[]) =>
  planWaste({ today: input.today, until: input.until, jars: input.jars, portions: portionsWith(input, chosen) });

/** Every plan of the open slots (each empty or any meal), the least waste first: tablespoons, then sealed jars. */
export function exhaustiveBest(input: MealProposalInput) {
  let best = { tbsp: Infinity, sealed: Infinity };
  const walk = (i: number, chosen: { slot: ProposalSlot; meal: ProposalMeal }[]) => {
    if (i === input.open.length) {
      if (!allowed(input, chosen)) return;
      const waste = wasteOf(input, chosen);
      const [tbsp, sealed] = [waste.tbspPastUseBy, waste.sealedJarsPastBest];
      if (tbsp < best.tbsp - 1e-9 || (Math.abs(tbsp - best.tbsp) <= 1e-9 && sealed < best.sealed))
        best = { tbsp, sealed };
      return;
    }
    walk(i + 1, chosen);
    for (const meal of input.meals) walk(i + 1, [...chosen, { slot: input.open[i], meal }]);
  };
  walk(0, []);
  return best;
}
