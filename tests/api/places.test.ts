import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { BatchDetail, JarView, OpeningAdvice } from '../../shared/schemas/batches';
import type { PlaceView } from '../../shared/schemas/places';
import type { TodayView } from '../../shared/schemas/today';
import { placeWords } from '../../shared/words/shelf-places';
import { DEMO_OLDEST_APART } from '../../server/demo/places';
import { demoApp } from '../support/app';
import { shelfLookups } from './shelf-helpers';

let ctx: Awaited<ReturnType<typeof demoApp>>;
let lookups: Awaited<ReturnType<typeof shelfLookups>>;
let base: string;
beforeAll(async () => {
  ctx = await demoApp();
  lookups = await shelfLookups(ctx, await ctx.signedIn('keeper@larderly.test'));
  base = lookups.base;
});
afterAll(() => ctx.close());

const placesOf = async (agent: Awaited<ReturnType<typeof ctx.signedIn>>) =>
  (await agent.get(`${base}/places`)).body.places as PlaceView[];
const jarsOf = async (agent: Awaited<ReturnType<typeof ctx.signedIn>>, query = '') =>
  (await agent.get(`${base}/jars${query}`)).body.jars as JarView[];

describe('shelf places', () => {
  it('lists the household’s places with the jars on hand in each, and the jars name their place', async () => {
    const helper = await ctx.signedIn('helper@larderly.test');
    const places = await placesOf(helper);
    expect(places.map((p) => p.name)).toContain('Pantry shelf');
    const jars = await jarsOf(helper, '?state=sealed');
    for (const place of places)
      expect(place.sealedJars, place.name).toBe(jars.filter((jar) => jar.placeId === place.id).length);
    const pantry = places.find((p) => p.name === 'Pantry shelf')!;
    expect(jars.filter((j) => j.placeId === pantry.id).every((j) => j.placeName === 'Pantry shelf')).toBe(true);
  });

  it('lets cooks and keepers add, rename and remove places, and not helpers', async () => {
    const cook = await ctx.signedIn('cook@larderly.test');
    const helper = await ctx.signedIn('helper@larderly.test');
    expect((await helper.post(`${base}/places`).send({ name: 'Attic' })).status).toBe(403);
    const made = await cook.post(`${base}/places`).send({ name: '  Attic crate  ' });
    expect(made.status).toBe(201);
    expect(made.body.place).toEqual({ id: expect.any(String), name: 'Attic crate', sealedJars: 0 });
    const id = made.body.place.id as string;

    // One name once per household, in any case.
    const twice = await cook.post(`${base}/places`).send({ name: 'attic CRATE' });
    expect(twice.status).toBe(409);
    expect(twice.body.error.message).toMatch(/already has a place called “attic CRATE”/);
    expect((await helper.patch(`${base}/places/${id}`).send({ name: 'Loft' })).status).toBe(403);
    const renamed = await cook.patch(`${base}/places/${id}`).send({ name: 'Loft crate' });
    expect(renamed.status).toBe(200);
    expect(renamed.body.place.name).toBe('Loft crate');
    expect((await cook.patch(`${base}/places/${id}`).send({ name: 'Pantry shelf' })).status).toBe(409);

    expect((await helper.delete(`${base}/places/${id}`)).status).toBe(403);
    expect((await cook.delete(`${base}/places/${id}`)).status).toBe(200);
    expect((await placesOf(cook)).some((p) => p.id === id)).toBe(false);
    expect((await cook.delete(`${base}/places/${id}`)).status).toBe(404);
  });

  it('refuses names it cannot keep, with a message that says what to do', async () => {
    const cook = await ctx.signedIn('cook@larderly.test');
    for (const name of ['', '   ', 'x'.repeat(61), 'Shelf\u0000one', 'Back\u202Eshelf']) {
      const answer = await cook.post(`${base}/places`).send({ name });
      expect(answer.status, JSON.stringify(name)).toBe(400);
      expect(answer.body.error.fields.name).toBeTruthy();
    }
    expect((await cook.post(`${base}/places`).send({ name: 'Ok', extra: 1 })).status).toBe(400);
    expect((await cook.post(`${base}/places`).send({ name: ['Pantry'] })).status).toBe(400);
  });

  it('answers another household’s place and jars with 404', async () => {
    const neighbour = await ctx.signedIn('neighbor@larderly.test');
    const keeper = await ctx.signedIn('keeper@larderly.test');
    const [place] = await placesOf(keeper);
    const [jar] = await jarsOf(keeper);
    const theirs = `/api/households/${ctx.neighbourHouseholdId}`;
    const [own] = (await neighbour.get(`${theirs}/places`)).body.places as PlaceView[];
    expect((await neighbour.get(`${base}/places`)).status).toBe(404);
    expect((await neighbour.patch(`${theirs}/places/${place!.id}`).send({ name: 'Mine now' })).status).toBe(404);
    expect((await neighbour.delete(`${theirs}/places/${place!.id}`)).status).toBe(404);
    // Their own jar can't be moved into our place, nor our jar into theirs.
    const [theirJar] = (await neighbour.get(`${theirs}/jars`)).body.jars as JarView[];
    expect(
      (await neighbour.post(`${theirs}/jars/move`).send({ jarIds: [theirJar!.id], placeId: place!.id })).status,
    ).toBe(404);
    expect((await neighbour.post(`${theirs}/jars/move`).send({ jarIds: [jar!.id], placeId: own!.id })).status).toBe(
      404,
    );
    // A product can't name another household's place as its usual one.
    const product = lookups.product('Plum Ketchup');
    const answer = await keeper.patch(`${base}/products/${product.id}`).send({ defaultPlaceId: own!.id });
    expect(answer.status).toBe(400);
    expect(answer.body.error.fields.defaultPlaceId).toBeTruthy();
    expect((await neighbour.post(`${base}/jars/move`).send({ jarIds: [jar!.id], placeId: null })).status).toBe(404);
  });
});

describe('a batch’s jars get a place when recorded', () => {
  async function record(body: Record<string, unknown> = {}) {
    const cook = await ctx.signedIn('cook@larderly.test');
    const today = (await cook.get(`${base}/today`)).body.today as string;
    return cook.post(`${base}/batches`).send({
      productId: lookups.product('Pickled Beets').id,
      recipeId: lookups.recipe('Pickled beets').id,
      cannedOn: today,
      jarSize: 'pint',
      jarsFilled: 3,
      jarsSealed: 3,
      method: 'boiling-water',
      ...body,
    });
  }

  it('puts them in the product’s usual place, or where the form says, or nowhere', async () => {
    const cook = await ctx.signedIn('cook@larderly.test');
    const places = await placesOf(cook);
    const cellar = places.find((p) => p.name === 'Stone cellar, low rack')!;
    const pantry = places.find((p) => p.name === 'Pantry shelf')!;
    const product = (await cook.get(`${base}/products/${lookups.product('Pickled Beets').id}`)).body.product;
    expect(product.defaultPlaceId).toBe(cellar.id);

    const usual = await record();
    expect(usual.status).toBe(201);
    expect((usual.body.jars as JarView[]).map((j) => j.placeName)).toEqual(Array(3).fill(cellar.name));
    const chosen = await record({ placeId: pantry.id });
    expect((chosen.body.jars as JarView[]).every((j) => j.placeId === pantry.id)).toBe(true);
    const none = await record({ placeId: null });
    expect((none.body.jars as JarView[]).every((j) => j.placeId === null && j.placeName === null)).toBe(true);
    // What the shelf reads says the same.
    const onShelf = await jarsOf(cook, `?batchId=${chosen.body.batch.id}`);
    expect(onShelf.map((j) => j.placeName)).toEqual(Array(3).fill('Pantry shelf'));

    const neighbour = await ctx.signedIn('neighbor@larderly.test');
    const [theirs] = (await neighbour.get(`/api/households/${ctx.neighbourHouseholdId}/places`)).body
      .places as PlaceView[];
    const foreign = await record({ placeId: theirs!.id });
    expect(foreign.status).toBe(400);
    expect(foreign.body.error.fields.placeId).toMatch(/Choose a place/);
  });

  it('lets a cook change a product’s usual place, and clear it', async () => {
    const cook = await ctx.signedIn('cook@larderly.test');
    const pantry = (await placesOf(cook)).find((p) => p.name === 'Pantry shelf')!;
    const id = lookups.product('Plum Ketchup').id;
    expect((await cook.patch(`${base}/products/${id}`).send({ defaultPlaceId: pantry.id })).body.product).toMatchObject(
      { defaultPlaceId: pantry.id },
    );
    expect((await cook.patch(`${base}/products/${id}`).send({ defaultPlaceId: null })).body.product).toMatchObject({
      defaultPlaceId: null,
    });
  });
});

describe('moving jars', () => {
  it('moves one or several jars, keeps the move in the jar history, and lets a helper do it', async () => {
    const helper = await ctx.signedIn('helper@larderly.test');
    const cook = await ctx.signedIn('cook@larderly.test');
    const places = await placesOf(cook);
    const pantry = places.find((p) => p.name === 'Pantry shelf')!;
    const jars = (await jarsOf(helper, '?state=sealed')).filter((j) => j.productName === 'Dilly Carrots');
    expect(jars.length).toBeGreaterThanOrEqual(2);
    const from = jars[0]!.placeName;
    const answer = await helper
      .post(`${base}/jars/move`)
      .send({ jarIds: jars.slice(0, 2).map((j) => j.id), placeId: pantry.id });
    expect(answer.status).toBe(200);
    expect(answer.body).toEqual({ moved: 2, placeId: pantry.id, placeName: 'Pantry shelf' });
    // Moving again to where they are changes nothing and writes nothing.
    expect(
      (await helper.post(`${base}/jars/move`).send({ jarIds: [jars[0]!.id], placeId: pantry.id })).body.moved,
    ).toBe(0);

    const batch = (await helper.get(`${base}/batches/${jars[0]!.batchId}`)).body.batch as BatchDetail;
    const moves = batch.history.filter((e) => e.kind === 'moved' && e.jarCode === jars[0]!.code);
    expect(moves).toEqual([
      expect.objectContaining({ who: 'Juniper Calloway', placeMove: { from, to: 'Pantry shelf' } }),
    ]);
    expect(batch.jars.find((j) => j.id === jars[0]!.id)!.placeName).toBe('Pantry shelf');

    // The jar's page shows it.
    const page = (await helper.get(`/api/jars/by-code/${jars[0]!.code}`)).body;
    expect(page.jar.placeName).toBe('Pantry shelf');

    // To no place, too.
    expect((await helper.post(`${base}/jars/move`).send({ jarIds: [jars[1]!.id], placeId: null })).body).toEqual({
      moved: 1,
      placeId: null,
      placeName: null,
    });
  });

  it('moves only sealed jars (an opened jar lives in the fridge), and refuses bad lists', async () => {
    const cook = await ctx.signedIn('cook@larderly.test');
    const [jar, other] = (await jarsOf(cook, '?state=sealed')).filter((j) => j.productName === 'Hot Pepper Jelly');
    expect((await cook.post(`${base}/jars/${jar!.id}/discard`)).status).toBe(200);
    const answer = await cook.post(`${base}/jars/move`).send({ jarIds: [other!.id, jar!.id], placeId: null });
    expect(answer.status).toBe(409);
    expect(answer.body.error.message).toBe(
      `Jar ${jar!.code} is discarded: only sealed jars move between places. Leave it out of the jars to move.`,
    );
    // Nothing moved: the other jar is where it was.
    expect((await jarsOf(cook, `?batchId=${other!.batchId}`)).find((j) => j.id === other!.id)!.placeId).toBe(
      other!.placeId,
    );
    const [opened] = await jarsOf(cook, '?state=opened');
    const inFridge = await cook.post(`${base}/jars/move`).send({ jarIds: [opened!.id], placeId: null });
    expect(inFridge.status).toBe(409);
    expect(inFridge.body.error.message).toMatch(/is opened, so it lives in the fridge/);
    expect((await cook.post(`${base}/jars/move`).send({ jarIds: [], placeId: null })).status).toBe(400);
    expect((await cook.post(`${base}/jars/move`).send({ jarIds: ['nope'], placeId: null })).status).toBe(400);
    expect((await cook.post(`${base}/jars/move`).send({ jarIds: [jar!.id] })).status).toBe(400);
    const tooMany = Array.from({ length: 201 }, () => jar!.id);
    expect((await cook.post(`${base}/jars/move`).send({ jarIds: tooMany, placeId: null })).status).toBe(400);
  });
});

describe('removing a place that holds jars', () => {
  it('refuses without a choice, saying what to do, then moves its jars where chosen', async () => {
    const cook = await ctx.signedIn('cook@larderly.test');
    const made = (await cook.post(`${base}/places`).send({ name: 'Garage bench' })).body.place as PlaceView;
    const jars = (await jarsOf(cook, '?state=sealed')).filter((j) => j.productName === 'Spiced Pear Butter');
    await cook.post(`${base}/jars/move`).send({ jarIds: jars.map((j) => j.id), placeId: made.id });
    const product = lookups.product('Spiced Pear Butter').id;
    await cook.patch(`${base}/products/${product}`).send({ defaultPlaceId: made.id });

    const refused = await cook.delete(`${base}/places/${made.id}`);
    expect(refused.status).toBe(409);
    expect(refused.body.error.message).toBe(
      `Garage bench still holds ${jars.length} jars. Choose where they go (another place or no place), then remove it.`,
    );
    expect((await cook.delete(`${base}/places/${made.id}?moveTo=${made.id}`)).status).toBe(400);
    expect((await cook.delete(`${base}/places/${made.id}?moveTo=somewhere`)).status).toBe(400);

    const pantry = (await placesOf(cook)).find((p) => p.name === 'Pantry shelf')!;
    const removed = await cook.delete(`${base}/places/${made.id}?moveTo=${pantry.id}`);
    expect(removed.status).toBe(200);
    expect(removed.body.moved).toBe(jars.length);
    const after = await jarsOf(cook, `?placeId=${pantry.id}`);
    expect(jars.every((j) => after.some((a) => a.id === j.id))).toBe(true);
    expect((await cook.get(`${base}/products/${product}`)).body.product.defaultPlaceId).toBeNull();
    // The history still reads with the name the place had.
    const batch = (await cook.get(`${base}/batches/${jars[0]!.batchId}`)).body.batch as BatchDetail;
    expect(batch.history.some((e) => e.placeMove?.from === 'Garage bench' && e.placeMove.to === 'Pantry shelf')).toBe(
      true,
    );
  });
});

describe('shelf filters and the oldest jar', () => {
  it('filters the jars by place, and by no place', async () => {
    const helper = await ctx.signedIn('helper@larderly.test');
    const all = await jarsOf(helper);
    const [place] = await placesOf(helper);
    const there = await jarsOf(helper, `?placeId=${place!.id}`);
    expect(there.length).toBeGreaterThan(0);
    expect(there.map((j) => j.id).sort()).toEqual(
      all
        .filter((j) => j.placeId === place!.id)
        .map((j) => j.id)
        .sort(),
    );
    const nowhere = await jarsOf(helper, '?placeId=none');
    expect(nowhere.every((j) => j.placeId === null)).toBe(true);
    expect(nowhere.length).toBe(all.filter((j) => j.placeId === null).length);
    expect((await helper.get(`${base}/jars?placeId=cellar`)).status).toBe(400);
  });

  it('says where the oldest jar is, before a newer one is opened', async () => {
    const helper = await ctx.signedIn('helper@larderly.test');
    const beets = (await jarsOf(helper, '?state=sealed'))
      .filter((j) => j.productName === DEMO_OLDEST_APART.product)
      .sort((a, b) => a.cannedOn.localeCompare(b.cannedOn) || a.code.localeCompare(b.code));
    const newest = beets.at(-1)!;
    const advice = (await helper.get(`${base}/jars/${newest.id}/opening-advice`)).body.advice as OpeningAdvice;
    // Oldest first is the rule of the shelf (common practice; NCHFP advises using home-canned food within a year).
    expect(advice.olderSealed[0]!.id).toBe(beets[0]!.id);
    expect(advice.olderSealed[0]!.placeName).toBe(DEMO_OLDEST_APART.place);
  });

  it('names the place of each jar Today draws from', async () => {
    const helper = await ctx.signedIn('helper@larderly.test');
    const today = (await helper.get(`${base}/today`)).body as TodayView;
    const placeOf = new Map((await jarsOf(helper)).map((j) => [j.id, j.placeName]));
    const fromJars = today.use.filter((u) => u.jarId !== null);
    expect(fromJars.length, 'the demo plans jars for today').toBeGreaterThan(0);
    for (const use of fromJars) {
      expect(use.jarPlaceName).toBe(placeOf.get(use.jarId!));
      expect(use.jarPlaceWords).toBe(use.jarPlaceName ? placeWords(use.jarPlaceName) : null);
    }
    expect(fromJars.some((u) => u.jarPlaceName !== null)).toBe(true);

    // Renaming the place shows on Today at once (the cached read follows the data version).
    const keeper = await ctx.signedIn('keeper@larderly.test');
    const named = fromJars.find((u) => u.jarPlaceName !== null)!;
    const place = (await placesOf(keeper)).find((p) => p.name === named.jarPlaceName)!;
    await keeper.patch(`${base}/places/${place.id}`).send({ name: `${place.name} (renamed)` });
    const again = (await helper.get(`${base}/today`)).body as TodayView;
    expect(again.use.find((u) => u.portionId === named.portionId)!.jarPlaceName).toBe(`${place.name} (renamed)`);
    await keeper.patch(`${base}/places/${place.id}`).send({ name: place.name });
  });
});

describe('moves and a removal at the same time', () => {
  it('never loses a jar: each move lands before the removal (and goes where its jars go) or is refused after it', async () => {
    const cook = await ctx.signedIn('cook@larderly.test');
    const helper = await ctx.signedIn('helper@larderly.test');
    const doomed = (await cook.post(`${base}/places`).send({ name: 'Porch crate' })).body.place as PlaceView;
    const pantry = (await placesOf(cook)).find((p) => p.name === 'Pantry shelf')!;
    const jars = (await jarsOf(cook, '?state=sealed')).filter((j) => j.productName === 'Smoky Tomato Jam').slice(0, 8);
    expect(jars.length).toBeGreaterThanOrEqual(4);
    const answers = await Promise.all([
      ...jars.map((jar) => helper.post(`${base}/jars/move`).send({ jarIds: [jar.id], placeId: doomed.id })),
      cook.delete(`${base}/places/${doomed.id}?moveTo=${pantry.id}`),
    ]);
    const statuses = answers.map((a) => a.status);
    expect(
      statuses.every((s) => s === 200 || s === 404),
      JSON.stringify(statuses),
    ).toBe(true);
    expect(statuses.at(-1)).toBe(200);
    const after = new Map((await jarsOf(cook, '?state=sealed')).map((j) => [j.id, j.placeId]));
    // A jar whose move was answered 200 went to Porch crate before it was removed, so it is in the Pantry shelf now.
    jars.forEach((jar, index) => {
      if (answers[index]!.status === 200) expect(after.get(jar.id)).toBe(pantry.id);
      else expect(after.get(jar.id)).toBe(jar.placeId);
    });
  });
});
