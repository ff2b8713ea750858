import request from 'supertest';
import { QueryTypes } from 'sequelize';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { demoApp, type DemoEmail } from '../support/app';
import { listRoutes, type RouteInfo } from '../support/routes';
import { lookUpIds, resolvePath } from '../support/route-params';
import {
  EXPECTED,
  PEOPLE,
  TABLE,
  type Ids,
  type Outcome,
  type Person,
  type RouteRule,
} from './authorization-matrix.table';

let ctx: Awaited<ReturnType<typeof demoApp>>;
type Agent = ReturnType<typeof request.agent>;
let agents: Record<Person, Agent>;
let ids: Ids;
let secrets: string[];

const EMAILS: Record<Exclude<Person, 'signed out'>, DemoEmail> = {
  helper: 'helper@larderly.test',
  cook: 'cook@larderly.test',
  keeper: 'keeper@larderly.test',
  "neighbour's keeper": 'neighbor@larderly.test',
};

async function rows<T extends object>(sql: string, replacements: Record<string, unknown> = {}) {
  return ctx.sequelize.query<T>(sql, { type: QueryTypes.SELECT, replacements });
}

/** Every id, name and text of the first household that the neighbour must never see. */
async function firstHouseholdSecrets(): Promise<string[]> {
  const hid = ctx.householdId;
  const found = new Set<string>([hid]);
  for (const table of [
    'products',
    'recipes',
    'batches',
    'jars',
    'jar_events',
    'meals',
    'meal_products',
    'plan_entries',
    'pairings',
    'todos',
    'invitations',
    'memberships',
    'places',
  ]) {
    for (const row of await rows<{ id: string }>(`SELECT id FROM ${table} WHERE household_id = :hid`, { hid }))
      found.add(row.id);
  }
  const texts = await rows<{ v: string }>(
    `SELECT name AS v FROM households WHERE id = :hid
     UNION SELECT name FROM products WHERE household_id = :hid
     UNION SELECT name FROM recipes WHERE household_id = :hid
     UNION SELECT name FROM places WHERE household_id = :hid
     UNION SELECT name FROM meals WHERE household_id = :hid
     UNION SELECT title FROM plan_entries WHERE household_id = :hid
     UNION SELECT title FROM todos WHERE household_id = :hid
     UNION SELECT code FROM jars WHERE household_id = :hid
     UNION SELECT u.id::text FROM users u JOIN memberships m ON m.user_id = u.id WHERE m.household_id = :hid
     UNION SELECT u.email FROM users u JOIN memberships m ON m.user_id = u.id WHERE m.household_id = :hid
     UNION SELECT u.name FROM users u JOIN memberships m ON m.user_id = u.id WHERE m.household_id = :hid
     UNION SELECT email FROM invitations WHERE household_id = :hid`,
    { hid },
  );
  // Very short texts (a to-do called "Lids") could match by chance; every one of ours is longer.
  for (const { v } of texts) if (v && v.length >= 6) found.add(v);
  return [...found];
}

/** Puts back every membership of the first household as it was when the matrix began. */
async function restoreMemberships() {
  await ctx.sequelize.query('INSERT INTO memberships SELECT * FROM matrix_memberships ON CONFLICT DO NOTHING');
}

function phase(route: RouteInfo, rule: RouteRule) {
  if (rule.signsOut) return 3;
  if (rule.destructive || route.method === 'DELETE') return 2;
  return route.method === 'GET' ? 0 : 1;
}

function verdict(status: number, body: { error?: { message?: string } }): Outcome {
  if (status === 401 || status === 403) return status;
  if (status === 404 && /^That household/.test(body?.error?.message ?? '')) return 404;
  return 'allow';
}

beforeAll(async () => {
  ctx = await demoApp();
  ids = await lookUpIds(ctx);
  secrets = await firstHouseholdSecrets();
  await ctx.sequelize.query('CREATE TABLE matrix_memberships AS SELECT * FROM memberships');
  agents = { 'signed out': request.agent(ctx.app) } as Record<Person, Agent>;
  for (const [person, email] of Object.entries(EMAILS)) agents[person as Person] = await ctx.signedIn(email);
});
afterAll(() => ctx.close());

describe('authorization matrix over every route of the Express router', () => {
  it('has a rule for every route, and no rule for a route that is gone', () => {
    const routes = listRoutes(ctx.app).map((r) => `${r.method} ${r.path}`);
    expect(
      routes.filter((r) => !(r in TABLE)),
      'routes missing from authorization-matrix.table.ts',
    ).toEqual([]);
    expect(
      Object.keys(TABLE).filter((r) => !routes.includes(r)),
      'rules for routes that no longer exist',
    ).toEqual([]);
  });

  // About 350 requests in a row: a busy machine needs more than the default 30 s.
  it(
    'answers each person as the table says, and the neighbour learns nothing of the first household',
    { timeout: 90_000 },
    async () => {
      const routes = listRoutes(ctx.app)
        .filter((r) => `${r.method} ${r.path}` in TABLE)
        .sort((a, b) => phase(a, TABLE[`${a.method} ${a.path}`]) - phase(b, TABLE[`${b.method} ${b.path}`]));
      const mismatches: string[] = [];
      const leaks: string[] = [];
      const tally: Record<string, number> = {};
      for (const route of routes) {
        const rule = TABLE[`${route.method} ${route.path}`];
        const url = resolvePath(route, ids) + (rule.query ? `?${rule.query(ids)}` : '');
        for (const person of PEOPLE) {
          const agent = agents[person];
          let pending = agent[route.method.toLowerCase() as 'get'](url);
          if (rule.body) pending = pending.send(rule.body(ids) as object);
          const response = await pending;
          if (rule.endsMembership) await restoreMemberships();
          const got = verdict(response.status, response.body);
          const want = EXPECTED[rule.access][person];
          tally[String(got)] = (tally[String(got)] ?? 0) + 1;
          if (response.status >= 500)
            mismatches.push(`${route.method} ${url} as ${person}: ${response.status} ${response.text.slice(0, 200)}`);
          // Hidden from the neighbour: any 404 will do (a jar code is looked up without a household in the path).
          else if (got !== want && !(want === 404 && response.status === 404))
            mismatches.push(
              `${route.method} ${route.path} as ${person}: expected ${want}, got ${response.status} ${response.text.slice(0, 160)}`,
            );
          if (person === "neighbour's keeper") {
            const seen = `${JSON.stringify(response.headers)}\n${response.text}`;
            for (const secret of secrets)
              if (seen.includes(secret)) leaks.push(`${route.method} ${route.path} showed the neighbour "${secret}"`);
          }
        }
      }
      console.info(
        `authorization matrix: ${routes.length} routes x ${PEOPLE.length} people = ${routes.length * PEOPLE.length} requests; outcomes ${JSON.stringify(tally)}; ${secrets.length} first-household ids and texts searched for`,
      );
      expect(mismatches).toEqual([]);
      expect(leaks).toEqual([]);
    },
  );

  it('fails loudly on a path parameter it has no real value for', () => {
    expect(() => resolvePath({ method: 'GET', path: '/api/households/:hid/shelves/:shelfId' }, ids)).toThrow(
      /:shelfId/,
    );
  });
});
