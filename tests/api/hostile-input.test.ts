import http from 'node:http';
import type { AddressInfo } from 'node:net';
import fc from 'fast-check';
import pg from 'pg';
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { demoApp } from '../support/app';
import { lookUpIds, resolvePath } from '../support/route-params';
import { listRoutes, type RouteInfo } from '../support/routes';
import { startStandIns, type StandIns } from '../support/stand-ins';
import { TABLE, type Ids } from './authorization-matrix.table';

/** Write routes left out, and why. */
const LEFT_OUT: Record<string, string> = {
  'POST /api/auth/logout': 'it has no body and ends the session every other case needs',
};
/** Routes a signed-out visitor uses; as the keeper, a valid body would swap the session. */
const SIGNED_OUT = [/^POST \/api\/auth\//, /^POST \/api\/invitations\//];
const CASES_PER_ROUTE = 200;
const SEED = 20261202;

let ctx: Awaited<ReturnType<typeof demoApp>>;
let standIns: StandIns;
let server: http.Server;
let keeper: ReturnType<typeof request.agent>;
let ids: Ids;
let neighbourBackup: unknown;

beforeAll(async () => {
  standIns = await startStandIns();
  ctx = await demoApp(standIns.env);
  server = http.createServer(ctx.app).listen(0, '127.0.0.1');
  await new Promise((resolve) => server.once('listening', resolve));
  keeper = request.agent(`http://127.0.0.1:${(server.address() as AddressInfo).port}`);
  const login = await keeper
    .post('/api/auth/login')
    .send({ email: 'keeper@larderly.test', password: 'pantry-demo-2026' });
  expect(login.status).toBe(200);
  ids = await lookUpIds(ctx);
  const neighbour = await ctx.signedIn('neighbor@larderly.test');
  neighbourBackup = (await neighbour.get(`/api/households/${ctx.neighbourHouseholdId}/backup`)).body;
});
afterAll(async () => {
  server?.close();
  await ctx?.close();
  await standIns?.close();
});

/** Valid bodies to start from, so generated cases get past the first check and reach the deeper ones. */
function seedBody(key: string): unknown {
  const H = '/api/households/:hid';
  const seeds: Record<string, unknown> = {
    'POST /api/auth/signup': {
      email: 'fresh@larderly.test',
      password: 'a-long-enough-password',
      name: 'Ada Fenwick',
      householdName: 'Fenwick Cellar',
    },
    'POST /api/auth/login': { email: 'keeper@larderly.test', password: 'pantry-demo-2026' },
    'POST /api/invitations/:token/accept': { name: 'Ada Fenwick', password: 'a-long-enough-password' },
    'POST /api/households/import': neighbourBackup,
    'POST /api/push/subscriptions': {
      endpoint: 'https://push.larderly.test/sub/1',
      expirationTime: null,
      keys: {
        p256dh: 'BCuf4fmp9_tdT2ZhgBWF6mCEgXE7geTWCAXj9jdSxUo_hwAJi5Qtwn-tPxrikoQc8BvLjslKGArQ7qHy7oe5808',
        auth: 'kYbaxzbGpXbyS2fjbb3hQQ',
      },
    },
    [`PATCH ${H}`]: {
      name: 'Calloway Hollow',
      altitudeFt: 2350,
      unitSystem: 'us',
      timeZone: 'America/New_York',
      bestQualityMonths: 12,
      weekStartsOn: 1,
      defaultMethod: 'boiling-water',
      canners: [
        { method: 'boiling-water', capacityJars: 7 },
        { method: 'pressure-dial', capacityJars: 16 },
      ],
    },
    [`POST ${H}/products`]: {
      name: 'Quince Paste',
      kind: 'other',
      heat: 0,
      favourite: false,
      minJars: 2,
      useWithinDays: 30,
      harvestMonths: [10],
      jarSize: 'half-pint',
      colour: 'honey',
      notes: '',
    },
    [`PATCH ${H}/products/:productId`]: {
      heat: 1,
      minJars: 3,
      useWithinDays: null,
      harvestMonths: [8, 9],
      notes: 'Keeps well.',
      defaultPlaceId: ids.placeId,
    },
    [`POST ${H}/recipes`]: {
      productId: ids.productId,
      name: 'Pickled beets, small batch',
      yieldJars: 4,
      yieldJarSize: 'pint',
      ingredients: [{ name: 'beets', amount: 3, unit: 'lb', role: 'produce' }],
      acidPercent: 5,
      ph: null,
      acidified: true,
      method: 'boiling-water',
      baseMinutes: { pint: 30 },
      altitudeTable: null,
      headspaceInches: 0.5,
      steps: '',
      source: '',
    },
    [`POST ${H}/restock/:productId/todo`]: { jars: 4, jarSize: 'pint' },
    [`PATCH ${H}/todos/:id`]: {
      title: 'Buy lids',
      notes: '',
      dueOn: '2026-12-20',
      assigneeId: ids.helperId,
      done: false,
      position: 1,
    },
    [`POST ${H}/todos`]: { title: 'Buy lids', notes: '', dueOn: '2026-12-20', assigneeId: ids.helperId },
    [`POST ${H}/meals`]: {
      name: 'Cheese board',
      tags: ['quick'],
      usualServings: 2,
      notes: '',
      products: [{ productId: ids.productId, tbspPerServing: 1 }],
    },
    [`PATCH ${H}/meals/:id`]: {
      name: 'Cheese board',
      tags: ['quick'],
      usualServings: 3,
      products: [{ productId: ids.productId, tbspPerServing: 1 }],
    },
    [`POST ${H}/plan-entries`]: { date: ids.planDate, slot: 'dinner', position: 0, mealId: ids.mealId, servings: 2 },
    [`PATCH ${H}/plan-entries/:id`]: {
      date: ids.planDate,
      slot: 'lunch',
      position: 0,
      servings: 3,
      title: 'Soup',
      eaters: [ids.helperId],
    },
    [`POST ${H}/week/proposal`]: {
      start: ids.weekStart,
      scope: { kind: 'day', date: ids.planDate },
      varietyDays: 3,
      keep: [{ date: ids.planDate, slot: 'lunch', mealId: ids.mealId }],
      avoid: [],
    },
    [`POST ${H}/week/proposal/accept`]: {
      entries: [{ date: ids.planDate, slot: 'lunch', mealId: ids.mealId, servings: 2, eaters: [ids.helperId] }],
    },
    [`POST ${H}/week/proposal/undo`]: { entryIds: [ids.planEntryId] },
    [`POST ${H}/invitations`]: { email: 'new.member@larderly.test', role: 'helper' },
    [`POST ${H}/shelf/import`]: {
      csv: 'product,canned on,jar size,jars filled,jars sealed\nPickled Beets,2026-09-01,pint,4,4\n',
      commit: true,
    },
    'PATCH /api/me/notifications': { emailReminders: true, weeklyDigest: false, reminderHour: 8, daysBefore: 2 },
  };
  return key in seeds ? seeds[key] : (TABLE[key]?.body?.(ids) ?? {});
}

const NO_SUCH_ID = 'ffffffff-ffff-4fff-bfff-ffffffffffff';
const NASTY_STRINGS = [
  '',
  ' ',
  '\u0000',
  '\uD800',
  '\u202Eevil',
  'ǅ̶̡̛̜̗̞̈́̓̆',
  '🫙🍯🥒',
  'NaN',
  'Infinity',
  '-0',
  '1e999',
  'null',
  'true',
  '[]',
  '{}',
  '2026-02-30',
  '2026-13-01',
  '0000-00-00',
  '9999-99-99',
  '+275760-09-13',
  '2026-1-1',
  '2026-12-01T25:00:00Z',
  'yesterday',
  '<script>alert(1)</script>',
  "'; DROP TABLE jars; --",
  '../../etc/passwd',
  '%00',
  '__proto__',
  '00000000-0000-0000-0000-000000000000',
  NO_SUCH_ID,
];
const NASTY_NUMBERS = [
  -1,
  -0,
  0,
  0.5,
  -0.5,
  1e308,
  -1e308,
  2 ** 31,
  -(2 ** 31) - 1,
  Number.MAX_SAFE_INTEGER + 2,
  1e-320,
  501,
  100_001,
];

const nested = (depth: number) => Array.from({ length: depth }).reduce<unknown>((inner) => ({ a: [inner] }), 1);

const hostileValue: fc.Arbitrary<unknown> = fc.oneof(
  { weight: 3, arbitrary: fc.string({ unit: 'grapheme', maxLength: 30 }) },
  { weight: 4, arbitrary: fc.constantFrom(...NASTY_STRINGS) },
  { weight: 3, arbitrary: fc.constantFrom(...NASTY_NUMBERS) },
  { weight: 2, arbitrary: fc.oneof(fc.integer(), fc.double({ noNaN: false })) },
  { weight: 2, arbitrary: fc.constantFrom(null, true, false) },
  { weight: 2, arbitrary: fc.jsonValue({ maxDepth: 2 }) },
  { weight: 1, arbitrary: fc.integer({ min: 30, max: 400 }).map(nested) },
);

/** A seed body with each field kept, removed or replaced by something hostile, one level down too. */
function mutated(seed: unknown, depth = 0): fc.Arbitrary<unknown> {
  if (Array.isArray(seed)) {
    if (seed.length === 0 || depth > 1) return fc.oneof(fc.constant(seed), hostileValue);
    return fc.oneof(fc.constant(seed), fc.array(mutated(seed[0], depth + 1), { maxLength: 3 }), hostileValue);
  }
  if (seed && typeof seed === 'object') {
    const fields = Object.entries(seed as Record<string, unknown>).map(([key, value]) =>
      fc.oneof(
        { weight: 4, arbitrary: fc.constant([key, value] as const) },
        { weight: 3, arbitrary: hostileValue.map((v) => [key, v] as const) },
        {
          weight: depth < 2 && value && typeof value === 'object' ? 2 : 0,
          arbitrary: mutated(value, depth + 1).map((v) => [key, v] as const),
        },
        { weight: 1, arbitrary: fc.constant(null) },
      ),
    );
    return fc.tuple(...fields).map((entries) => Object.fromEntries(entries.filter((e) => e !== null)));
  }
  return fc.oneof(fc.constant(seed), hostileValue);
}

/** The raw request text: JSON of a mutated seed, or something no JSON encoder would write. */
function hostileBody(seed: unknown): fc.Arbitrary<string> {
  const json = mutated(seed).map((body) => JSON.stringify(body) ?? 'null');
  const fields = seed && typeof seed === 'object' && !Array.isArray(seed) ? Object.keys(seed) : [];
  const keys = fields.length > 0 ? fields : ['value'];
  return fc.oneof(
    { weight: 60, arbitrary: json },
    {
      weight: 10,
      arbitrary: fc
        .tuple(
          json,
          fc.constantFrom(
            '"__proto__":{"isKeeper":true}',
            '"constructor":{"prototype":{"isKeeper":true}}',
            '"householdId":"x"',
            `"id":"${NO_SUCH_ID}"`,
            '"role":"keeper"',
            '"extra":[1,2,3]',
          ),
        )
        .map(([body, extra]) => (body.startsWith('{') && body !== '{}' ? `{${extra},${body.slice(1)}` : body)),
    },
    {
      weight: 10,
      arbitrary: fc
        .tuple(
          fc.constantFrom(...keys),
          fc.constantFrom('1e999', '-1e999', 'NaN', 'Infinity', '-0', '1e-400', '123456789012345678901234567890'),
        )
        .map(([key, literal]) => `{"${key}":${literal}}`),
    },
    { weight: 10, arbitrary: fc.jsonValue({ maxDepth: 3 }).map((v) => JSON.stringify(v)) },
    {
      weight: 5,
      arbitrary: fc.constantFrom('{', '{"a":}', "{'a':1}", '[1,2', '\u0000', '', 'undefined', '{"a":1}{"b":2}'),
    },
    {
      weight: 5,
      arbitrary: fc.integer({ min: 1000, max: 20000 }).map((depth) => '['.repeat(depth) + ']'.repeat(depth)),
    },
    {
      weight: 1,
      arbitrary: fc
        .constantFrom(...keys)
        .map((key) => JSON.stringify({ ...(seed as object), [key]: 'ŧ'.repeat(300_000) })),
    },
  );
}

/**
 * One md5 fingerprint of every domain table (sessions, rate-limit counts and the job queue, in its own schema, change on
 * their own): per table an order-free sum of row hashes, so no sort; prepared once, run after every case.
 */
async function fingerprinter() {
  const client = new pg.Client({ connectionString: process.env.DATABASE_URL });
  await client.connect();
  const { rows: tables } = await client.query<{ name: string }>(
    `SELECT tablename AS name FROM pg_tables WHERE schemaname = 'public' AND tablename NOT IN ('sessions', 'rate_limit_hits') ORDER BY tablename`,
  );
  const parts = tables.map(
    ({ name }) => `(SELECT count(*) || ':' || coalesce(sum(hashtextextended(t::text, 0)), 0) FROM "${name}" t)`,
  );
  const text = `SELECT md5(concat_ws('|', ${parts.join(', ')})) AS md5`;
  return {
    tables: tables.length,
    take: async () => (await client.query<{ md5: string }>({ name: 'fingerprint', text })).rows[0]!.md5,
    close: () => client.end(),
  };
}

describe('hostile input on every write route', () => {
  it(`never answers 5xx, always answers the JSON error shape, and a refused request changes nothing (${CASES_PER_ROUTE} cases a route)`, async () => {
    const writes = listRoutes(ctx.app).filter(
      (r) => ['POST', 'PATCH', 'PUT', 'DELETE'].includes(r.method) && !(`${r.method} ${r.path}` in LEFT_OUT),
    );
    const failures: string[] = [];
    const statuses: Record<string, number> = {};
    const fingerprint = await fingerprinter();
    let before = await fingerprint.take();
    let cases = 0;
    const spent = { requests: 0, fingerprints: 0 };
    const timings: [string, number][] = [];
    for (const route of writes) {
      const key = `${route.method} ${route.path}`;
      const url = resolvePath(route, ids);
      const agent = SIGNED_OUT.some((p) => p.test(key)) ? request(server) : keeper;
      const started = Date.now();
      const bodies = fc.sample(hostileBody(seedBody(key)), { numRuns: CASES_PER_ROUTE, seed: SEED });
      for (const text of bodies) {
        const sent = performance.now();
        const response = await send(agent, route, url, text);
        const answered = performance.now();
        const after = await fingerprint.take();
        spent.requests += answered - sent;
        spent.fingerprints += performance.now() - answered;
        cases += 1;
        statuses[response.status] = (statuses[response.status] ?? 0) + 1;
        const shown = `${key} with ${text.slice(0, 160)}${text.length > 160 ? `… (${text.length} chars)` : ''}`;
        if (response.status >= 500) failures.push(`${shown} -> ${response.status} ${response.text.slice(0, 300)}`);
        else if (response.status >= 400) {
          const error = response.body?.error;
          if (
            !/json/.test(response.headers['content-type'] ?? '') ||
            typeof error?.code !== 'string' ||
            typeof error?.message !== 'string' ||
            !error.message
          ) {
            failures.push(
              `${shown} -> ${response.status} without the JSON error shape: ${response.text.slice(0, 200)}`,
            );
          }
          if (after !== before) failures.push(`${shown} -> ${response.status}, yet the database changed`);
        }
        before = after;
        if (failures.length > 30) break;
      }
      timings.push([key, Date.now() - started]);
    }
    await fingerprint.close();
    console.info(
      `hostile input: ${writes.length} write routes, ${cases} cases (seed ${SEED}); ${fingerprint.tables} tables fingerprinted after each; statuses ${JSON.stringify(statuses)}; left out: ${Object.keys(LEFT_OUT).join(', ')}`,
    );
    console.info(
      `time in requests ${(spent.requests / 1000).toFixed(1)} s, in fingerprints ${(spent.fingerprints / 1000).toFixed(1)} s`,
    );
    console.info(
      `slowest routes: ${timings
        .sort((a, b) => b[1] - a[1])
        .slice(0, 5)
        .map(([k, ms]) => `${k} ${(ms / 1000).toFixed(1)} s`)
        .join('; ')}`,
    );
    expect(({} as Record<string, unknown>).isKeeper, 'no prototype pollution').toBeUndefined();
    expect(failures).toEqual([]);
    expect(cases).toBeGreaterThanOrEqual(writes.length * CASES_PER_ROUTE);
  }, 900_000);
});

function send(
  agent: ReturnType<typeof request.agent> | ReturnType<typeof request>,
  route: RouteInfo,
  url: string,
  text: string,
) {
  const method = route.method.toLowerCase() as 'post';
  return (agent as ReturnType<typeof request.agent>)[method](url).set('Content-Type', 'application/json').send(text);
}
