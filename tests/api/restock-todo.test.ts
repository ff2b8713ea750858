import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { formatKitchenAmount, processingPlan, scaleRecipe } from '../../shared/domain';
import { demoApp } from '../support/app';
import { holdClockAt } from '../support/held-clock';
import { addAppleButterRecipe, addJars, addProduct, APPLE_BUTTER_INGREDIENTS } from '../support/restock-fixtures';

holdClockAt('2026-12-02T17:00:00Z');
let ctx: Awaited<ReturnType<typeof demoApp>>;
beforeAll(async () => {
  ctx = await demoApp();
});
afterAll(() => ctx.close());

const todoUrl = (productId: string) => `/api/households/${ctx.householdId}/restock/${productId}/todo`;

describe('adding a restock batch to the to-do list', () => {
  it("scales the tested recipe to the jars asked for and plans its processing for the household's altitude", async () => {
    const product = await addProduct(ctx.householdId, {
      name: 'Test Apple Butter',
      favourite: true,
      minJars: 6,
      harvestMonths: [9, 10],
    });
    await addAppleButterRecipe(product);
    const cook = await ctx.signedIn('cook@larderly.test');
    const response = await cook.post(todoUrl(product.id)).send({ jars: 12, jarSize: 'half-pint' });
    expect(response.status).toBe(201);
    const { todo } = response.body;
    expect(todo).toMatchObject({
      kind: 'restock',
      productId: product.id,
      title: 'Make 12 half-pint jars of Test Apple Butter',
      done: false,
    });
    const plan = todo.batchPlan;

    const expectedScale = scaleRecipe(
      { yield: { jars: 8, jarSize: 'pint' }, ingredients: APPLE_BUTTER_INGREDIENTS, kind: 'fruit-butter' },
      { jars: 12, jarSize: 'half-pint' },
    );
    expect(plan.scaled).toEqual(expectedScale);
    // 12 half-pints are 96 fl oz against the tested 8 pints (128 fl oz): three quarters of the batch.
    expect(plan.scaled.factor).toBe(0.75);
    expect(plan.scaled.ingredients.find((i: { name: string }) => i.name === 'apples').amount).toBe(6);

    const expectedPlan = processingPlan({
      method: 'boiling-water',
      altitudeFt: 2350,
      jarSize: 'half-pint',
      baseMinutes: 5,
      acidified: true,
    });
    expect(plan.processing).toEqual(expectedPlan);
    // USDA Complete Guide to Home Canning (2015), Guide 1: 1,001-3,000 ft adds 5 minutes in a boiling-water canner.
    expect(plan.processing.minutes).toBe(10);
    expect(plan.altitudeFt).toBe(2350);

    // Calloway Hollow's canner holds 7 jars (the household default); flat lids seal once (common practice).
    expect(plan.equipment).toEqual({
      jars: 12,
      newLids: 12,
      cannerMethod: 'boiling-water',
      cannerCapacityJars: 7,
      cannerLoads: [7, 5],
    });
    expect(plan.shopping.produce).toEqual([
      {
        name: 'apples',
        role: 'produce',
        amount: 6,
        unit: 'lb',
        shown: { amount: 6, unit: 'lb' },
        text: '6 lb apples',
      },
    ]);
    expect(plan.shopping.pantry.map((item: { text: string }) => item.text)).toEqual(
      expectedScale.ingredients
        .filter((i) => i.role !== 'produce')
        .map((i) => `${formatKitchenAmount(i.amount, i.unit)} ${i.name}`),
    );
    // Harvest in September and October: the next window ends on 31 October 2027.
    expect(plan.targetOn).toBe('2027-10-31');
    expect(todo.dueOn).toBe('2027-10-31');
  });

  it('makes the suggested number of jars when none is given', async () => {
    const product = await addProduct(ctx.householdId, { name: 'Test Pippin Butter', favourite: true, minJars: 4 });
    await addAppleButterRecipe(product);
    await addJars(product, { sealed: 1 });
    const keeper = await ctx.signedIn('keeper@larderly.test');
    const restock = await keeper.get(`/api/households/${ctx.householdId}/restock`);
    const suggestion = restock.body.suggestions.find((s: { productId: string }) => s.productId === product.id);
    expect(suggestion.reason).toBe('below-minimum');

    const response = await keeper.post(todoUrl(product.id)).send({});
    expect(response.status).toBe(201);
    expect(response.body.todo.batchPlan.jars).toBe(suggestion.suggestedJars);
    expect(response.body.todo.batchPlan.reason).toBe('below-minimum');
    expect(response.body.todo.batchPlan.scaled).toEqual(
      scaleRecipe(
        { yield: { jars: 8, jarSize: 'pint' }, ingredients: APPLE_BUTTER_INGREDIENTS, kind: 'fruit-butter' },
        { jars: suggestion.suggestedJars, jarSize: 'half-pint' },
      ),
    );
    const again = await keeper.get(`/api/households/${ctx.householdId}/restock`);
    expect(again.body.suggestions.find((s: { productId: string }) => s.productId === product.id).openTodoId).toBe(
      response.body.todo.id,
    );
  });

  it('refuses a product with no recipe, saying why and where to add one', async () => {
    const product = await addProduct(ctx.householdId, { name: 'Test Bare Butter', favourite: true, minJars: 2 });
    const cook = await ctx.signedIn('cook@larderly.test');
    const response = await cook.post(todoUrl(product.id)).send({ jars: 4 });
    expect(response.status).toBe(422);
    expect(response.body.error.message).toMatch(/Test Bare Butter has no recipe yet/);
    expect(response.body.error.details.action.href).toBe(`/h/${ctx.householdId}/recipes/new?productId=${product.id}`);
  });

  it('refuses a jar size the recipe has no tested time for', async () => {
    const product = await addProduct(ctx.householdId, { name: 'Test Quart Butter', favourite: true });
    await addAppleButterRecipe(product);
    const cook = await ctx.signedIn('cook@larderly.test');
    const response = await cook.post(todoUrl(product.id)).send({ jars: 4, jarSize: 'quart' });
    expect(response.status).toBe(422);
    expect(response.body.error.message).toMatch(/no tested time for quart jars/);
  });

  it('lets only cooks and keepers plan a batch, and shows the neighbour nothing of it', async () => {
    const product = await addProduct(ctx.householdId, { name: 'Test Hidden Butter', favourite: true, minJars: 3 });
    await addAppleButterRecipe(product);
    const helper = await ctx.signedIn('helper@larderly.test');
    expect((await helper.post(todoUrl(product.id)).send({ jars: 4 })).status).toBe(403);

    const cook = await ctx.signedIn('cook@larderly.test');
    const { body } = await cook.post(todoUrl(product.id)).send({ jars: 4 });
    const neighbour = await ctx.signedIn('neighbor@larderly.test');
    expect((await neighbour.post(todoUrl(product.id)).send({ jars: 4 })).status).toBe(404);
    expect((await neighbour.get(`/api/households/${ctx.householdId}/todos/${body.todo.id}`)).status).toBe(404);
    expect((await neighbour.get(`/api/households/${ctx.neighbourHouseholdId}/todos/${body.todo.id}`)).status).toBe(404);
    expect(
      (await neighbour.post(`/api/households/${ctx.neighbourHouseholdId}/restock/${product.id}/todo`).send({ jars: 4 }))
        .status,
    ).toBe(404);
    const ownList = await neighbour.get(`/api/households/${ctx.neighbourHouseholdId}/todos`);
    expect(ownList.status).toBe(200);
    expect(JSON.stringify(ownList.body)).not.toMatch(/Hidden Butter/);
  });
});
