import { afterAll, afterEach, beforeAll, describe, expect, it } from 'vitest';
import { addDays, SEAL_CHECK_AFTER_HOURS } from '../../shared/domain';
import type { JarStockView } from '../../shared/schemas/stock';
import { clock, todayIn } from '../../server/services/clock';
import { DEMO_STOCK } from '../../server/demo/stock';
import { demoApp } from '../support/app';
import { instantAt } from '../support/household-time';
import { shelfLookups } from './shelf-helpers';

// The demo household keeps New York time; its cupboard is DEMO_STOCK, counted by the keeper (Wren Calloway).
const ZONE = 'America/New_York';
const HOUR = 3_600_000;

let ctx: Awaited<ReturnType<typeof demoApp>>;
let cook: Awaited<ReturnType<typeof ctx.signedIn>>;
let keeper: Awaited<ReturnType<typeof ctx.signedIn>>;
let lookups: Awaited<ReturnType<typeof shelfLookups>>;
beforeAll(async () => {
  ctx = await demoApp();
  cook = await ctx.signedIn('cook@larderly.test');
  keeper = await ctx.signedIn('keeper@larderly.test');
  lookups = await shelfLookups(ctx, cook);
});
afterAll(() => ctx.close());
const realNow = clock.now;
afterEach(() => {
  clock.now = realNow;
});

const stock = async (): Promise<JarStockView> => {
  const response = await keeper.get(`${lookups.base}/stock`);
  expect(response.status).toBe(200);
  return response.body.stock;
};
const pints = (view: JarStockView) => view.jars.find((j) => j.size === 'pint')!.count;
const lids = (view: JarStockView, mouth: 'regular' | 'wide') => view.lids.find((l) => l.mouth === mouth)!.count;
const setCount = (item: 'jar' | 'lid', size: string, count: number) =>
  keeper.post(`${lookups.base}/stock/correction`).send({ item, size, count, note: 'Counted the cupboard' });

/** Pickled beets in pints: the demo's regular-mouth jar unless the cook says otherwise. */
async function recordPints(jarsFilled: number, extra: Record<string, unknown> = {}) {
  const response = await cook.post(`${lookups.base}/batches`).send({
    productId: lookups.product('Pickled Beets').id,
    recipeId: lookups.recipe('Pickled beets').id,
    cannedOn: todayIn(ZONE),
    jarSize: 'pint',
    jarsFilled,
    jarsSealed: jarsFilled,
    method: 'boiling-water',
    ...extra,
  });
  expect(response.status, JSON.stringify(response.body)).toBe(201);
  return response.body as { batch: { id: string; mouth: string }; jars: { id: string }[]; stockWarnings: string[] };
}

describe('empty jars and new lids in stock', () => {
  it('starts from the demo cupboard, counted by hand with the keeper named in the history', async () => {
    const view = await stock();
    for (const { item, size, delta } of DEMO_STOCK) {
      const count =
        item === 'jar' ? view.jars.find((j) => j.size === size)!.count : view.lids.find((l) => l.mouth === size)!.count;
      expect(count, `${item} ${size}`).toBe(delta);
    }
    expect(view.history.filter((row) => row.reason === 'correction')).toHaveLength(DEMO_STOCK.length);
    expect(view.history.every((row) => row.who === 'Wren Calloway')).toBe(true);
  });

  it('recording a batch takes its jars and one new lid a jar, sealed or not (lids are single-use: USDA Complete Guide 2015, NCHFP)', async () => {
    expect((await setCount('jar', 'pint', 6)).status).toBe(200);
    expect((await setCount('lid', 'regular', 8)).status).toBe(200);
    const response = await cook.post(`${lookups.base}/batches`).send({
      productId: lookups.product('Pickled Beets').id,
      recipeId: lookups.recipe('Pickled beets').id,
      cannedOn: todayIn(ZONE),
      jarSize: 'pint',
      jarsFilled: 4,
      jarsSealed: 3,
      method: 'boiling-water',
    });
    expect(response.status).toBe(201);
    // A pint's usual mouth is regular (common practice); the jar that did not seal still used its lid.
    expect(response.body.batch.mouth).toBe('regular');
    expect(response.body.stockWarnings).toEqual([]);
    const view = await stock();
    expect([pints(view), lids(view, 'regular')]).toEqual([2, 4]);
    expect(view.history.slice(0, 2)).toMatchObject([
      { item: 'lid', size: 'regular', reason: 'record', delta: -4, countAfter: 4, who: 'Tobias Calloway' },
      { item: 'jar', size: 'pint', reason: 'record', delta: -4, countAfter: 2, who: 'Tobias Calloway' },
    ]);
  });

  it('takes wide-mouth lids when the cook says the jars are wide-mouth', async () => {
    await setCount('lid', 'wide', 5);
    const before = await stock();
    const { batch } = await recordPints(2, { mouth: 'wide' });
    expect(batch.mouth).toBe('wide');
    const after = await stock();
    expect(lids(after, 'wide')).toBe(3);
    expect(lids(after, 'regular')).toBe(lids(before, 'regular'));
  });

  it('counts down to zero and says so when a batch uses more jars and lids than were entered', async () => {
    await setCount('jar', 'pint', 6);
    await setCount('lid', 'regular', 0);
    const { stockWarnings } = await recordPints(10);
    expect(stockWarnings).toHaveLength(2);
    expect(stockWarnings[0]).toMatch(/^10 pint jars used with 6 in stock: the count is now 0\./);
    expect(stockWarnings[1]).toMatch(/^10 regular-mouth lids used with 0 in stock/);
    const view = await stock();
    expect([pints(view), lids(view, 'regular')]).toEqual([0, 0]);
    expect(view.history[1]).toMatchObject({ item: 'jar', delta: -6, short: 4, countAfter: 0 });
  });

  it('a finished jar brings its empty jar back (jars and bands are reused: USDA Complete Guide 2015, NCHFP); putting it back takes it out again', async () => {
    const { jars } = await recordPints(2);
    await setCount('jar', 'pint', 0);
    const jar = jars[0].id;
    expect((await cook.post(`${lookups.base}/jars/${jar}/open`)).status).toBe(200);
    expect(pints(await stock())).toBe(0);
    const finished = await cook.post(`${lookups.base}/jars/${jar}/finish`);
    expect(finished.status).toBe(200);
    expect(pints(await stock())).toBe(1);
    const undone = await cook.post(`${lookups.base}/jars/${jar}/undo`).send({ eventId: finished.body.eventId });
    expect(undone.status, undone.text).toBe(200);
    const view = await stock();
    expect(pints(view)).toBe(0);
    expect(view.history[0]).toMatchObject({ reason: 'undo', delta: -1, item: 'jar', size: 'pint' });
  });

  it('a discarded jar comes back when it was kept, and not when it was not', async () => {
    const { jars } = await recordPints(2);
    await setCount('jar', 'pint', 0);
    const helper = await ctx.signedIn('helper@larderly.test');
    const kept = await helper.post(`${lookups.base}/jars/${jars[0].id}/discard`).send({ kept: true });
    expect(kept.status).toBe(200);
    expect(pints(await stock())).toBe(1);
    const broken = await helper.post(`${lookups.base}/jars/${jars[1].id}/discard`).send({ kept: false });
    expect(broken.status).toBe(200);
    const view = await stock();
    expect(pints(view)).toBe(1);
    expect(view.history[0]).toMatchObject({ reason: 'discard', delta: 1, who: 'Juniper Calloway' });
    const refused = await helper.post(`${lookups.base}/jars/${jars[1].id}/discard`).send({ kept: 'maybe' });
    expect(refused.status).toBe(400);
  });

  it('a given jar takes its empty jar with it, and putting the gift back changes no count (common practice: a gift leaves in its jar)', async () => {
    const { jars } = await recordPints(1);
    await setCount('jar', 'pint', 3);
    const given = await cook.post(`${lookups.base}/jars/${jars[0].id}/give`).send({ to: 'the Okafors next door' });
    expect(given.status, given.text).toBe(200);
    expect(pints(await stock())).toBe(3);
    const undone = await cook.post(`${lookups.base}/jars/${jars[0].id}/undo`).send({ eventId: given.body.eventId });
    expect(undone.status, undone.text).toBe(200);
    const view = await stock();
    expect(pints(view)).toBe(3);
    expect(view.history[0]).toMatchObject({ reason: 'correction', countAfter: 3 });
  });

  it('a reprocess takes a new lid a jar and no jars (reprocess within 24 hours with a new lid: NCHFP)', async () => {
    const processedAt = instantAt(addDays(todayIn(ZONE), -1), 20, 0, ZONE);
    clock.now = () => processedAt;
    const { batch, jars } = await recordPints(4, { seals: 'to-check' });
    await setCount('lid', 'regular', 10);
    await setCount('jar', 'pint', 3);
    clock.now = () => new Date(processedAt.getTime() + (SEAL_CHECK_AFTER_HOURS + 1) * HOUR);
    const checked = await cook
      .post(`${lookups.base}/batches/${batch.id}/seal-check`)
      .send({ reprocess: { jarIds: [jars[0].id, jars[1].id] } });
    expect(checked.status, checked.text).toBe(200);
    expect(checked.body.stockWarnings).toEqual([]);
    const view = await stock();
    expect([pints(view), lids(view, 'regular')]).toEqual([3, 8]);
    expect(view.history[0]).toMatchObject({ reason: 'reprocess', item: 'lid', delta: -2, batchId: batch.id });
  });

  it('20 jars finished at once bring back exactly 20 empty jars', async () => {
    const { jars } = await recordPints(20);
    await Promise.all(jars.map((jar) => cook.post(`${lookups.base}/jars/${jar.id}/open`).expect(200)));
    await setCount('jar', 'pint', 0);
    const people = await Promise.all([ctx.signedIn('helper@larderly.test'), cook, keeper]);
    const finished = await Promise.all(
      jars.map((jar, i) => people[i % 3].post(`${lookups.base}/jars/${jar.id}/finish`)),
    );
    expect(finished.map((r) => r.status)).toEqual(Array(20).fill(200));
    const view = await stock();
    expect(pints(view)).toBe(20);
    expect(view.history.slice(0, 20).every((row) => row.reason === 'finish' && row.delta === 1)).toBe(true);
    expect(
      view.history
        .slice(0, 20)
        .map((row) => row.countAfter)
        .sort((a, b) => a - b),
    ).toEqual(Array.from({ length: 20 }, (_, i) => i + 1));
  });
});

describe('a hand count', () => {
  it('sets the count, and the history names who counted, by how much and why', async () => {
    await setCount('lid', 'wide', 12);
    const response = await setCount('lid', 'wide', 9);
    expect(response.status).toBe(200);
    expect(lids(response.body.stock, 'wide')).toBe(9);
    expect(response.body.stock.history[0]).toMatchObject({
      item: 'lid',
      size: 'wide',
      reason: 'correction',
      delta: -3,
      countAfter: 9,
      note: 'Counted the cupboard',
      who: 'Wren Calloway',
    });
    // The same count again changes nothing and adds no row.
    const again = await setCount('lid', 'wide', 9);
    expect(again.body.stock.history[0].id).toBe(response.body.stock.history[0].id);
  });

  it('is refused to a helper, answers 404 to another household, and explains a bad count', async () => {
    const helper = await ctx.signedIn('helper@larderly.test');
    const refused = await helper.post(`${lookups.base}/stock/correction`).send({ item: 'jar', size: 'pint', count: 3 });
    expect(refused.status).toBe(403);
    expect((await helper.get(`${lookups.base}/stock`)).status).toBe(200);
    const neighbour = await ctx.signedIn('neighbor@larderly.test');
    expect((await neighbour.get(`${lookups.base}/stock`)).status).toBe(404);
    expect(
      (await neighbour.post(`${lookups.base}/stock/correction`).send({ item: 'jar', size: 'pint', count: 3 })).status,
    ).toBe(404);
    const lidAsJar = await keeper
      .post(`${lookups.base}/stock/correction`)
      .send({ item: 'lid', size: 'pint', count: 3 });
    expect(lidAsJar.status).toBe(400);
    expect(lidAsJar.body.error.fields.size).toBe('Choose regular or wide mouth.');
    const negative = await keeper
      .post(`${lookups.base}/stock/correction`)
      .send({ item: 'jar', size: 'quart', count: -1 });
    expect(negative.status).toBe(400);
    expect(negative.body.error.fields.count).toBe('Use 0 or more.');
  });
});

describe('the batch plan against stock', () => {
  it('says what to buy after what is in stock, and the to-do it offers (one new lid a jar: USDA Complete Guide 2015)', async () => {
    await setCount('jar', 'pint', 6);
    await setCount('lid', 'regular', 0);
    const made = await cook
      .post(`${lookups.base}/restock/${lookups.product('Pickled Beets').id}/todo`)
      .send({ jars: 10, jarSize: 'pint' });
    expect(made.status, made.text).toBe(201);
    expect(made.body.todo.batchPlan.stock).toEqual({
      mouth: 'regular',
      emptyJars: 6,
      lids: 0,
      buyJars: 4,
      buyLids: 10,
      words: 'You have 6 empty pint jars and no new regular-mouth lids: buy 4 jars and 10 regular-mouth lids.',
      todoTitle: 'Buy 10 regular-mouth lids and 4 pint jars',
    });
    // The plan reads the stock as it is now: with lids counted in, only the jars are left to buy.
    await setCount('lid', 'regular', 12);
    const again = await cook.get(`${lookups.base}/todos/${made.body.todo.id}`);
    expect(again.body.todo.batchPlan.stock).toMatchObject({ buyJars: 4, buyLids: 0, todoTitle: 'Buy 4 pint jars' });
    await setCount('jar', 'pint', 10);
    const enough = await cook.get(`${lookups.base}/todos/${made.body.todo.id}`);
    expect(enough.body.todo.batchPlan.stock).toMatchObject({ buyJars: 0, buyLids: 0, todoTitle: null });
    expect(enough.body.todo.batchPlan.stock.words).toMatch(/enough for this batch\.$/);
    // The mouth is the jars': once the household cans these pints in wide-mouth jars, the plan buys wide-mouth lids.
    await recordPints(1, { mouth: 'wide' });
    await setCount('lid', 'wide', 0);
    const wide = await cook.get(`${lookups.base}/todos/${made.body.todo.id}`);
    expect(wide.body.todo.batchPlan.stock).toMatchObject({ mouth: 'wide', buyLids: 10 });
    expect(wide.body.todo.batchPlan.stock.todoTitle).toBe('Buy 10 wide-mouth lids and 1 pint jar');
  });
});
