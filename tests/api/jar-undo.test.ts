import { QueryTypes } from 'sequelize';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { JAR_UNDO_MINUTES } from '../../shared/schemas/batches';
import { clock } from '../../server/services/clock';
import { demoApp } from '../support/app';
import { shelfLookups } from './shelf-helpers';

let ctx: Awaited<ReturnType<typeof demoApp>>;
let lookups: Awaited<ReturnType<typeof shelfLookups>>;
type Agent = Awaited<ReturnType<typeof ctx.signedIn>>;
let helper: Agent;
let cook: Agent;
beforeAll(async () => {
  ctx = await demoApp();
  lookups = await shelfLookups(ctx, await ctx.signedIn('keeper@larderly.test'));
  helper = await ctx.signedIn('helper@larderly.test');
  cook = await ctx.signedIn('cook@larderly.test');
});
afterAll(() => ctx.close());

const history = async (agent: Agent, batchId: string, code: string) =>
  ((await agent.get(`${lookups.base}/batches/${batchId}`)).body.batch.history as { kind: string; jarCode: string }[])
    .filter((e) => e.jarCode === code)
    .map((e) => e.kind);

async function sealedJar(index: number) {
  const jars = await lookups.sealedJars();
  return jars[index]!;
}

describe('undoing a jar change', () => {
  it('puts a jar a helper just opened back on the shelf sealed, and keeps both events in its history', async () => {
    const jar = await sealedJar(0);
    const opened = await helper.post(`${lookups.base}/jars/${jar.id}/open`);
    expect(opened.body.jar.state).toBe('opened');
    const undone = await helper.post(`${lookups.base}/jars/${jar.id}/undo`).send({ eventId: opened.body.eventId });
    expect(undone.status).toBe(200);
    expect(undone.body.jar).toMatchObject({ state: 'sealed', openedOn: null, useBy: null });
    expect(await history(helper, jar.batchId, jar.code)).toEqual(expect.arrayContaining(['opened', 'restored']));
  });

  it('gives a finished jar back exactly what it held before', async () => {
    const jar = await sealedJar(1);
    await helper.post(`${lookups.base}/jars/${jar.id}/open`);
    await ctx.sequelize.query(`UPDATE jars SET remaining_tbsp = 7.5 WHERE id = :id`, { replacements: { id: jar.id } });
    const finished = await helper.post(`${lookups.base}/jars/${jar.id}/finish`);
    expect(finished.body.jar.remainingTbsp).toBe(0);
    const undone = await helper.post(`${lookups.base}/jars/${jar.id}/undo`).send({ eventId: finished.body.eventId });
    expect(undone.body.jar).toMatchObject({ state: 'opened', finishedOn: null, remainingTbsp: 7.5 });
  });

  it('undoes one change once when ten requests race, and answers the others with 409', async () => {
    const jar = await sealedJar(2);
    const discarded = await helper.post(`${lookups.base}/jars/${jar.id}/discard`);
    const answers = await Promise.all(
      Array.from({ length: 10 }, () =>
        helper.post(`${lookups.base}/jars/${jar.id}/undo`).send({ eventId: discarded.body.eventId }),
      ),
    );
    expect(answers.map((a) => a.status).sort()).toEqual([200, ...Array(9).fill(409)]);
    expect((await history(helper, jar.batchId, jar.code)).filter((k) => k === 'restored')).toHaveLength(1);
  });

  it('refuses an undo once the jar has changed again', async () => {
    const jar = await sealedJar(3);
    const opened = await helper.post(`${lookups.base}/jars/${jar.id}/open`);
    await cook.post(`${lookups.base}/jars/${jar.id}/finish`);
    const stale = await helper.post(`${lookups.base}/jars/${jar.id}/undo`).send({ eventId: opened.body.eventId });
    expect(stale.status).toBe(409);
    expect(stale.body.error.message).toMatch(/has changed since/);
  });

  it("refuses a helper someone else's change, and their own once the minutes are up; a cook puts the jar back", async () => {
    const jar = await sealedJar(4);
    const byCook = await cook.post(`${lookups.base}/jars/${jar.id}/discard`);
    expect(
      (await helper.post(`${lookups.base}/jars/${jar.id}/undo`).send({ eventId: byCook.body.eventId })).status,
    ).toBe(403);
    expect(
      (await cook.post(`${lookups.base}/jars/${jar.id}/undo`).send({ eventId: byCook.body.eventId })).body.jar.state,
    ).toBe('sealed');

    const older = await sealedJar(6);
    const own = await helper.post(`${lookups.base}/jars/${older.id}/discard`);
    const realNow = clock.now;
    clock.now = () => new Date(Date.now() + (JAR_UNDO_MINUTES + 1) * 60_000);
    let late;
    try {
      late = await helper.post(`${lookups.base}/jars/${older.id}/undo`).send({ eventId: own.body.eventId });
    } finally {
      clock.now = realNow;
    }
    expect(late.status).toBe(403);
    expect(late.body.error.message).toMatch(/Ask a cook or keeper/);
    expect(
      (await cook.post(`${lookups.base}/jars/${older.id}/undo`).send({ eventId: own.body.eventId })).body.jar.state,
    ).toBe('sealed');
  });

  it('lets a cook put back a demo jar finished before undo existed, from its page', async () => {
    const [finished] = await ctx.sequelize.query<{ id: string; code: string }>(
      `SELECT id, code FROM jars WHERE household_id = :hid AND state = 'finished' ORDER BY code LIMIT 1`,
      {
        replacements: { hid: ctx.householdId },
        type: QueryTypes.SELECT,
      },
    );
    const page = (await cook.get(`/api/jars/by-code/${finished!.code}`)).body;
    expect(page.lastChange).toMatchObject({ kind: 'finished' });
    const back = await cook
      .post(`${lookups.base}/jars/${finished!.id}/undo`)
      .send({ eventId: page.lastChange.eventId });
    expect(back.body.jar.state).toBe('opened');
    expect(back.body.jar.remainingTbsp).toBeGreaterThan(0);
  });

  it("answers another household's member with 404", async () => {
    const jar = await sealedJar(5);
    const opened = await helper.post(`${lookups.base}/jars/${jar.id}/open`);
    const neighbour = await ctx.signedIn('neighbor@larderly.test');
    expect(
      (await neighbour.post(`${lookups.base}/jars/${jar.id}/undo`).send({ eventId: opened.body.eventId })).status,
    ).toBe(404);
  });
});
