// The meal proposal over a household with three years behind it, in memory: the domain alone, no database.
// Run: npm run bench:proposal   (prints the median and slowest of each scope; the target is well under 200 ms on 2 cores)
import {
  addDays,
  addMonths,
  bestQualityBy,
  jarCapacityTbsp,
  planWaste,
  proposeMeals,
  type AllocationJar,
  type MealProposalInput,
  type PlannedPortion,
} from '../../shared/domain';
import { SLOTS, weekDates, weekStartOf } from '../../shared/schemas/week';

const ROUNDS = Number(process.env.BENCH_ROUNDS ?? 30);
const today = new Date().toISOString().slice(0, 10);
const start = weekStartOf(today, 1);
const until = addDays(start, 6);

// The same shape as the week bench's household: 60 products, 400 batches of ten half-pints over three years.
const capacity = jarCapacityTbsp('half-pint');
const products = Array.from({ length: 60 }, (_, i) => ({
  id: `product-${i}`,
  heat: i % 4,
  dietConflicts: i % 5 === 0 ? ['low-salt'] : [],
}));
const jars: AllocationJar[] = [];
const opened = new Set<string>();
for (let b = 0; b < 400; b++) {
  const productId = products[b % 60].id;
  const cannedOn = addDays(today, -1095 + Math.floor((b * 1090) / 400));
  const recent = cannedOn > addMonths(today, -12);
  for (let j = 0; j < 10; j++) {
    if (!recent || j < 3) {
      if (recent && j === 0 && !opened.has(productId)) {
        opened.add(productId);
        jars.push({
          id: `jar-${b}-${j}`,
          productId,
          state: 'opened',
          capacityTbsp: capacity,
          remainingTbsp: capacity / 2,
          bestBy: bestQualityBy(cannedOn),
          openedOn: addDays(today, -((b % 10) + 1)),
          useWithinDays: 14 + (b % 3) * 7,
        });
      }
      continue; // eaten or discarded long ago: not on the shelf
    }
    jars.push({
      id: `jar-${b}-${j}`,
      productId,
      state: 'sealed',
      capacityTbsp: capacity,
      remainingTbsp: capacity,
      bestBy: bestQualityBy(cannedOn),
      useWithinDays: 21,
    });
  }
}
const meals = Array.from({ length: 48 }, (_, i) => ({
  id: `meal-${i}`,
  tags: [SLOTS[i % 4]],
  usualServings: 2 + (i % 3),
  products: [
    { productId: products[(i * 7) % 60].id, tbspPerServing: 1 + (i % 2) },
    ...(i % 3 === 0 ? [{ productId: products[(i * 11 + 3) % 60].id, tbspPerServing: 1 }] : []),
  ],
  eaters: i % 5 === 0 ? ['keeper', 'cook'] : null,
}));
const members = [
  { id: 'keeper', heatTolerance: 3, dietTags: ['low-salt'] },
  { id: 'cook', heatTolerance: 5, dietTags: [] },
  { id: 'helper', heatTolerance: 3, dietTags: [] },
];
// The week as planned: the dinners, each paired with one product.
const portions: PlannedPortion[] = weekDates(start).flatMap((date, d) =>
  date >= today ? [{ id: `dinner-${d}`, date, productId: products[(d * 13) % 60].id, tbsp: 3 }] : [],
);
const days = weekDates(start).filter((d) => d >= today);
const scopes: Record<string, MealProposalInput['open']> = {
  'whole week (breakfast, lunch, snack)': days.flatMap((date) =>
    ['breakfast', 'lunch', 'snack'].map((slot) => ({ date, slot })),
  ),
  'the lunches': days.map((date) => ({ date, slot: 'lunch' })),
  'one day': ['breakfast', 'lunch', 'snack'].map((slot) => ({ date: days[0], slot })),
};

console.log(
  `household: ${products.length} products, ${jars.length} jars on the shelf and in the fridge, ${meals.length} meals, ${portions.length} planned portions; week of ${start}`,
);
for (const [scope, open] of Object.entries(scopes)) {
  const input: MealProposalInput = {
    today,
    until,
    jars,
    portions,
    planned: [],
    open,
    slotKinds: SLOTS,
    meals,
    products,
    members,
  };
  const times: number[] = [];
  const cpu: number[] = [];
  let result = proposeMeals(input);
  for (let i = 0; i < ROUNDS; i++) {
    const began = performance.now();
    const cpuBegan = process.cpuUsage();
    result = proposeMeals(input);
    const used = process.cpuUsage(cpuBegan);
    times.push(performance.now() - began);
    cpu.push((used.user + used.system) / 1000);
  }
  // On a shared machine the wall clock counts other people's work too; the CPU time is this process's own.
  times.sort((a, b) => a - b);
  cpu.sort((a, b) => a - b);
  const before = planWaste({ today, until, jars, portions });
  console.log(
    `${scope}: ${open.length} open slots, ${result.proposed.length} proposed; median ${times[Math.floor(times.length / 2)].toFixed(1)} ms (CPU ${cpu[Math.floor(cpu.length / 2)].toFixed(1)} ms), slowest ${times.at(-1)!.toFixed(1)} ms; ` +
      `waste ${before.tbspPastUseBy.toFixed(1)} tbsp -> ${result.after.tbspPastUseBy.toFixed(1)} tbsp, sealed jars past best ${before.sealedJarsPastBest} -> ${result.after.sealedJarsPastBest}`,
  );
}
