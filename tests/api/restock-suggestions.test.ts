import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { addDays, jarCapacityTbsp, jarSizeAdvice } from '../../shared/domain';
import { demoApp } from '../support/app';
import { holdClockAt } from '../support/held-clock';
import { addJars, addProduct, planPortion } from '../support/restock-fixtures';

// Noon in New York on 2 December 2026: the household's today is 2026-12-02.
const TODAY = '2026-12-02';
holdClockAt('2026-12-02T17:00:00Z');
let ctx: Awaited<ReturnType<typeof demoApp>>;
beforeAll(async () => {
  ctx = await demoApp();
});
afterAll(() => ctx.close());

interface Suggestion {
  productId: string;
  reason: string;
  why: string;
  runOutOn: string | null;
  suggestedJars: number;
}

async function restock(
  email: 'keeper@larderly.test' | 'helper@larderly.test' | 'neighbor@larderly.test' = 'keeper@larderly.test',
) {
  const agent = await ctx.signedIn(email);
  return agent.get(`/api/households/${ctx.householdId}/restock`);
}

describe('restock suggestions over the real shelf', () => {
  it('suggests a batch of a favourite with fewer sealed jars than its minimum, and never of a non-favourite', async () => {
    const favourite = await addProduct(ctx.householdId, { name: 'Test Quince Butter', favourite: true, minJars: 4 });
    const plain = await addProduct(ctx.householdId, { name: 'Test Medlar Butter', favourite: false, minJars: 4 });
    await addJars(favourite, { sealed: 2 });
    await addJars(plain, { sealed: 2 });

    const response = await restock('helper@larderly.test');
    expect(response.status).toBe(200);
    const suggestions: Suggestion[] = response.body.suggestions;
    const mine = suggestions.find((s) => s.productId === favourite.id);
    expect(mine).toMatchObject({ reason: 'below-minimum', why: '2 sealed jars left; you keep at least 4.' });
    expect(suggestions.some((s) => s.productId === plain.id)).toBe(false);
    const favouriteIds = response.body.forecasts
      .filter((f: { favourite: boolean }) => f.favourite)
      .map((f: { productId: string }) => f.productId);
    for (const suggestion of suggestions) expect(favouriteIds).toContain(suggestion.productId);
  });

  it('suggests a favourite whose planned portions empty it within the lead days as runs-out-soon', async () => {
    const favourite = await addProduct(ctx.householdId, { name: 'Test Rose Hip Butter', favourite: true, minJars: 0 });
    await addJars(favourite, { sealed: 1 });
    // 2 tbsp a serving for 2 people, five days running: 4 tbsp a day against one half-pint.
    for (let day = 0; day < 5; day += 1)
      await planPortion(favourite, addDays(TODAY, day), { tbspPerServing: 2, servings: 2 });

    const response = await restock();
    const mine = (response.body.suggestions as Suggestion[]).find((s) => s.productId === favourite.id);
    // A half-pint is 8 fl oz and a tablespoon 1/2 fl oz (NIST Handbook 44, Appendix C): 16 tbsp cover four days, the fifth runs short.
    expect(jarCapacityTbsp('half-pint')).toBe(16);
    expect(mine).toMatchObject({ reason: 'runs-out-soon', runOutOn: addDays(TODAY, 4) });
    expect(mine!.why).toMatch(/empty by Sun, Dec 6/);
  });

  it('does not suggest a favourite that is well stocked and barely used', async () => {
    const favourite = await addProduct(ctx.householdId, { name: 'Test Damson Butter', favourite: true, minJars: 2 });
    await addJars(favourite, { sealed: 6 });
    const response = await restock();
    expect((response.body.suggestions as Suggestion[]).some((s) => s.productId === favourite.id)).toBe(false);
  });

  it('gives each product its history rate, on-hand jars, run-out date, jar size advice and monthly use', async () => {
    const product = await addProduct(ctx.householdId, {
      name: 'Test Sloe Butter',
      favourite: true,
      minJars: 1,
      jarSize: 'half-pint',
      useWithinDays: 21,
    });
    // Six half-pints finished in the 84 days before today: 96 tbsp / 84 days.
    await addJars(product, {
      sealed: 3,
      finishedOn: ['2026-10-01', '2026-10-20', '2026-11-03', '2026-11-10', '2026-11-20', '2026-12-01'],
    });
    const response = await restock();
    const forecast = response.body.forecasts.find((f: { productId: string }) => f.productId === product.id);
    const rate = (6 * 16) / 84;
    expect(forecast.historyTbspPerDay).toBeCloseTo(rate, 10);
    expect(forecast).toMatchObject({ sealedJars: 3, jarsOnHand: 3, onHandTbsp: 48, useWithinDays: 21 });
    // 48 tbsp at 96/84 a day last 42 days: the first day short is today + 42.
    expect(forecast.runOutOn).toBe(addDays(TODAY, 42));
    expect(forecast.jarSizeAdvice).toEqual(jarSizeAdvice(rate, 21));
    expect(forecast.monthlyUse).toEqual([
      { month: '2026-07', tbsp: 0 },
      { month: '2026-08', tbsp: 0 },
      { month: '2026-09', tbsp: 0 },
      { month: '2026-10', tbsp: 32 },
      { month: '2026-11', tbsp: 48 },
      { month: '2026-12', tbsp: 16 },
    ]);
  });

  it('follows a change of favourite and minimum made through the product, as the Restock screen makes it', async () => {
    const product = await addProduct(ctx.householdId, { name: 'Test Fig Butter', favourite: false, minJars: 0 });
    await addJars(product, { sealed: 1 });
    const cook = await ctx.signedIn('cook@larderly.test');
    expect((await restock()).body.suggestions.some((s: Suggestion) => s.productId === product.id)).toBe(false);
    const changed = await cook
      .patch(`/api/households/${ctx.householdId}/products/${product.id}`)
      .send({ favourite: true, minJars: 3 });
    expect(changed.status).toBe(200);
    const after = await restock();
    expect(after.body.suggestions.find((s: Suggestion) => s.productId === product.id)).toMatchObject({
      reason: 'below-minimum',
    });
    expect(after.body.forecasts.find((f: { productId: string }) => f.productId === product.id)).toMatchObject({
      favourite: true,
      minJars: 3,
    });
  });

  it("shows the neighbour nothing of this household's restock list", async () => {
    const product = await addProduct(ctx.householdId, { name: 'Test Secret Butter', favourite: true, minJars: 5 });
    const neighbour = await ctx.signedIn('neighbor@larderly.test');
    const response = await neighbour.get(`/api/households/${ctx.householdId}/restock`);
    expect(response.status).toBe(404);
    expect(JSON.stringify(response.body)).not.toMatch(/Secret Butter/);
    const own = await neighbour.get(`/api/households/${ctx.neighbourHouseholdId}/restock`);
    expect(own.status).toBe(200);
    expect(JSON.stringify(own.body)).not.toMatch(/Test /);
    expect(
      (await neighbour.post(`/api/households/${ctx.neighbourHouseholdId}/restock/${product.id}/todo`).send({})).status,
    ).toBe(404);
  });
});
