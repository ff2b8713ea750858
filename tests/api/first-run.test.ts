import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { TodoView } from '../../shared/schemas/todos';
import { accountSignedIn } from '../support/accounts';
import { demoApp } from '../support/app';

let ctx: Awaited<ReturnType<typeof demoApp>>;
beforeAll(async () => {
  ctx = await demoApp();
});
afterAll(() => ctx.close());

async function newHousehold(email: string) {
  const { agent, me } = await accountSignedIn(ctx.app, {
    name: 'Wren',
    email,
    password: 'a long enough password',
    householdName: 'Ridge Top',
  });
  return { agent, hid: me.memberships[0].householdId };
}

describe('first run: nothing is planned before the altitude is confirmed', () => {
  it('a new household starts unconfirmed, and the plan preview and a batch are refused with the way forward', async () => {
    const { agent, hid } = await newHousehold('wren@example.test');
    const household = (await agent.get(`/api/households/${hid}`)).body.household;
    expect(household).toMatchObject({ altitudeConfirmed: false, timeZone: 'UTC' });

    const product = await agent
      .post(`/api/households/${hid}/products`)
      .send({ name: 'Ridge Chutney', kind: 'chutney', jarSize: 'half-pint' });
    expect(product.status, product.text).toBe(201);
    const preview = await agent
      .get(`/api/households/${hid}/batches/plan`)
      .query({ recipeId: '00000000-0000-4000-8000-000000000000', jarSize: 'half-pint', method: 'boiling-water' });
    expect(preview.status).toBe(422);
    expect(preview.body.error.message).toMatch(/altitude has not been confirmed/);
    expect(preview.body.error.details.action.href).toBe(`/h/${hid}/setup`);
    const restock = await agent.post(`/api/households/${hid}/restock/${product.body.product.id}/todo`).send({});
    expect(restock.status).toBe(422);
    expect(restock.body.error.message).toMatch(/altitude/);
  });

  it('saving the altitude confirms it, and UTC is stored as UTC', async () => {
    const { agent, hid } = await newHousehold('ash@example.test');
    const saved = await agent.patch(`/api/households/${hid}`).send({
      altitudeFt: 5200,
      timeZone: 'UTC',
      cannerCapacityJars: 9,
      defaultMethod: 'boiling-water',
      weekStartsOn: 0,
    });
    expect(saved.status, saved.text).toBe(200);
    expect(saved.body.household).toMatchObject({
      altitudeFt: 5200,
      altitudeConfirmed: true,
      timeZone: 'UTC',
      cannerCapacityJars: 9,
      weekStartsOn: 0,
    });
    expect((await agent.get(`/api/households/${hid}`)).body.household.timeZone).toBe('UTC');
  });

  it('the demo households are seeded as confirmed', async () => {
    const keeper = await ctx.signedIn('keeper@larderly.test');
    expect((await keeper.get(`/api/households/${ctx.householdId}`)).body.household.altitudeConfirmed).toBe(true);
  });
});

describe('a restock to-do’s batch plan follows the household as it is now', () => {
  it('after the altitude moves from 2,350 to 5,200 ft the plan gives the 3,001-6,000 ft time and says what changed', async () => {
    const keeper = await ctx.signedIn('keeper@larderly.test');
    const restock = async () =>
      ((await keeper.get(`/api/households/${ctx.householdId}/todos`)).body.todos as TodoView[]).find(
        (t) => t.kind === 'restock',
      )!;
    const before = await restock();
    expect(before.batchPlan!.altitudeFt).toBe(2350);
    expect(before.batchPlan!.changes).toEqual([]);
    const recipe = (await keeper.get(`/api/households/${ctx.householdId}/recipes/${before.batchPlan!.recipeId}`)).body
      .recipe;
    const base = recipe.baseMinutes[before.batchPlan!.jarSize] as number;
    // USDA Complete Guide (2015), Guide 1, boiling-water table: +5 min at 1,001-3,000 ft, +10 min at 3,001-6,000 ft.
    expect(before.batchPlan!.processing.minutes).toBe(base + 5);

    expect(
      (await keeper.patch(`/api/households/${ctx.householdId}`).send({ altitudeFt: 5200, cannerCapacityJars: 4 }))
        .status,
    ).toBe(200);
    const after = await restock();
    expect(after.batchPlan!.altitudeFt).toBe(5200);
    expect(after.batchPlan!.processing.minutes).toBe(base + 10);
    expect(after.batchPlan!.equipment.cannerCapacityJars).toBe(4);
    expect(after.batchPlan!.changes!.join(' ')).toContain('altitude is now 5,200 ft (it was 2,350 ft');
    expect(after.batchPlan!.changes!.join(' ')).toContain(
      `Processing is now ${base + 10} minutes (it was ${base + 5} minutes)`,
    );
    expect(after.batchPlan!.changes!.join(' ')).toContain('canner now holds 4 jars');
    const one = (await keeper.get(`/api/households/${ctx.householdId}/todos/${after.id}`)).body.todo as TodoView;
    expect(one.batchPlan!.processing.minutes).toBe(base + 10);

    // Above 10,000 ft no tested adjustment is published (same source): the plan refuses rather than give a time.
    await keeper.patch(`/api/households/${ctx.householdId}`).send({ altitudeFt: 10_500 });
    const high = await restock();
    expect(high.batchPlan!.processing.allowed).toBe(false);
    expect(high.batchPlan!.processing.minutes).toBeNull();
    await keeper.patch(`/api/households/${ctx.householdId}`).send({ altitudeFt: 2350, cannerCapacityJars: 7 });
  });
});
