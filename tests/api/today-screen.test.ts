import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { addDays } from '../../shared/domain';
import { demoApp } from '../support/app';
import { holdClockAt } from '../support/held-clock';
import { addJars, addProduct, planPortion } from '../support/restock-fixtures';

const TODAY = '2026-12-02';
holdClockAt('2026-12-02T17:00:00Z');
let ctx: Awaited<ReturnType<typeof demoApp>>;
beforeAll(async () => {
  ctx = await demoApp();
});
afterAll(() => ctx.close());

const todayUrl = () => `/api/households/${ctx.householdId}/today`;

describe('the Today read', () => {
  it('serves today from the opened jar first, and opens the oldest sealed jar where none is open', async () => {
    const opened = await addProduct(ctx.householdId, { name: 'Test Lime Pickle', kind: 'pickle' });
    const [openJar] = await addJars(opened, {
      opened: [{ openedOn: addDays(TODAY, -3), useBy: addDays(TODAY, 27), remainingTbsp: 10 }],
    });
    await addJars(opened, { sealed: 2 });
    const sealedOnly = await addProduct(ctx.householdId, { name: 'Test Peach Chutney', kind: 'chutney' });
    const [newer] = await addJars(sealedOnly, { sealed: 1, cannedOn: '2026-09-20' });
    const [older] = await addJars(sealedOnly, { sealed: 1, cannedOn: '2026-08-10' });
    await planPortion(opened, TODAY, { tbspPerServing: 1, servings: 2, slot: 'lunch', title: 'Dal and rice' });
    await planPortion(sealedOnly, TODAY, { tbspPerServing: 2, servings: 3, slot: 'dinner', title: 'Roast pork' });
    await planPortion(sealedOnly, addDays(TODAY, 1), { tbspPerServing: 2, servings: 3, title: 'Tomorrow’s supper' });

    const keeper = await ctx.signedIn('keeper@larderly.test');
    const response = await keeper.get(todayUrl());
    expect(response.status).toBe(200);
    expect(response.body.today).toBe(TODAY);
    const use = response.body.use.filter((u: { productName: string }) => u.productName.startsWith('Test '));
    // The week allocation's rule: opened jars first, then the oldest sealed jar.
    expect(use).toEqual([
      expect.objectContaining({
        slot: 'lunch',
        mealTitle: 'Dal and rice',
        productName: 'Test Lime Pickle',
        tbsp: 2,
        jarCode: openJar.code,
        opensToday: false,
      }),
      expect.objectContaining({
        slot: 'dinner',
        mealTitle: 'Roast pork',
        productName: 'Test Peach Chutney',
        tbsp: 6,
        jarCode: older.code,
        opensToday: true,
      }),
    ]);
    expect(use.some((u: { jarCode: string }) => u.jarCode === newer.code)).toBe(false);
  });

  it('serves today from an opened jar with two days left on its use-by, even after the product was set to keep fewer days, instead of opening a new one', async () => {
    // Opened ten days ago while the product kept twelve days (use-by in two days); the household has since set seven.
    const product = await addProduct(ctx.householdId, {
      name: 'Test Shortened Relish',
      kind: 'relish',
      useWithinDays: 7,
    });
    const [openJar] = await addJars(product, {
      opened: [{ openedOn: addDays(TODAY, -10), useBy: addDays(TODAY, 2), remainingTbsp: 12 }],
    });
    const [sealed] = await addJars(product, { sealed: 1 });
    await planPortion(product, TODAY, { tbspPerServing: 1, servings: 2, slot: 'lunch', title: 'Cheese toast' });

    const response = await (await ctx.signedIn('helper@larderly.test')).get(todayUrl());
    const use = response.body.use.filter((u: { productName: string }) => u.productName === 'Test Shortened Relish');
    expect(use).toEqual([
      expect.objectContaining({
        jarId: openJar.id,
        jarCode: openJar.code,
        opensToday: false,
        openedJarDaysLeft: 2,
        tbsp: 2,
      }),
    ]);
    expect(use.some((u: { jarCode: string }) => u.jarCode === sealed.code)).toBe(false);
    expect(response.body.fridge).toContainEqual(expect.objectContaining({ code: openJar.code, daysLeft: 2 }));
  });

  it('names what the shelf cannot cover today', async () => {
    const product = await addProduct(ctx.householdId, { name: 'Test Empty Relish', kind: 'relish' });
    await planPortion(product, TODAY, { tbspPerServing: 1, servings: 4, slot: 'breakfast', title: 'Eggs' });
    const response = await (await ctx.signedIn('helper@larderly.test')).get(todayUrl());
    expect(response.body.short).toContainEqual({ productName: 'Test Empty Relish', tbsp: 4 });
    expect(response.body.use).toContainEqual(
      expect.objectContaining({ productName: 'Test Empty Relish', jarCode: null, opensToday: false }),
    );
  });

  it('lists the fridge jars with the soonest use-by first, with the days left', async () => {
    const product = await addProduct(ctx.householdId, { name: 'Test Fridge Jam', kind: 'jam' });
    await addJars(product, {
      opened: [
        { openedOn: addDays(TODAY, -20), useBy: addDays(TODAY, -1), remainingTbsp: 3 },
        { openedOn: addDays(TODAY, -2), useBy: addDays(TODAY, 19), remainingTbsp: 12 },
      ],
    });
    const response = await (await ctx.signedIn('keeper@larderly.test')).get(todayUrl());
    const useBys = response.body.fridge.map((jar: { useBy: string }) => jar.useBy);
    expect(useBys).toEqual([...useBys].sort());
    expect(response.body.fridge[0]).toMatchObject({
      productName: 'Test Fridge Jam',
      useBy: addDays(TODAY, -1),
      daysLeft: -1,
    });
    expect(response.body.fridgeCount).toBeGreaterThanOrEqual(response.body.fridge.length);
  });

  it('carries the restock suggestions and only my open to-dos', async () => {
    const product = await addProduct(ctx.householdId, { name: 'Test Today Butter', favourite: true, minJars: 3 });
    await addJars(product, { sealed: 1 });
    const cook = await ctx.signedIn('cook@larderly.test');
    const helper = await ctx.signedIn('helper@larderly.test');
    const cookId = (await cook.get('/api/auth/me')).body.user.id;
    const helperId = (await helper.get('/api/auth/me')).body.user.id;
    const todos = `/api/households/${ctx.householdId}/todos`;
    await cook.post(todos).send({ title: 'Cook: buy lids', assigneeId: cookId });
    await cook.post(todos).send({ title: 'Helper: wash jars', assigneeId: helperId });
    const finished = (await cook.post(todos).send({ title: 'Cook: done already', assigneeId: cookId })).body.todo;
    await cook.patch(`${todos}/${finished.id}`).send({ done: true });

    const response = await cook.get(todayUrl());
    expect(response.body.restock).toContainEqual(
      expect.objectContaining({ productName: 'Test Today Butter', reason: 'below-minimum' }),
    );
    const myTitles = response.body.myTodos.map((t: { title: string }) => t.title);
    expect(myTitles).toContain('Cook: buy lids');
    expect(myTitles).not.toContain('Helper: wash jars');
    expect(myTitles).not.toContain('Cook: done already');
    const mine = (await cook.get(`${todos}?filter=mine`)).body.todos.map((t: { title: string }) => t.title);
    expect(myTitles).toEqual(mine);
    expect(response.body.openTodoCount).toBe((await cook.get(`${todos}?filter=open`)).body.todos.length);
  });

  it("answers the neighbour 404 and never this household's data", async () => {
    const neighbour = await ctx.signedIn('neighbor@larderly.test');
    const response = await neighbour.get(todayUrl());
    expect(response.status).toBe(404);
    expect(JSON.stringify(response.body)).not.toMatch(/Test /);
    const own = await neighbour.get(`/api/households/${ctx.neighbourHouseholdId}/today`);
    expect(own.status).toBe(200);
    expect(JSON.stringify(own.body)).not.toMatch(/Test |Cook: /);
  });
});
