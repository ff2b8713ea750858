import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { JarView, OpeningAdvice } from '../../shared/schemas/batches';
import { demoApp } from '../support/app';

let ctx: Awaited<ReturnType<typeof demoApp>>;
beforeAll(async () => {
  ctx = await demoApp();
});
afterAll(() => ctx.close());

describe('before a jar is opened', () => {
  it('names the product’s opened jars and its older sealed jars, oldest first, and opening still goes ahead', async () => {
    const helper = await ctx.signedIn('helper@larderly.test');
    const beetJars = async () =>
      ((await helper.get(`/api/households/${ctx.householdId}/jars`)).body.jars as JarView[]).filter(
        (jar) => jar.productName === 'Pickled Beets',
      );
    const before = (await beetJars())
      .filter((jar) => jar.state === 'sealed')
      .sort((a, b) => a.cannedOn.localeCompare(b.cannedOn));
    expect(before[0]!.cannedOn < before.at(-1)!.cannedOn, 'the demo has beets from more than one batch').toBe(true);
    // One jar goes to the fridge first, as in a household where someone already opened one.
    expect((await helper.post(`/api/households/${ctx.householdId}/jars/${before[0]!.id}/open`)).status).toBe(200);
    const beets = await beetJars();
    const sealed = beets
      .filter((jar) => jar.state === 'sealed')
      .sort((a, b) => a.cannedOn.localeCompare(b.cannedOn) || a.code.localeCompare(b.code));
    const newest = sealed.at(-1)!;
    const opened = beets.filter((jar) => jar.state === 'opened');
    expect(sealed[0]!.cannedOn < newest.cannedOn, 'older sealed beets remain').toBe(true);

    const answer = await helper.get(`/api/households/${ctx.householdId}/jars/${newest.id}/opening-advice`);
    expect(answer.status).toBe(200);
    const advice = answer.body.advice as OpeningAdvice;
    expect(advice.openedJars.map((jar) => jar.id).sort()).toEqual(opened.map((jar) => jar.id).sort());
    // Oldest first is the rule of the shelf (common practice; NCHFP advises using home-canned food within a year).
    expect(advice.olderSealed.map((jar) => jar.id)).toEqual(
      sealed.filter((jar) => jar.cannedOn < newest.cannedOn).map((jar) => jar.id),
    );
    expect(advice.olderSealed.every((jar) => jar.productName === 'Pickled Beets' && jar.state === 'sealed')).toBe(true);

    // The oldest sealed jar has nothing older to suggest; only the opened one.
    const oldest = (await helper.get(`/api/households/${ctx.householdId}/jars/${sealed[0]!.id}/opening-advice`)).body
      .advice as OpeningAdvice;
    expect(oldest.olderSealed).toEqual([]);

    // Advice never blocks: the newer jar still opens.
    expect((await helper.post(`/api/households/${ctx.householdId}/jars/${newest.id}/open`)).status).toBe(200);
  });

  it('answers another household’s jar with 404', async () => {
    const neighbour = await ctx.signedIn('neighbor@larderly.test');
    const helper = await ctx.signedIn('helper@larderly.test');
    const [jar] = (await helper.get(`/api/households/${ctx.householdId}/jars`)).body.jars as JarView[];
    expect(
      (await neighbour.get(`/api/households/${ctx.neighbourHouseholdId}/jars/${jar!.id}/opening-advice`)).status,
    ).toBe(404);
  });
});
