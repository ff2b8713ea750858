import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { HISTORY_DAYS, jarCapacityTbsp } from '../../shared/domain';
import { LIMITS } from '../../shared/schemas/limits';
import { Jar } from '../../server/db/models';
import { demoApp } from '../support/app';
import { holdClockAt } from '../support/held-clock';
import { addJars, addProduct } from '../support/restock-fixtures';

// Noon in New York on 2 December 2026: the household's today is 2026-12-02, a December of gifts.
holdClockAt('2026-12-02T17:00:00Z');
const TODAY = '2026-12-02';

let ctx: Awaited<ReturnType<typeof demoApp>>;
type Agent = Awaited<ReturnType<typeof ctx.signedIn>>;
let helper: Agent;
let cook: Agent;
let base: string;
beforeAll(async () => {
  ctx = await demoApp();
  helper = await ctx.signedIn('helper@larderly.test');
  cook = await ctx.signedIn('cook@larderly.test');
  base = `/api/households/${ctx.householdId}`;
});
afterAll(() => ctx.close());

/** A product of our own with `sealed` jars on the shelf and jars finished on the given days. */
async function shelfOf(name: string, sealed: number, finishedOn: string[] = []) {
  const product = await addProduct(ctx.householdId, { name, favourite: true, minJars: 0, jarSize: 'half-pint' });
  const jars = await addJars(product, { sealed, finishedOn });
  return { product, sealed: jars.filter((jar) => jar.state === 'sealed') };
}

/** A demo jar on the shelf, sealed and checked: its label code opens its page. */
async function demoSealedJar(index: number) {
  const jars = (await helper.get(`${base}/jars?state=sealed`)).body.jars as {
    id: string;
    code: string;
    batchId: string;
    seal: string;
  }[];
  return jars.filter((jar) => jar.seal === 'checked')[index]!;
}

const history = async (agent: Agent, batchId: string, code: string) =>
  ((await agent.get(`${base}/batches/${batchId}`)).body.batch.history as { kind: string; jarCode: string }[]).filter(
    (event) => event.jarCode === code,
  );

describe('giving a jar away', () => {
  it('takes a sealed jar off the shelf in a state of its own, on its page and in its history, to whom it went', async () => {
    const { sealed } = await shelfOf('Gift Test Quince Jam', 2);
    const jar = await demoSealedJar(0);
    const given = await helper.post(`${base}/jars/${jar.id}/give`).send({ to: '  the Okafors next door ' });
    expect(given.status).toBe(200);
    expect(given.body.jar).toMatchObject({ state: 'given', givenOn: TODAY, givenTo: 'the Okafors next door' });
    expect(given.body.eventId).toEqual(expect.any(String));

    const onHand = (await helper.get(`${base}/jars`)).body.jars as { id: string }[];
    expect(onHand.map((j) => j.id)).not.toContain(jar.id);
    const givenJars = (await helper.get(`${base}/jars?state=given`)).body.jars as { id: string }[];
    expect(givenJars.map((j) => j.id)).toContain(jar.id);

    const page = (await helper.get(`/api/jars/by-code/${jar.code}`)).body;
    expect(page.jar).toMatchObject({ state: 'given', givenTo: 'the Okafors next door' });
    expect(page.lastChange).toMatchObject({ kind: 'given', happenedOn: TODAY });
    expect(await history(helper, jar.batchId, jar.code)).toContainEqual(
      expect.objectContaining({ kind: 'given', givenTo: 'the Okafors next door', who: expect.any(String) }),
    );

    // Nobody named is fine: blank and missing both mean "not said".
    const unnamed = await helper.post(`${base}/jars/${sealed[1]!.id}/give`).send({ to: '   ' });
    expect(unnamed.body.jar).toMatchObject({ state: 'given', givenTo: null });
  });

  it('is undone like the other jar actions: the helper within minutes, a cook from the jar page', async () => {
    const [first, second] = [await demoSealedJar(1), await demoSealedJar(2)];
    const given = await helper.post(`${base}/jars/${first!.id}/give`).send({});
    const undone = await helper.post(`${base}/jars/${first!.id}/undo`).send({ eventId: given.body.eventId });
    expect(undone.status).toBe(200);
    expect(undone.body.jar).toMatchObject({ state: 'sealed', givenOn: null, givenTo: null });
    expect((await history(helper, first!.batchId, first!.code)).map((e) => e.kind)).toEqual(
      expect.arrayContaining(['given', 'restored']),
    );

    await cook.post(`${base}/jars/${second!.id}/give`).send({ to: 'Wren' });
    const page = (await cook.get(`/api/jars/by-code/${second!.code}`)).body;
    expect(
      (await helper.post(`${base}/jars/${second!.id}/undo`).send({ eventId: page.lastChange.eventId })).status,
    ).toBe(403);
    const back = await cook.post(`${base}/jars/${second!.id}/undo`).send({ eventId: page.lastChange.eventId });
    expect(back.body.jar).toMatchObject({ state: 'sealed', givenTo: null });
  });

  it('gives a jar once when ten people give it at the same moment', async () => {
    const { sealed } = await shelfOf('Gift Test Sloe Jelly', 1);
    const answers = await Promise.all(
      Array.from({ length: 10 }, (_, i) =>
        helper.post(`${base}/jars/${sealed[0]!.id}/give`).send({ to: `friend ${i}` }),
      ),
    );
    expect(answers.map((a) => a.status).sort()).toEqual([200, ...Array(9).fill(409)]);
    expect(answers.find((a) => a.status === 409)!.body.error.message).toMatch(/was given away on 2026-12-02/);
  });

  it('gives only a sealed jar whose seal is checked, and says what to do instead', async () => {
    const { sealed } = await shelfOf('Gift Test Damson Jam', 2);
    await helper.post(`${base}/jars/${sealed[0]!.id}/open`);
    const opened = await helper.post(`${base}/jars/${sealed[0]!.id}/give`).send({});
    expect(opened.status).toBe(409);
    expect(opened.body.error.message).toMatch(/was opened on .*Only a sealed jar on the shelf can be given away/);

    // USDA Complete Guide to Home Canning (2015): seals are checked 12 to 24 hours after processing; until then the
    // jar is not known to be sealed, so it does not leave the house.
    await Jar.update({ seal: 'to-check' }, { where: { id: sealed[1]!.id } });
    const cooling = await helper.post(`${base}/jars/${sealed[1]!.id}/give`).send({});
    expect(cooling.status).toBe(409);
    expect(cooling.body.error.message).toMatch(/Check its seal first/);
  });

  it('refuses a name too long, on more than one line, or turned around by invisible marks, with a fix', async () => {
    const { sealed } = await shelfOf('Gift Test Aronia Jam', 1);
    const url = `${base}/jars/${sealed[0]!.id}/give`;
    const atLimit = 'a'.repeat(LIMITS.length.giftRecipient);
    for (const to of [`${atLimit}b`, 'Wren\nDROP', 'Wren\u0000', '\u202Eevil', 42, ['Wren']]) {
      const refused = await helper.post(url).send({ to });
      expect(refused.status, JSON.stringify(to)).toBe(400);
      expect(refused.body.error.fields.to, JSON.stringify(to)).toEqual(expect.any(String));
    }
    expect((await helper.post(url).send({ to: 'x'.repeat(81) })).body.error.fields.to).toMatch(/at most 80 characters/);
    // Nothing was given by the refusals; a name at the limit and in any script is kept whole.
    const kept = await helper.post(url).send({ to: `Zoë 🫙 ${'a'.repeat(LIMITS.length.giftRecipient - 7)}` });
    expect(kept.status).toBe(200);
    expect(kept.body.jar.givenTo).toHaveLength(LIMITS.length.giftRecipient);
  });

  it("answers another household's keeper, and a signed-out visitor, without giving the jar", async () => {
    const { sealed } = await shelfOf('Gift Test Rowan Jelly', 1);
    const neighbour = await ctx.signedIn('neighbor@larderly.test');
    expect((await neighbour.post(`${base}/jars/${sealed[0]!.id}/give`).send({})).status).toBe(404);
    // The neighbour's own household, asked for our jar: the jar is not theirs.
    expect(
      (await neighbour.post(`/api/households/${ctx.neighbourHouseholdId}/jars/${sealed[0]!.id}/give`).send({})).status,
    ).toBe(404);
    expect((await ctx.request.post(`${base}/jars/${sealed[0]!.id}/give`).send({})).status).toBe(401);
    expect((await neighbour.get(`${base}/gifts`)).status).toBe(404);
    await sealed[0]!.reload();
    expect(sealed[0]!.state).toBe('sealed');
  });
});

describe('gifts in the shelf file', () => {
  it('imports a given jar with its day and recipient, and asks for the day when it is missing', async () => {
    const header = 'batch,product,state,canned_on,jar_size,method,minutes,given_on,given_to';
    const row = (state: string, givenOn = '', to = '') =>
      `1,Pickled Beets,${state},2026-09-01,pint,boiling-water,10,${givenOn},${to}`;
    const missing = await cook
      .post(`${base}/shelf/import`)
      .send({ csv: [header, row('sealed'), row('given')].join('\n') });
    expect(missing.body.problems).toContainEqual(
      expect.objectContaining({ field: 'given_on', message: 'A given jar needs the day it was given away.' }),
    );
    const csv = [header, row('sealed'), row('given', '2026-11-20', 'the Lindqvists across the lane')].join('\n');
    expect((await cook.post(`${base}/shelf/import`).send({ csv, commit: true })).status).toBe(201);
    const given = await Jar.findOne({
      where: { householdId: ctx.householdId, givenTo: 'the Lindqvists across the lane' },
    });
    expect(given).toMatchObject({ state: 'given', givenOn: '2026-11-20' });
    expect(await history(cook, given!.batchId, given!.code)).toContainEqual(
      expect.objectContaining({ kind: 'given', happenedOn: '2026-11-20', givenTo: 'the Lindqvists across the lane' }),
    );
  });
});

interface Forecast {
  productId: string;
  historyTbspPerDay: number;
  givenJarsInHistory: number;
  givenThisYear: number;
  sealedJars: number;
  onHandTbsp: number;
}

const forecastOf = async (productId: string) =>
  ((await helper.get(`${base}/restock`)).body.forecasts as Forecast[]).find((f) => f.productId === productId)!;

describe('the use-rate forecast with gifts', () => {
  // The same eating history for every product below: three half-pints finished in November.
  const EATEN = ['2026-11-03', '2026-11-17', '2026-11-29'];
  // A half-pint holds 16 tablespoons (8 fl oz at 1/2 fl oz a tablespoon, NIST Handbook 44, Appendix C).
  const EATING_RATE = (EATEN.length * jarCapacityTbsp('half-pint')) / HISTORY_DAYS;

  it('gives the same eating rate with and without a generous December, and counts the gifts apart', async () => {
    const plain = await shelfOf('Gift Test Plain Pear Butter', 8, EATEN);
    const generous = await shelfOf('Gift Test Generous Pear Butter', 8, EATEN);
    for (const jar of generous.sealed.slice(0, 4))
      expect((await helper.post(`${base}/jars/${jar.id}/give`).send({ to: 'the church sale' })).status).toBe(200);
    // Two of the gifts went at the start of the month, inside the twelve weeks the rate looks back over.
    await Jar.update({ givenOn: '2026-12-01' }, { where: { id: generous.sealed.slice(0, 2).map((j) => j.id) } });

    const without = await forecastOf(plain.product.id);
    const withGifts = await forecastOf(generous.product.id);
    expect(without.historyTbspPerDay).toBeCloseTo(EATING_RATE, 9);
    expect(withGifts.historyTbspPerDay).toBeCloseTo(without.historyTbspPerDay, 9);
    expect(withGifts).toMatchObject({ givenJarsInHistory: 2, givenThisYear: 4, sealedJars: 4 });
    expect(without).toMatchObject({ givenJarsInHistory: 0, givenThisYear: 0, sealedJars: 8 });
    // The gifts left the shelf all the same: what is on hand is four jars less.
    expect(without.onHandTbsp - withGifts.onHandTbsp).toBe(4 * jarCapacityTbsp('half-pint'));

    // The check can fail: the same four jars eaten instead of given do raise the rate.
    const eaten = await shelfOf('Gift Test Eaten Pear Butter', 4, [...EATEN, ...Array(4).fill('2026-12-01')]);
    expect((await forecastOf(eaten.product.id)).historyTbspPerDay).toBeCloseTo(
      ((EATEN.length + 4) * jarCapacityTbsp('half-pint')) / HISTORY_DAYS,
      9,
    );
  });

  it('counts the jars given this year on the shelf and the restock screen, by product, and not last year', async () => {
    const before = (await helper.get(`${base}/gifts`)).body.gifts;
    const restockBefore = (await helper.get(`${base}/restock`)).body.givenThisYear as number;
    expect(restockBefore).toBe(before.jars);
    const { product, sealed } = await shelfOf('Gift Test Counted Plum Jam', 4);
    for (const jar of sealed.slice(0, 3)) await helper.post(`${base}/jars/${jar.id}/give`).send({});
    // One gift went last New Year's Eve: not this year's.
    await Jar.update({ givenOn: '2025-12-31' }, { where: { id: sealed[0]!.id } });

    const after = (await helper.get(`${base}/gifts`)).body.gifts;
    expect(after).toMatchObject({ year: 2026, jars: before.jars + 2 });
    expect(after.byProduct).toContainEqual({ productId: product.id, productName: product.name, jars: 2 });
    const restock = (await helper.get(`${base}/restock`)).body;
    expect(restock.givenThisYear).toBe(before.jars + 2);
    expect((await forecastOf(product.id)).givenThisYear).toBe(2);
  });
});
