import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { convertMass, convertVolume, GRAMS_PER_POUND, ML_PER_US_CUP, ML_PER_US_TBSP } from '../../shared/domain';
import type { BatchPlan, ShoppingItem, TodoView } from '../../shared/schemas/todos';
import { demoApp } from '../support/app';
import { holdClockAt } from '../support/held-clock';
import { addAppleButterRecipe, addProduct } from '../support/restock-fixtures';

holdClockAt('2026-12-02T17:00:00Z');
let ctx: Awaited<ReturnType<typeof demoApp>>;
beforeAll(async () => {
  ctx = await demoApp();
});
afterAll(() => ctx.close());

const householdUrl = () => `/api/households/${ctx.householdId}`;

async function planned(name: string, jars: number): Promise<{ todoId: string; plan: BatchPlan }> {
  const product = await addProduct(ctx.householdId, { name, favourite: true, minJars: 4 });
  await addAppleButterRecipe(product);
  const cook = await ctx.signedIn('cook@larderly.test');
  const response = await cook.post(`${householdUrl()}/restock/${product.id}/todo`).send({ jars, jarSize: 'half-pint' });
  expect(response.status).toBe(201);
  return { todoId: response.body.todo.id, plan: response.body.todo.batchPlan };
}

async function planOf(todoId: string): Promise<BatchPlan> {
  const cook = await ctx.signedIn('cook@larderly.test');
  const response = await cook.get(`${householdUrl()}/todos/${todoId}`);
  expect(response.status).toBe(200);
  return (response.body.todo as TodoView).batchPlan!;
}

async function patch(body: object) {
  const keeper = await ctx.signedIn('keeper@larderly.test');
  return keeper.patch(householdUrl()).send(body);
}

const items = (plan: BatchPlan): ShoppingItem[] => [...plan.shopping.produce, ...plan.shopping.pantry];

describe('the same batch plan in US customary and in metric', () => {
  it('converts every amount at the edge and changes nothing else', async () => {
    const { todoId } = await planned('Units Apple Butter', 12);
    const us = await planOf(todoId);
    expect((await patch({ unitSystem: 'metric' })).status).toBe(200);
    const metric = await planOf(todoId);
    expect((await patch({ unitSystem: 'us' })).status).toBe(200);
    expect(await planOf(todoId)).toEqual(us);

    // Nothing but the written amounts differs: processing, altitude, jars, canner loads, dates, the scaled recipe.
    const withoutWords = (plan: BatchPlan) => ({
      ...plan,
      processing: { ...plan.processing, cautions: [] },
      shopping: {
        produce: plan.shopping.produce.map(({ name, role, amount, unit }) => ({ name, role, amount, unit })),
        pantry: plan.shopping.pantry.map(({ name, role, amount, unit }) => ({ name, role, amount, unit })),
      },
    });
    expect(withoutWords(metric)).toEqual(withoutWords(us));
    // A change of units is not an edit of the recipe.
    expect(metric.changes).toEqual([]);
    // The cautions say the water over the jars in the household's units: 1 inch (USDA Complete Guide to Home
    // Canning, 2015, Guide 1), 2.5 cm in metric (NIST SP 811: 1 in = 2.54 cm exactly); the rest of them is the same.
    expect(us.processing.cautions.join(' ')).toContain('covered by at least 1 inch of water');
    expect(metric.processing.cautions.join(' ')).toContain('covered by at least 2.5 cm of water');
    expect(metric.processing.cautions.join(' ')).not.toMatch(/\binch/);
    expect(metric.processing.cautions.length).toBe(us.processing.cautions.length);

    // 12 half-pints are three quarters of the tested 8 pints: 6 lb apples, 1 1/2 cups cider, 1 1/2 tbsp cinnamon.
    const byName = (plan: BatchPlan, name: string) => items(plan).find((i) => i.name === name)!;
    expect(byName(us, 'apples').text).toBe('6 lb apples');
    // NIST SP 811, Appendix B.8: 1 lb = 453.59237 g exactly; 6 lb = 2,721.55 g.
    expect(byName(metric, 'apples').shown).toEqual({ amount: (6 * GRAMS_PER_POUND) / 1000, unit: 'kg' });
    expect(byName(metric, 'apples').text).toBe('2.72 kg apples');
    // NIST Handbook 44, Appendix C: 1 US cup = 236.5882365 mL; 1 1/2 cups = 354.88 mL, measured as 355 mL.
    expect(byName(us, 'apple cider').text).toBe('1 1/2 cups apple cider');
    expect(byName(metric, 'apple cider').shown!.unit).toBe('ml');
    expect(byName(metric, 'apple cider').shown!.amount).toBeCloseTo(1.5 * ML_PER_US_CUP, 9);
    expect(byName(metric, 'apple cider').text).toBe('355 mL apple cider');
    // NIST Handbook 44, Appendix C: 1 US tbsp = 14.78676478125 mL; 1 1/2 tbsp = 22.18 mL.
    expect(byName(us, 'ground cinnamon').text).toBe('1 1/2 tbsp ground cinnamon');
    expect(byName(metric, 'ground cinnamon').shown!.amount).toBeCloseTo(1.5 * ML_PER_US_TBSP, 9);
    expect(byName(metric, 'ground cinnamon').text).toBe('22 mL ground cinnamon');

    // Every metric amount is the US one times the published factor.
    for (const item of items(metric)) {
      const { amount, unit } = item.shown!;
      const original = items(us).find((i) => i.name === item.name)!;
      const expected =
        original.unit === 'lb' || original.unit === 'oz'
          ? convertMass(original.amount, original.unit, unit === 'kg' ? 'kg' : 'g')
          : convertVolume(original.amount, original.unit as 'cup', unit === 'l' ? 'l' : 'ml');
      expect(amount).toBeCloseTo(expected, 9);
      expect(['ml', 'l', 'g', 'kg']).toContain(unit);
    }
    for (const item of items(us)) expect(['ml', 'l', 'g', 'kg']).not.toContain(item.shown!.unit);
  });

  it('says a changed altitude in meters in metric, and names the jar with its milliliters in a new to-do', async () => {
    expect((await patch({ unitSystem: 'metric' })).status).toBe(200);
    try {
      const { todoId } = await planned('Metric Apple Butter', 8);
      const cook = await ctx.signedIn('cook@larderly.test');
      const todo = (await cook.get(`${householdUrl()}/todos/${todoId}`)).body.todo as TodoView;
      // A half-pint is 8 US fl oz x 29.5735295625 mL (NIST Handbook 44) = 236.6 mL.
      expect(todo.title).toBe('Make 8 half-pint (237 mL) jars of Metric Apple Butter');
      expect((await patch({ altitudeFt: 3281 })).status).toBe(200);
      // NIST SP 811: 1 ft = 0.3048 m; 3,281 ft = 1,000.05 m and 2,350 ft = 716.28 m.
      expect((await planOf(todoId)).changes!.join(' ')).toContain('altitude is now 1,000 m (it was 716 m');
    } finally {
      expect((await patch({ unitSystem: 'us', altitudeFt: 2350 })).status).toBe(200);
    }
  });
});

describe('the household settings the Household page edits', () => {
  it('saves canners per method and counts a plan’s loads in the canner its recipe uses', async () => {
    const saved = await patch({
      canners: [
        { method: 'boiling-water', capacityJars: 5 },
        { method: 'pressure-dial', capacityJars: 16 },
      ],
      defaultMethod: 'pressure-dial',
    });
    expect(saved.status).toBe(200);
    expect(saved.body.household).toMatchObject({
      canners: [
        { method: 'boiling-water', capacityJars: 5 },
        { method: 'pressure-dial', capacityJars: 16 },
      ],
      defaultMethod: 'pressure-dial',
      cannerCapacityJars: 16,
    });
    // The apple butter recipe is processed in a boiling-water canner: 12 jars in loads of 5.
    const { plan, todoId } = await planned('Canner Apple Butter', 12);
    expect(plan.equipment).toEqual({
      jars: 12,
      newLids: 12,
      cannerMethod: 'boiling-water',
      cannerCapacityJars: 5,
      cannerLoads: [5, 5, 2],
    });

    // Without a boiling-water canner, a deep pressure canner with its lid unlocked serves as one (common practice):
    // the loads follow the default canner.
    expect(
      (await patch({ canners: [{ method: 'pressure-dial', capacityJars: 16 }], defaultMethod: 'pressure-dial' }))
        .status,
    ).toBe(200);
    const later = await planOf(todoId);
    expect(later.equipment).toMatchObject({ cannerMethod: 'pressure-dial', cannerCapacityJars: 16, cannerLoads: [12] });
    expect(later.changes!.join(' ')).toContain('pressure canner, dial gauge now holds 16 jars a load (it was 5)');

    // The first-run questions' single number sets the default canner's capacity.
    expect((await patch({ defaultMethod: 'boiling-water', cannerCapacityJars: 7 })).body.household.canners).toEqual([
      { method: 'pressure-dial', capacityJars: 16 },
      { method: 'boiling-water', capacityJars: 7 },
    ]);
  });

  it('refuses canners it cannot use, saying what to fix, and changes nothing', async () => {
    const before = (await (await ctx.signedIn('keeper@larderly.test')).get(householdUrl())).body.household;
    const twice = await patch({
      canners: [
        { method: 'boiling-water', capacityJars: 7 },
        { method: 'boiling-water', capacityJars: 9 },
      ],
    });
    expect(twice.status).toBe(400);
    expect(twice.body.error.fields.canners).toBe('List each kind of canner once; give it the jars its rack holds.');

    const empty = await patch({ canners: [{ method: 'boiling-water', capacityJars: 0 }] });
    expect(empty.status).toBe(400);
    expect(empty.body.error.fields['canners.0.capacityJars']).toBe('A canner holds at least 1 jar.');

    const none = await patch({ canners: [] });
    expect(none.body.error.fields.canners).toBe('Keep at least one canner: batch plans count their loads by it.');

    const notListed = await patch({
      canners: [{ method: 'boiling-water', capacityJars: 7 }],
      defaultMethod: 'pressure-weighted',
    });
    expect(notListed.status).toBe(400);
    expect(notListed.body.error.fields.defaultMethod).toBe('Choose a default canner from the canners listed.');

    const notOwned = await patch({ defaultMethod: 'atmospheric-steam' });
    expect(notOwned.status).toBe(400);
    expect(notOwned.body.error.fields.defaultMethod).toMatch(
      /^Add the atmospheric steam canner to the household’s canners/,
    );

    const week = await patch({ weekStartsOn: 7 });
    expect(week.body.error.fields.weekStartsOn).toBe('Choose a day of the week.');

    const after = (await (await ctx.signedIn('keeper@larderly.test')).get(householdUrl())).body.household;
    expect(after).toEqual(before);
  });

  it('names the altitude limits in the units the household uses, and saves nothing out of range', async () => {
    const keeper = await ctx.signedIn('keeper@larderly.test');
    const before = (await keeper.get(householdUrl())).body.household;
    // LIMITS.altitudeFt (shared/schemas/limits.ts): -1,500 to 20,000 ft. NIST SP 811: 1 ft = 0.3048 m exactly, so
    // 20,000 ft = 6,096 m and -1,500 ft = -457.2 m.
    const us = await patch({ altitudeFt: 20_001 });
    expect(us.status).toBe(400);
    expect(us.body.error.fields.altitudeFt).toBe('The altitude cannot be above 20,000 ft.');

    expect((await patch({ unitSystem: 'metric' })).status).toBe(200);
    try {
      // The form sends feet: 7,000 m typed is 22,966 ft.
      const high = await patch({ altitudeFt: 22_966 });
      expect(high.status).toBe(400);
      expect(high.body.error.fields.altitudeFt).toBe('The altitude cannot be above 6,096 m.');
      const low = await patch({ altitudeFt: -1_600 });
      expect(low.body.error.fields.altitudeFt).toBe('The altitude cannot be below -457 m.');
      const notNumber = await patch({ altitudeFt: 'high' });
      expect(notNumber.body.error.fields.altitudeFt).toBe('Enter the altitude in meters as a number.');
      // A patch that changes the units answers in the units it chooses.
      const back = await patch({ unitSystem: 'us', altitudeFt: 20_001 });
      expect(back.body.error.fields.altitudeFt).toBe('The altitude cannot be above 20,000 ft.');

      // Headspace: LIMITS.headspaceInches is 2 inches, 50.8 mm (NIST SP 811: 1 in = 25.4 mm exactly).
      const recipes = (await keeper.get(`${householdUrl()}/recipes`)).body.recipes as { id: string }[];
      const deep = await keeper.patch(`${householdUrl()}/recipes/${recipes[0]!.id}`).send({ headspaceInches: 2.1 });
      expect(deep.status).toBe(400);
      expect(deep.body.error.fields.headspaceInches).toBe('Use at most 50.8 mm.');
    } finally {
      expect((await patch({ unitSystem: 'us' })).status).toBe(200);
    }
    const recipes = (await keeper.get(`${householdUrl()}/recipes`)).body.recipes as { id: string }[];
    const deep = await keeper.patch(`${householdUrl()}/recipes/${recipes[0]!.id}`).send({ headspaceInches: 2.1 });
    expect(deep.body.error.fields.headspaceInches).toBe('Use at most 2 inches.');
    expect((await keeper.get(householdUrl())).body.household).toEqual(before);
  });

  it('starts the week board on the household’s first day of the week', async () => {
    const cook = await ctx.signedIn('cook@larderly.test');
    for (const [weekStartsOn, start] of [
      [0, '2026-11-29'],
      [1, '2026-11-30'],
      [3, '2026-12-02'],
    ] as const) {
      expect((await patch({ weekStartsOn })).status).toBe(200);
      // 2 December 2026 is a Wednesday; its week starts on the Sunday, Monday or Wednesday before or on it.
      const week = await cook.get(`${householdUrl()}/week`);
      expect(week.status).toBe(200);
      expect(week.body.week?.start ?? week.body.start).toBe(start);
    }
    expect((await patch({ weekStartsOn: 1 })).status).toBe(200);
  });
});
