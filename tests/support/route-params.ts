import { QueryTypes } from 'sequelize';
import { PARAMS, type Ids } from '../api/authorization-matrix.table';
import type { demoApp } from './app';
import type { RouteInfo } from './routes';

type DemoApp = Awaited<ReturnType<typeof demoApp>>;

/** Real ids of the first demo household: a route answering them is exercised for real. */
export async function lookUpIds(ctx: DemoApp): Promise<Ids> {
  const hid = ctx.householdId;
  const one = async (sql: string) => {
    const [row] = await ctx.sequelize.query<{ v: string }>(sql, { type: QueryTypes.SELECT, replacements: { hid } });
    if (!row) throw new Error(`The demo data has nothing for: ${sql}`);
    return String(row.v);
  };
  // A pending invitation written directly: sending one needs a mail server this file does not run.
  const [invited] = await ctx.sequelize.query<{ id: string }>(
    `INSERT INTO invitations (id, household_id, email, role, token_hash, expires_at, created_at, updated_at)
     VALUES (gen_random_uuid(), :hid, 'matrix-invitee@larderly.test', 'helper', md5(random()::text), now() + interval '7 days', now(), now()) RETURNING id`,
    { type: QueryTypes.SELECT, replacements: { hid } },
  );
  return {
    hid,
    productId: await one(`SELECT id AS v FROM products WHERE household_id = :hid AND name = 'Pickled Beets'`),
    recipeId: await one(`SELECT id AS v FROM recipes WHERE household_id = :hid ORDER BY name LIMIT 1`),
    batchId: await one(`SELECT id AS v FROM batches WHERE household_id = :hid ORDER BY canned_on LIMIT 1`),
    jarId: await one(`SELECT id AS v FROM jars WHERE household_id = :hid AND state = 'sealed' ORDER BY code LIMIT 1`),
    jarCode: await one(`SELECT code AS v FROM jars WHERE household_id = :hid ORDER BY code LIMIT 1`),
    placeId: await one(`SELECT id AS v FROM places WHERE household_id = :hid AND name = 'Pantry shelf'`),
    mealId: await one(`SELECT id AS v FROM meals WHERE household_id = :hid ORDER BY name LIMIT 1`),
    planEntryId: await one(
      `SELECT id AS v FROM plan_entries WHERE household_id = :hid ORDER BY date, slot, position LIMIT 1`,
    ),
    pairingId: await one(
      `SELECT p.id AS v FROM pairings p JOIN plan_entries e ON e.id = p.plan_entry_id WHERE p.household_id = :hid ORDER BY e.date DESC LIMIT 1`,
    ),
    todoId: await one(`SELECT id AS v FROM todos WHERE household_id = :hid ORDER BY position LIMIT 1`),
    invitationId: invited!.id,
    helperId: await one(`SELECT id AS v FROM users WHERE email = 'helper@larderly.test'`),
    planDate: await one(
      `SELECT to_char(date, 'YYYY-MM-DD') AS v FROM plan_entries WHERE household_id = :hid ORDER BY date DESC LIMIT 1`,
    ),
    weekStart: await one(
      `SELECT to_char(date_trunc('week', min(date)), 'YYYY-MM-DD') AS v FROM plan_entries WHERE household_id = :hid`,
    ),
  };
}

export function resolvePath(route: RouteInfo, ids: Ids): string {
  return route.path.replace(/:(\w+)/g, (_match, name: string, offset: number) => {
    const segment = route.path.slice(0, offset).split('/').filter(Boolean).at(-1);
    const source = PARAMS[`${segment}/:${name}`] ?? PARAMS[name];
    if (source === undefined) {
      throw new Error(
        `${route.method} ${route.path}: no real value for the path parameter :${name}. Add it to PARAMS in authorization-matrix.table.ts.`,
      );
    }
    return encodeURIComponent(typeof source === 'string' ? ids[source] : source.literal);
  });
}
