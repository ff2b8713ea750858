import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { addDays, jarCapacityTbsp } from '../../shared/domain';
import { weekStartOf } from '../../shared/schemas/week';
import { todayIn } from '../../server/services/clock';
import { demoApp } from '../support/app';
import { productWithJars, recipeFor } from '../support/week-shelf';

let ctx: Awaited<ReturnType<typeof demoApp>>;
let cook: Awaited<ReturnType<typeof ctx.signedIn>>;
// Three weeks ahead of the household's today: after the demo plan, so only this file's products are drawn.
let start: string;

beforeAll(async () => {
  ctx = await demoApp();
  cook = await ctx.signedIn('cook@larderly.test');
  start = weekStartOf(addDays(todayIn('America/New_York'), 21), 1);
});
afterAll(() => ctx.close());

const url = (path: string) => `/api/households/${ctx.householdId}${path}`;

async function planWith(date: string, title: string, productId: string, tbspPerServing: number, servings: number) {
  const id = (await cook.post(url('/plan-entries')).send({ date, slot: 'dinner', title, servings })).body.id;
  const pairing = await cook.post(url(`/plan-entries/${id}/pairings`)).send({ productId, tbspPerServing });
  expect(pairing.status).toBe(201);
  return { entryId: id as string, pairingId: pairing.body.pairing.id as string };
}

describe('the allocation on GET /week', () => {
  it('names the jar each portion draws from, and the day a jar is opened', async () => {
    const { product, jars } = await productWithJars(ctx.householdId, {
      name: 'Test Quince Chutney',
      kind: 'chutney',
      jars: 1,
    });
    const { pairingId } = await planWith(addDays(start, 1), 'Roast chicken', product.id, 2, 4);
    const week = (await cook.get(url(`/week?start=${start}`))).body;
    expect(week.allocation.assignments).toContainEqual({ portionId: pairingId, jarId: jars[0].id, tbsp: 8 });
    expect(week.allocation.openings).toContainEqual({ jarId: jars[0].id, date: addDays(start, 1) });
    expect(week.jars[jars[0].id].code).toBe(jars[0].code);
    expect(week.products.find((p: { id: string }) => p.id === product.id)).toMatchObject({
      sealedJars: 1,
      openedJars: 0,
    });
  });

  it('warns `short` when the shelf cannot cover a pairing', async () => {
    // One half-pint holds 16 tbsp (8 fl oz at 2 tbsp to the fl oz: NIST Handbook 44, Appendix C); the plan asks 3 x 8 = 24.
    expect(jarCapacityTbsp('half-pint')).toBe(16);
    const { product, jars } = await productWithJars(ctx.householdId, { name: 'Test Gooseberry Relish', jars: 1 });
    const date = addDays(start, 2);
    const { pairingId } = await planWith(date, 'Fish cakes', product.id, 3, 8);
    const week = (await cook.get(url(`/week?start=${start}`))).body;
    expect(week.allocation.assignments.filter((a: { portionId: string }) => a.portionId === pairingId)).toEqual([
      { portionId: pairingId, jarId: jars[0].id, tbsp: 16 },
      { portionId: pairingId, jarId: null, tbsp: 8 },
    ]);
    expect(week.allocation.warnings).toContainEqual({
      kind: 'short',
      productId: product.id,
      date,
      tbsp: 8,
      portionId: pairingId,
    });
  });

  it('warns `short` for a product with no jars at all', async () => {
    const { product } = await productWithJars(ctx.householdId, { name: 'Test Empty Salsa', kind: 'salsa', jars: 0 });
    const { pairingId } = await planWith(addDays(start, 3), 'Tacos', product.id, 1, 2);
    const week = (await cook.get(url(`/week?start=${start}`))).body;
    expect(week.allocation.warnings).toContainEqual(
      expect.objectContaining({ kind: 'short', productId: product.id, tbsp: 2, portionId: pairingId }),
    );
  });

  it('warns `will-expire` for an opened jar that turns this week with food left, even when no meal draws on it', async () => {
    // The jam default of 21 days once opened is from memory (shared/domain/products.ts), not a published figure.
    const { product, jars } = await productWithJars(ctx.householdId, {
      name: 'Test Open Damson Jam',
      kind: 'jam',
      jars: 1,
    });
    const openedOn = addDays(start, -20);
    await jars[0].update({ state: 'opened', openedOn, useBy: addDays(openedOn, 21), remainingTbsp: 10 });
    const week = (await cook.get(url(`/week?start=${start}`))).body;
    expect(week.allocation.warnings).toContainEqual({
      kind: 'will-expire',
      productId: product.id,
      jarId: jars[0].id,
      date: addDays(start, 1),
      tbsp: 10,
    });
    expect(week.jars[jars[0].id]).toMatchObject({ code: jars[0].code, state: 'opened' });
  });

  it('leaves a week in the past without allocation', async () => {
    const past = weekStartOf('2020-01-15', 1);
    const week = (await cook.get(url(`/week?start=${past}`))).body;
    expect(week.allocation).toEqual({ assignments: [], openings: [], warnings: [] });
    expect(week.days.map((d: { date: string }) => d.date)).toEqual([0, 1, 2, 3, 4, 5, 6].map((i) => addDays(past, i)));
  });

  it('snaps a start to the household week start (Monday for the demo household)', async () => {
    const week = (await cook.get(url(`/week?start=${addDays(start, 3)}`))).body;
    expect(week.start).toBe(start);
    expect(week.weekStartsOn).toBe(1);
  });
});

describe('who eats: flags on a pairing', () => {
  it('flags a product hotter than an eater keeps to, and a sugar-sweetened recipe for a no-added-sugar eater, with reasons', async () => {
    const keeper = await ctx.signedIn('keeper@larderly.test');
    const members = (await keeper.get(url('/members'))).body.members as {
      userId: string;
      email: string;
      name: string;
    }[];
    const helper = members.find((m) => m.email === 'helper@larderly.test')!;
    await keeper
      .patch(url(`/members/${helper.userId}/preferences`))
      .send({ heatTolerance: 1, dietTags: ['no-added-sugar'] });
    const { product } = await productWithJars(ctx.householdId, {
      name: 'Test Fiery Jelly',
      kind: 'jelly',
      heat: 4,
      jars: 2,
    });
    await recipeFor(ctx.householdId, product.id, 'Test fiery jelly card', [
      { name: 'Hot peppers', role: 'produce' },
      { name: 'Cider vinegar', role: 'acid' },
      { name: 'Granulated sugar', role: 'sweetener' },
    ]);
    const { entryId } = await planWith(addDays(start, 4), 'Cornbread', product.id, 1, 3);
    const entryOf = async () => {
      const week = (await cook.get(url(`/week?start=${start}`))).body;
      return week.days.flatMap((d: { entries: unknown[] }) => d.entries).find((e: { id: string }) => e.id === entryId);
    };
    const flags = (await entryOf()).pairings[0].flags as { kind: string; userId: string; reason: string }[];
    const helpers = flags.filter((f) => f.userId === helper.userId);
    expect(helpers.map((f) => f.kind)).toEqual(['heat', 'diet']);
    expect(helpers[0].reason).toMatch(/heat 4.*Juniper.*heat 1/);
    expect(helpers[1].reason).toMatch(/sugar.*no added sugar/);

    // Without the helper at the table the flags go away.
    const others = members.filter((m) => m.userId !== helper.userId).map((m) => m.userId);
    expect((await cook.patch(url(`/plan-entries/${entryId}`)).send({ eaters: others })).status).toBe(200);
    expect((await entryOf()).pairings[0].flags.filter((f: { userId: string }) => f.userId === helper.userId)).toEqual(
      [],
    );
  });
});

describe('the meal library and copying a week', () => {
  it('creates a meal with its usual product, plans it with that pairing, and copies the week', async () => {
    const { product } = await productWithJars(ctx.householdId, { name: 'Test Plum Sauce', kind: 'sauce', jars: 3 });
    const meal = await cook.post(url('/meals')).send({
      name: 'Test pork buns',
      tags: ['weekend'],
      usualServings: 4,
      products: [{ productId: product.id, tbspPerServing: 1.5 }],
    });
    expect(meal.status).toBe(201);
    expect(meal.body.meal).toMatchObject({
      name: 'Test pork buns',
      usualServings: 4,
      products: [{ productId: product.id, tbspPerServing: 1.5 }],
    });

    const from = addDays(start, 14);
    const created = await cook
      .post(url('/plan-entries'))
      .send({ date: addDays(from, 5), slot: 'lunch', mealId: meal.body.meal.id });
    expect(created.status).toBe(201);
    const copied = await cook.post(url('/week/copy')).send({ from, to: addDays(from, 7) });
    expect(copied.body.copied).toBe(1);
    const next = (await cook.get(url(`/week?start=${addDays(from, 7)}`))).body;
    const entry = next.days[5].entries[0];
    expect(entry).toMatchObject({ title: 'Test pork buns', servings: 4, slot: 'lunch', position: 0 });
    expect(entry.pairings).toMatchObject([{ productId: product.id, tbspPerServing: 1.5 }]);

    expect((await cook.delete(url(`/week/days/${addDays(from, 12)}`))).body.removed).toBe(1);
    expect((await cook.get(url(`/week?start=${addDays(from, 7)}`))).body.days[5].entries).toEqual([]);
  });

  it("refuses a meal paired with another household's product", async () => {
    const { product } = await productWithJars(ctx.neighbourHouseholdId, {
      name: 'Test Neighbour Jelly',
      kind: 'jelly',
    });
    const response = await cook
      .post(url('/meals'))
      .send({ name: 'Toast', products: [{ productId: product.id, tbspPerServing: 1 }] });
    expect(response.status).toBe(400);
  });
});
