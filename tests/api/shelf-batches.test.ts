import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { bestQualityBy, BOILING_WATER_ALTITUDE_TABLE, UNSEALED_JAR_ADVICE } from '../../shared/domain';
import { todayIn } from '../../server/services/clock';
import { demoApp } from '../support/app';
import { shelfLookups } from './shelf-helpers';

let ctx: Awaited<ReturnType<typeof demoApp>>;
let lookups: Awaited<ReturnType<typeof shelfLookups>>;
beforeAll(async () => {
  ctx = await demoApp();
  lookups = await shelfLookups(ctx, await ctx.signedIn('keeper@larderly.test'));
});
afterAll(() => ctx.close());

const today = () => todayIn('America/New_York');
const beetsBatch = (extra: Record<string, unknown> = {}) => ({
  productId: lookups.product('Pickled Beets').id,
  recipeId: lookups.recipe('Pickled beets').id,
  cannedOn: today(),
  jarSize: 'pint',
  jarsFilled: 6,
  jarsSealed: 5,
  method: 'boiling-water',
  notes: 'Small beets from the second sowing.',
  ...extra,
});

describe('recording a batch', () => {
  it('computes the plan for the household altitude: 2,350 ft adds 5 minutes (USDA Complete Guide, Guide 1)', async () => {
    const cook = await ctx.signedIn('cook@larderly.test');
    const response = await cook.post(`${lookups.base}/batches`).send(beetsBatch());
    expect(response.status).toBe(201);
    const recipe = (await cook.get(`${lookups.base}/recipes/${lookups.recipe('Pickled beets').id}`)).body.recipe;
    const added = BOILING_WATER_ALTITUDE_TABLE.find((row) => 2350 <= row.upToFt)!.addMinutes;
    expect(added).toBe(5);
    expect(response.body.plan).toMatchObject({
      allowed: true,
      minutes: recipe.baseMinutes.pint + 5,
      altitudeAddMinutes: 5,
    });
    expect(response.body.plan.cautions).toContain('When in doubt, throw it out.');
    expect(response.body.batch).toMatchObject({
      altitudeFt: 2350,
      minutes: recipe.baseMinutes.pint + 5,
      jarsFilled: 6,
      jarsSealed: 5,
      headspaceInches: 0.5,
    });
  });

  it('puts sealed jars on the shelf and the unsealed jar in the fridge, opened on the canning day', async () => {
    const cook = await ctx.signedIn('cook@larderly.test');
    const { jars } = (await cook.post(`${lookups.base}/batches`).send(beetsBatch({ jarsFilled: 4, jarsSealed: 3 })))
      .body;
    const sealed = jars.filter((j: { state: string }) => j.state === 'sealed');
    const unsealed = jars.filter((j: { unsealed: boolean }) => j.unsealed);
    expect(sealed).toHaveLength(3);
    for (const jar of sealed) expect(jar.bestBy).toBe(bestQualityBy(today(), 12));
    expect(unsealed).toEqual([expect.objectContaining({ state: 'opened', openedOn: today() })]);
    // NCHFP: refrigerate an unsealed jar and use it within several days, so its use-by is within a week.
    expect(UNSEALED_JAR_ADVICE).toMatch(/several days/);
    const daysToUse = (Date.parse(unsealed[0].useBy) - Date.parse(today())) / 86_400_000;
    expect(daysToUse).toBeGreaterThan(0);
    expect(daysToUse).toBeLessThan(7);
  });

  it('keeps the history of who filled each jar', async () => {
    const cook = await ctx.signedIn('cook@larderly.test');
    const { batch } = (await cook.post(`${lookups.base}/batches`).send(beetsBatch({ jarsFilled: 2, jarsSealed: 1 })))
      .body;
    const detail = (await cook.get(`${lookups.base}/batches/${batch.id}`)).body.batch;
    expect(detail.history.map((e: { kind: string }) => e.kind).sort()).toEqual(['filled', 'filled', 'unsealed']);
    expect(new Set(detail.history.map((e: { who: string }) => e.who))).toEqual(new Set(['Tobias Calloway']));
    expect(detail.jarCounts).toMatchObject({ sealed: 1, opened: 1 });
  });

  it('writes nothing when the plan is not allowed (boiling water for a food not known to be acid) and answers 422 with the reasons', async () => {
    const cook = await ctx.signedIn('cook@larderly.test');
    const recipe = (
      await cook.post(`${lookups.base}/recipes`).send({
        productId: lookups.product('Sweet Corn Relish').id,
        name: 'Plain corn, not acidified',
        yieldJars: 4,
        yieldJarSize: 'pint',
        ingredients: [{ name: 'corn', amount: 8, unit: 'cup', role: 'produce' }],
        acidified: false,
        method: 'boiling-water',
        baseMinutes: { pint: 15 },
        headspaceInches: 1,
      })
    ).body.recipe;
    const before = await lookups.counts();
    const response = await cook
      .post(`${lookups.base}/batches`)
      .send({ ...beetsBatch(), productId: lookups.product('Sweet Corn Relish').id, recipeId: recipe.id });
    expect(response.status).toBe(422);
    expect(response.body.error.code).toBe('not_allowed');
    // US FDA 21 CFR Part 114: only foods at pH 4.6 or below go in a boiling-water canner.
    expect(response.body.error.details.plan.reasons.join(' ')).toMatch(/only for acid foods.*pressure canner/);
    expect(await lookups.counts()).toEqual(before);
  });

  it('refuses a steam canner past 45 minutes in all (Willmore et al., University of Wisconsin-Madison, 2015) and writes nothing', async () => {
    const keeper = await ctx.signedIn('keeper@larderly.test');
    await keeper.patch(`/api/households/${ctx.householdId}`).send({ altitudeFt: 9000 });
    try {
      const before = await lookups.counts();
      // Beets take 30 minutes at 0-1,000 ft; 8,001-10,000 ft adds 20 (USDA Guide 1): 50 minutes.
      const response = await keeper.post(`${lookups.base}/batches`).send(beetsBatch({ method: 'atmospheric-steam' }));
      expect(response.status).toBe(422);
      expect(response.body.error.message).toMatch(/45 minutes/);
      expect(await lookups.counts()).toEqual(before);
    } finally {
      await keeper.patch(`/api/households/${ctx.householdId}`).send({ altitudeFt: 2350 });
    }
  });

  it('refuses a jar size the recipe has no tested time for', async () => {
    const cook = await ctx.signedIn('cook@larderly.test');
    const response = await cook.post(`${lookups.base}/batches`).send(beetsBatch({ jarSize: 'half-gallon' }));
    expect(response.status).toBe(422);
    expect(response.body.error.message).toMatch(/no tested time for half-gallon jars; use pint or quart jars/);
  });

  it('refuses bad input with 400 naming the fields: more sealed than filled, a future date, another product’s recipe', async () => {
    const cook = await ctx.signedIn('cook@larderly.test');
    const counts = await cook.post(`${lookups.base}/batches`).send(beetsBatch({ jarsSealed: 7 }));
    expect(counts.status).toBe(400);
    expect(counts.body.error.fields.jarsSealed).toMatch(/cannot seal/);
    const future = await cook.post(`${lookups.base}/batches`).send(beetsBatch({ cannedOn: '2099-01-01' }));
    expect(future.body.error.fields.cannedOn).toBeDefined();
    const mismatch = await cook
      .post(`${lookups.base}/batches`)
      .send(beetsBatch({ recipeId: lookups.recipe('Corn relish').id }));
    expect(mismatch.body.error.fields.recipeId).toMatch(/another product/);
  });

  it('previews the same plan the batch POST computes', async () => {
    const helper = await ctx.signedIn('helper@larderly.test');
    const recipeId = lookups.recipe('Corn relish').id;
    const preview = await helper.get(
      `${lookups.base}/batches/plan?recipeId=${recipeId}&jarSize=half-pint&method=atmospheric-steam`,
    );
    expect(preview.status).toBe(200);
    expect(preview.body.plan).toMatchObject({ allowed: true, minutes: 20 });
    expect(
      (await helper.get(`${lookups.base}/batches/plan?recipeId=${recipeId}&jarSize=half-pint&method=pressure-dial`))
        .body.plan.allowed,
    ).toBe(false);
  });
});

describe('products and recipes', () => {
  it('refuses a second product with the same name, whatever its case', async () => {
    const cook = await ctx.signedIn('cook@larderly.test');
    const response = await cook.post(`${lookups.base}/products`).send({ name: 'pickled beets', kind: 'pickle' });
    expect(response.status).toBe(409);
    expect(response.body.error.message).toMatch(/already has a product called/);
  });

  it('creates a product with the kind defaults and reports its effective opened days', async () => {
    const cook = await ctx.signedIn('cook@larderly.test');
    const response = await cook
      .post(`${lookups.base}/products`)
      .send({ name: 'Peach Salsa', kind: 'salsa', heat: 2, harvestMonths: [8] });
    expect(response.status).toBe(201);
    expect(response.body.product).toMatchObject({
      useWithinDays: null,
      effectiveUseWithinDays: 7,
      favourite: false,
      minJars: 0,
    });
  });

  it('refuses a recipe without a tested time or with a bad heat, naming the fields', async () => {
    const cook = await ctx.signedIn('cook@larderly.test');
    const recipe = await cook.post(`${lookups.base}/recipes`).send({
      productId: lookups.product('Pickled Beets').id,
      name: 'x',
      yieldJars: 1,
      yieldJarSize: 'pint',
      ingredients: [],
      method: 'boiling-water',
      baseMinutes: {},
      headspaceInches: 0.5,
    });
    expect(recipe.status).toBe(400);
    expect(Object.keys(recipe.body.error.fields).sort()).toEqual(['baseMinutes', 'ingredients']);
    const product = await cook
      .patch(`${lookups.base}/products/${lookups.product('Pickled Beets').id}`)
      .send({ heat: 9 });
    expect(product.body.error.fields.heat).toMatch(/0 to 5/);
  });
});
