import { spawnSync } from 'node:child_process';
import { rmSync } from 'node:fs';
import path from 'node:path';
import { QueryTypes } from 'sequelize';
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { pgCtl, startCluster } from '../../scripts/lib/postgres.mjs';
import { createApp } from '../../server/app';
import { loadConfig } from '../../server/config';
import { freePort } from '../support/ports';

// A cluster of this file's own: stopping it cannot disturb the other test files.
let cluster: ReturnType<typeof startCluster>;
let built: ReturnType<typeof createApp>;
const config = () =>
  loadConfig({
    ...process.env,
    NODE_ENV: 'test',
    BCRYPT_COST: '4',
    DATABASE_URL: cluster.url('postgres'),
    STATIC_DIR: 'none',
  });
let hid: string;
let cookie: string;
let productId: string;
let recipeId: string;
let jarSize: string;
let method: string;

beforeAll(async () => {
  const port = await freePort();
  cluster = startCluster({ name: `faults-${process.pid}-${port}`, port });
  // Migrated and seeded the way a server is set up (umzug loads .ts migrations only under tsx).
  const setup = spawnSync(process.execPath, ['--import', 'tsx', 'server/setup.ts', 'setup', '--seed-demo'], {
    env: { ...process.env, DATABASE_URL: cluster.url('postgres') },
    encoding: 'utf8',
  });
  if (setup.status !== 0) throw new Error(`setting up the outage database failed: ${setup.stderr}`);
  built = createApp(config());
  const [household] = await built.sequelize.query<{ id: string }>(
    `SELECT id FROM households WHERE name = 'Calloway Hollow'`,
    { type: QueryTypes.SELECT },
  );
  hid = household!.id;
  const login = await request(built.app)
    .post('/api/auth/login')
    .send({ email: 'keeper@larderly.test', password: 'pantry-demo-2026' });
  expect(login.status).toBe(200);
  cookie = String(login.headers['set-cookie']).split(';')[0]!;
  const [ids] = await built.sequelize.query<{ product: string; recipe: string; jarSize: string; method: string }>(
    `SELECT product_id AS product, id AS recipe, yield_jar_size AS "jarSize", method FROM recipes WHERE household_id = :hid ORDER BY name LIMIT 1`,
    { type: QueryTypes.SELECT, replacements: { hid } },
  );
  productId = ids!.product;
  recipeId = ids!.recipe;
  jarSize = ids!.jarSize;
  method = ids!.method;
}, 180_000);

afterAll(async () => {
  await built?.close();
  cluster?.stop();
  if (cluster) rmSync(path.dirname(cluster.dataDir), { recursive: true, force: true });
});

/** Two kinds of write: a to-do (one row and a position shift) and a batch (a batch row and a jar row per jar). */
function write(n: number) {
  const base = `/api/households/${hid}`;
  const tag = `outage-${String(n).padStart(3, '0')}`;
  const pending =
    n % 2 === 0
      ? request(built.app).post(`${base}/todos`).send({ title: tag })
      : request(built.app).post(`${base}/batches`).send({
          productId,
          recipeId,
          cannedOn: '2026-09-14',
          jarSize,
          jarsFilled: 6,
          jarsSealed: 6,
          method,
          notes: tag,
        });
  return pending.set('Cookie', cookie).then((response) => ({
    n,
    tag,
    kind: n % 2 === 0 ? 'todo' : 'batch',
    status: response.status,
    body: response.body,
  }));
}

type Answer = Awaited<ReturnType<typeof write>>;

async function saved() {
  const rows = await built.sequelize.query<{ tag: string }>(
    `SELECT title AS tag FROM todos WHERE household_id = :hid AND title LIKE 'outage-%' UNION ALL SELECT notes FROM batches WHERE household_id = :hid AND notes LIKE 'outage-%'`,
    { type: QueryTypes.SELECT, replacements: { hid } },
  );
  return rows.map((r) => r.tag).sort();
}

describe('PostgreSQL stopped during a run of writes', () => {
  it('answers 503 with a clear message while it is down, writes nothing by halves, and serves again once it is back', async () => {
    const answers: Answer[] = [];
    for (let n = 0; n < 6; n += 1) answers.push(await write(n));
    expect(answers.map((a) => `${a.status} ${a.body?.error?.message ?? ''}`)).toEqual(Array(6).fill('201 '));

    // Ten writes in flight as the database stops under them.
    const inFlight = Array.from({ length: 10 }, (_, i) => write(6 + i));
    await new Promise((resolve) => setTimeout(resolve, 15));
    pgCtl(cluster.bin, cluster.dataDir, 'stop', cluster.port);
    const racing = await Promise.all(inFlight);

    const outage: Answer[] = [];
    for (let n = 16; n < 36; n += 1) outage.push(await write(n));
    const read = await request(built.app).get(`/api/households/${hid}/todos`).set('Cookie', cookie);

    pgCtl(cluster.bin, cluster.dataDir, 'start', cluster.port);
    const after: Answer[] = [];
    for (let n = 36; n < 46; n += 1) after.push(await write(n));

    const tally = (list: Answer[]) =>
      JSON.stringify(list.reduce<Record<number, number>>((t, a) => ({ ...t, [a.status]: (t[a.status] ?? 0) + 1 }), {}));
    console.info(
      `database faults: in flight at the stop ${tally(racing)}; during the outage ${outage.length + 1} requests ${tally(outage)} + a read ${read.status}; after the start ${tally(after)}`,
    );

    expect(
      racing.every((a) => a.status === 201 || a.status === 503),
      tally(racing),
    ).toBe(true);
    for (const answer of [...outage, ...racing.filter((a) => a.status !== 201)]) {
      expect(answer.status).toBe(503);
      expect(answer.body.error).toEqual({
        code: 'database_unavailable',
        message: expect.stringMatching(/Nothing was saved; try again/),
      });
    }
    expect(read.status).toBe(503);
    expect(after.map((a) => a.status)).toEqual(Array(10).fill(201));

    // Exactly the writes that answered 201 are saved, each whole.
    const acknowledged = [...answers, ...racing, ...after]
      .filter((a) => a.status === 201)
      .map((a) => a.tag)
      .sort();
    expect(await saved()).toEqual(acknowledged);
    const halfWritten = await built.sequelize.query(
      `SELECT b.id FROM batches b LEFT JOIN jars j ON j.batch_id = b.id WHERE b.household_id = :hid GROUP BY b.id HAVING b.jars_filled <> count(j.id)`,
      { type: QueryTypes.SELECT, replacements: { hid } },
    );
    expect(halfWritten).toEqual([]);
    const [todos] = await built.sequelize.query<{ dense: boolean }>(
      `SELECT min(position) = 0 AND max(position) = count(*) - 1 AND count(DISTINCT position) = count(*) AS dense FROM todos WHERE household_id = :hid`,
      { type: QueryTypes.SELECT, replacements: { hid } },
    );
    expect(todos!.dense).toBe(true);
  }, 180_000);

  it('keeps sessions across a restart of the app', async () => {
    await built.close();
    built = createApp(config());
    const me = await request(built.app).get('/api/auth/me').set('Cookie', cookie);
    expect(me.status).toBe(200);
    expect(me.body.user.email).toBe('keeper@larderly.test');
  });
});
