import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { defaultUseWithinDays, useBy } from '../../shared/domain';
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

describe('opening a jar', () => {
  it('opens it exactly once when 20 requests race, and answers the other 19 with 409', async () => {
    const helper = await ctx.signedIn('helper@larderly.test');
    const [jar] = await lookups.sealedJars('Sweet Corn Relish');
    const answers = await Promise.all(
      Array.from({ length: 20 }, () => helper.post(`${lookups.base}/jars/${jar.id}/open`)),
    );
    const statuses = answers.map((a) => a.status).sort();
    expect(statuses.filter((s) => s === 200)).toHaveLength(1);
    expect(statuses.filter((s) => s === 409)).toHaveLength(19);
    expect(answers.find((a) => a.status === 409)!.body.error.message).toMatch(
      new RegExp(`Jar ${jar.code} was opened on`),
    );
    const history = (await helper.get(`${lookups.base}/batches/${jar.batchId}`)).body.batch.history as {
      kind: string;
      jarCode: string;
      who: string;
    }[];
    expect(history.filter((e) => e.kind === 'opened' && e.jarCode === jar.code)).toEqual([
      expect.objectContaining({ who: 'Juniper Calloway' }),
    ]);
  });

  it("sets the use-by from the product's opened days (the kind's default, from memory) in the household's today", async () => {
    const cook = await ctx.signedIn('cook@larderly.test');
    const [jar] = await lookups.sealedJars('Green Tomato Chutney');
    const response = await cook.post(`${lookups.base}/jars/${jar.id}/open`);
    expect(response.status).toBe(200);
    expect(response.body.jar).toMatchObject({
      state: 'opened',
      openedOn: today(),
      useBy: useBy(today(), defaultUseWithinDays('chutney')),
    });
  });

  it("uses the product's own opened days where the household set them", async () => {
    const cook = await ctx.signedIn('cook@larderly.test');
    await cook.patch(`${lookups.base}/products/${lookups.product('Pickled Beets').id}`).send({ useWithinDays: 12 });
    const [jar] = await lookups.sealedJars('Pickled Beets');
    expect((await cook.post(`${lookups.base}/jars/${jar.id}/open`)).body.jar.useBy).toBe(useBy(today(), 12));
  });
});

describe('the life of a jar', () => {
  it('goes sealed -> opened -> finished, and refuses every other move with 409 and a reason', async () => {
    const helper = await ctx.signedIn('helper@larderly.test');
    const [jar] = await lookups.sealedJars('Smoky Tomato Jam');
    const act = (action: string) => helper.post(`${lookups.base}/jars/${jar.id}/${action}`);

    const early = await act('finish');
    expect(early.status).toBe(409);
    expect(early.body.error.message).toMatch(/still sealed.*open it first/i);
    expect((await act('open')).status).toBe(200);
    expect((await act('open')).status).toBe(409);
    const finished = await act('finish');
    expect(finished.status).toBe(200);
    expect(finished.body.jar).toMatchObject({ state: 'finished', finishedOn: today(), remainingTbsp: 0 });
    expect((await act('discard')).status).toBe(409);
    expect((await act('open')).status).toBe(409);
  });

  it('discards a sealed jar and an opened one, but never twice', async () => {
    const keeper = await ctx.signedIn('keeper@larderly.test');
    const [sealed] = await lookups.sealedJars('Dilly Carrots');
    const discarded = await keeper.post(`${lookups.base}/jars/${sealed.id}/discard`);
    expect(discarded.body.jar).toMatchObject({ state: 'discarded', discardedOn: today() });
    expect((await keeper.post(`${lookups.base}/jars/${sealed.id}/discard`)).status).toBe(409);
    const opened = (await keeper.get(`${lookups.base}/jars?state=opened`)).body.jars[0];
    expect((await keeper.post(`${lookups.base}/jars/${opened.id}/discard`)).body.jar.state).toBe('discarded');
  });

  it('refuses an unknown action and a malformed jar id with clear answers', async () => {
    const keeper = await ctx.signedIn('keeper@larderly.test');
    const [jar] = await lookups.sealedJars();
    const eat = await keeper.post(`${lookups.base}/jars/${jar.id}/eat`);
    expect(eat.status).toBe(400);
    expect(eat.body.error.fields.action).toMatch(/opened, finished or discarded/);
    const malformed = await keeper.post(`${lookups.base}/jars/not-a-jar/open`);
    expect(malformed.body.error.fields.jarId).toMatch(/not found/);
  });
});

describe('jars by their label code', () => {
  it('finds the household of a jar for a member, reading the code the Crockford way', async () => {
    const helper = await ctx.signedIn('helper@larderly.test');
    const [jar] = await lookups.sealedJars('Hot Pepper Jelly');
    const typed = jar.code.toLowerCase().replaceAll('0', 'o').replaceAll('1', 'l');
    const response = await helper.get(`/api/jars/by-code/${typed}`);
    expect(response.status).toBe(200);
    expect(response.body).toMatchObject({
      householdId: ctx.householdId,
      householdName: 'Calloway Hollow',
      role: 'helper',
      jar: { code: jar.code, productName: 'Hot Pepper Jelly' },
    });
  });

  it('answers 404 for a code nobody printed', async () => {
    const helper = await ctx.signedIn('helper@larderly.test');
    expect((await helper.get('/api/jars/by-code/UUUUUU')).status).toBe(404);
    expect((await helper.get(`${lookups.base}/jars/by-code/000000`)).status).toBe(404);
  });

  it('gives every jar a distinct six-character code from the unambiguous alphabet', async () => {
    const keeper = await ctx.signedIn('keeper@larderly.test');
    const codes = ((await keeper.get(`${lookups.base}/jars?state=all`)).body.jars as { code: string }[]).map(
      (j) => j.code,
    );
    expect(codes.length).toBeGreaterThan(100);
    expect(new Set(codes).size).toBe(codes.length);
    for (const code of codes) expect(code).toMatch(/^[0-9A-HJKMNP-TV-Z]{6}$/);
  });
});

describe('the shelf list', () => {
  it('lists sealed and opened jars by default, oldest best-quality date first, and marks jars past it', async () => {
    const keeper = await ctx.signedIn('keeper@larderly.test');
    const jars = (await keeper.get(`${lookups.base}/jars`)).body.jars as {
      state: string;
      bestBy: string;
      pastBestQuality: boolean;
    }[];
    expect(new Set(jars.map((j) => j.state))).toEqual(new Set(['sealed', 'opened']));
    expect(jars.map((j) => j.bestBy)).toEqual([...jars.map((j) => j.bestBy)].sort());
    const past = jars.filter((j) => j.pastBestQuality);
    expect(past.length).toBeGreaterThan(0);
    for (const jar of past) expect(jar.bestBy < today() && jar.state === 'sealed').toBe(true);
  });

  it("moves every badge when the household changes its best-quality months (NCHFP's one year is only the default)", async () => {
    const keeper = await ctx.signedIn('keeper@larderly.test');
    const pastBest = async () =>
      ((await keeper.get(`${lookups.base}/jars`)).body.jars as { pastBestQuality: boolean }[]).filter(
        (j) => j.pastBestQuality,
      ).length;
    expect(await pastBest()).toBeGreaterThan(0);
    await keeper.patch(`/api/households/${ctx.householdId}`).send({ bestQualityMonths: 24 });
    try {
      // The oldest demo jars were canned under 500 days ago, well inside 24 months.
      expect(await pastBest()).toBe(0);
    } finally {
      await keeper.patch(`/api/households/${ctx.householdId}`).send({ bestQualityMonths: 12 });
    }
  });

  it('refuses an unknown state filter with 400', async () => {
    const keeper = await ctx.signedIn('keeper@larderly.test');
    expect((await keeper.get(`${lookups.base}/jars?state=pickled`)).status).toBe(400);
  });
});
