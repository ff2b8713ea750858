import { QueryTypes } from 'sequelize';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { demoApp } from '../support/app';

let ctx: Awaited<ReturnType<typeof demoApp>>;
beforeAll(async () => {
  ctx = await demoApp();
});
afterAll(() => ctx.close());

const rows = <T extends object>(sql: string) =>
  ctx.sequelize.query<T>(sql, { type: QueryTypes.SELECT, replacements: { hid: ctx.householdId } });

/** A small deterministic shuffle, so a failure can be replayed. */
function pick<T>(list: T[], i: number) {
  return list[(i * 7919 + 13) % list.length]!;
}

describe('50 requests at once on one household', () => {
  it('leaves every jar opened at most once, positions dense in each slot and in the to-do list, and batch counts equal to jar rows', async () => {
    const base = `/api/households/${ctx.householdId}`;
    const people = await Promise.all([
      ctx.signedIn('keeper@larderly.test'),
      ctx.signedIn('cook@larderly.test'),
      ctx.signedIn('helper@larderly.test'),
    ]);
    const planners = people.slice(0, 2);
    const sealed = await rows<{ id: string }>(
      `SELECT id FROM jars WHERE household_id = :hid AND state = 'sealed' ORDER BY code LIMIT 4`,
    );
    const opened = await rows<{ id: string }>(
      `SELECT id FROM jars WHERE household_id = :hid AND state = 'opened' ORDER BY code LIMIT 2`,
    );
    const entries = await rows<{ id: string; date: string }>(
      `SELECT id, to_char(date, 'YYYY-MM-DD') AS date FROM plan_entries WHERE household_id = :hid ORDER BY date, slot, position`,
    );
    const todos = await rows<{ id: string }>(`SELECT id FROM todos WHERE household_id = :hid ORDER BY position`);
    const dates = [...new Set(entries.map((e) => e.date))].slice(0, 3);
    const counts = async () =>
      (
        await rows<{ entries: string; todos: string; jars: string }>(
          `SELECT (SELECT count(*) FROM plan_entries WHERE household_id = :hid) AS entries, (SELECT count(*) FROM todos WHERE household_id = :hid) AS todos,
              (SELECT count(*) FROM jars WHERE household_id = :hid) AS jars`,
        )
      )[0];
    const before = await counts();

    const jobs: { what: string; send: () => Promise<{ status: number; text: string }> }[] = [];
    // 16 racing opens: four people at each of four sealed jars; 4 finishes of two opened jars.
    for (let i = 0; i < 16; i += 1) {
      const jar = sealed[i % 4]!.id;
      jobs.push({ what: `open ${jar}`, send: () => people[i % 3]!.post(`${base}/jars/${jar}/open`) });
    }
    for (let i = 0; i < 4; i += 1) {
      const jar = opened[i % 2]!.id;
      jobs.push({ what: `finish ${jar}`, send: () => people[i % 3]!.post(`${base}/jars/${jar}/finish`) });
    }
    // 15 plan moves between three days and the four slots.
    for (let i = 0; i < 15; i += 1) {
      const entry = pick(entries, i);
      const to = {
        date: pick(dates, i + 1),
        slot: pick(['breakfast', 'lunch', 'dinner', 'snack'], i + 2),
        position: i % 3,
      };
      jobs.push({
        what: `move plan ${entry.id}`,
        send: () => pick(planners, i).patch(`${base}/plan-entries/${entry.id}`).send(to),
      });
    }
    // 15 to-do moves.
    for (let i = 0; i < 15; i += 1) {
      const todo = pick(todos, i);
      jobs.push({
        what: `move to-do ${todo.id}`,
        send: () =>
          pick(planners, i)
            .patch(`${base}/todos/${todo.id}`)
            .send({ position: (i * 3) % todos.length }),
      });
    }
    expect(jobs).toHaveLength(50);

    const answers = await Promise.all(jobs.map(async (job) => ({ what: job.what, ...(await job.send()) })));
    const unexpected = answers.filter((a) => a.status >= 500 || (a.status >= 400 && a.status !== 409));
    expect(unexpected.map((a) => `${a.what}: ${a.status} ${a.text.slice(0, 200)}`)).toEqual([]);
    for (const jar of sealed) {
      expect(
        answers.filter((a) => a.what === `open ${jar.id}` && a.status === 200),
        `one open wins for ${jar.id}`,
      ).toHaveLength(1);
    }
    for (const jar of opened) {
      expect(
        answers.filter((a) => a.what === `finish ${jar.id}` && a.status === 200),
        `one finish wins for ${jar.id}`,
      ).toHaveLength(1);
    }

    const openedTwice = await rows<{ jar_id: string; n: string }>(
      `SELECT jar_id, count(*) AS n FROM jar_events WHERE household_id = :hid AND kind = 'opened' GROUP BY jar_id HAVING count(*) > 1`,
    );
    expect(openedTwice).toEqual([]);
    const finishedTwice = await rows<{ jar_id: string }>(
      `SELECT jar_id FROM jar_events WHERE household_id = :hid AND kind = 'finished' GROUP BY jar_id HAVING count(*) > 1`,
    );
    expect(finishedTwice).toEqual([]);
    const gappySlots = await rows<{ date: string; slot: string; positions: number[] }>(
      `SELECT to_char(date, 'YYYY-MM-DD') AS date, slot, array_agg(position ORDER BY position) AS positions FROM plan_entries WHERE household_id = :hid GROUP BY date, slot
       HAVING min(position) <> 0 OR max(position) <> count(*) - 1 OR count(DISTINCT position) <> count(*)`,
    );
    expect(gappySlots).toEqual([]);
    const [todoPositions] = await rows<{ dense: boolean }>(
      `SELECT count(*) = 0 OR (min(position) = 0 AND max(position) = count(*) - 1 AND count(DISTINCT position) = count(*)) AS dense FROM todos WHERE household_id = :hid`,
    );
    expect(todoPositions!.dense).toBe(true);
    const miscounted = await rows<{ id: string }>(
      `SELECT b.id FROM batches b LEFT JOIN jars j ON j.batch_id = b.id WHERE b.household_id = :hid GROUP BY b.id HAVING b.jars_filled <> count(j.id)`,
    );
    expect(miscounted).toEqual([]);
    expect(await counts()).toEqual(before);
  });
});
