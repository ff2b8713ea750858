// Two app instances on one database, as two processes behind a load balancer: each keeps its own
// session middleware and its own cache of household answers, so neither may trust what it saw before.
import pg from 'pg';
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { TodoView } from '../../shared/schemas/todos';
import { weekStartOf } from '../../shared/schemas/week';
import { createApp } from '../../server/app';
import { loadConfig } from '../../server/config';
import { Household, Membership, User } from '../../server/db/models';
import { todayIn } from '../../server/services/clock';
import { viewFridge } from '../../server/services/fridge';
import { restockView } from '../../server/services/restock/view';
import { todayView } from '../../server/services/today';
import { readWeek } from '../../server/services/week/read-week';
import { demoApp, DEMO_PASSWORD, type DemoEmail } from '../support/app';

const SECRET = 'two-apps-test-secret-that-is-long-enough-0123456789';
let first: Awaited<ReturnType<typeof demoApp>>;
let second: ReturnType<typeof createApp>;
beforeAll(async () => {
  first = await demoApp({ SESSION_SECRET: SECRET });
  second = createApp(
    loadConfig({
      ...process.env,
      NODE_ENV: 'test',
      BCRYPT_COST: '4',
      STATIC_DIR: 'no-static-in-api-tests',
      SESSION_SECRET: SECRET,
    }),
  );
});
afterAll(async () => {
  await second.close();
  await first.close();
});

/** Signs in on the first app and returns the cookie, which the second app honours too. */
async function cookieOf(email: DemoEmail) {
  const response = await request(first.app).post('/api/auth/login').send({ email, password: DEMO_PASSWORD });
  expect(response.status).toBe(200);
  return String(response.headers['set-cookie']).split(';')[0]!;
}

const onSecond = (path: string, cookie: string) => request(second.app).get(path).set('Cookie', cookie);
const sessionRow = async (cookie: string) => {
  const sid = decodeURIComponent(cookie.split('=')[1]!).slice(2).split('.')[0];
  const [rows] = await first.sequelize.query('SELECT sess, expire FROM sessions WHERE sid = :sid', {
    replacements: { sid },
  });
  return (rows as { sess: { seenAt?: number }; expire: Date }[])[0];
};

describe('a read is never stale after a write made through the other app', () => {
  it('GET /week on the second app shows a change to servings made through the first, and equals the direct computation', async () => {
    const cookie = await cookieOf('cook@larderly.test');
    const base = `/api/households/${first.householdId}`;
    const before = await onSecond(`${base}/week`, cookie);
    expect(before.status).toBe(200);
    const entry = before.body.days.flatMap((d: { entries: { id: string; servings: number }[] }) => d.entries)[0];
    expect(entry).toBeDefined();

    const patched = await request(first.app)
      .patch(`${base}/plan-entries/${entry.id}`)
      .set('Cookie', cookie)
      .send({ servings: entry.servings + 3 });
    expect(patched.status).toBe(200);
    const after = await onSecond(`${base}/week`, cookie);
    const changed = after.body.days
      .flatMap((d: { entries: { id: string; servings: number }[] }) => d.entries)
      .find((e: { id: string }) => e.id === entry.id);
    expect(changed.servings).toBe(entry.servings + 3);

    const household = (await Household.findByPk(first.householdId))!;
    const fresh = await readWeek(
      first.sequelize,
      household,
      weekStartOf(todayIn(household.timeZone), household.weekStartsOn),
    );
    expect(after.body).toEqual(JSON.parse(JSON.stringify(fresh)));
  });

  it('GET /today and /fridge on the second app follow a jar opened through the first', async () => {
    const cookie = await cookieOf('cook@larderly.test');
    const base = `/api/households/${first.householdId}`;
    const fridgeBefore = (await onSecond(`${base}/fridge`, cookie)).body.jars.length;
    const todayBefore = (await onSecond(`${base}/today`, cookie)).body.fridgeCount;
    const sealed = (await onSecond(`${base}/jars?state=sealed`, cookie)).body.jars[0];

    expect((await request(first.app).post(`${base}/jars/${sealed.id}/open`).set('Cookie', cookie)).status).toBe(200);
    expect((await onSecond(`${base}/fridge`, cookie)).body.jars.length).toBe(fridgeBefore + 1);
    const today = (await onSecond(`${base}/today`, cookie)).body;
    expect(today.fridgeCount).toBe(todayBefore + 1);
    const cook = (await User.findOne({ where: { email: 'cook@larderly.test' } }))!;
    expect(today).toEqual(
      JSON.parse(JSON.stringify(await todayView((await Household.findByPk(first.householdId))!, cook.id))),
    );
    expect(
      (await onSecond(`${base}/jars?state=sealed`, cookie)).body.jars.map((j: { id: string }) => j.id),
    ).not.toContain(sealed.id);
  });

  it('GET /products on the second app follows a product changed through the first', async () => {
    const cookie = await cookieOf('cook@larderly.test');
    const base = `/api/households/${first.householdId}`;
    const before = (await onSecond(`${base}/products`, cookie)).body.products as { id: string; notes: string }[];
    const product = before[0]!;
    const notes = `kept on the top shelf ${Date.now()}`;
    expect(
      (await request(first.app).patch(`${base}/products/${product.id}`).set('Cookie', cookie).send({ notes })).status,
    ).toBe(200);
    const after = (await onSecond(`${base}/products`, cookie)).body.products as { id: string; notes: string }[];
    expect(after.find((p) => p.id === product.id)!.notes).toBe(notes);
    expect(after.map((p) => p.id)).toEqual(before.map((p) => p.id));
  });

  it('a restock to-do moved on the second app again and again answers its plan as its recipe is after an edit through the first', async () => {
    const cookie = await cookieOf('cook@larderly.test');
    const base = `/api/households/${first.householdId}`;
    const todos = (await onSecond(`${base}/todos`, cookie)).body.todos as TodoView[];
    const todo = todos.find((t) => t.kind === 'restock' && t.batchPlan)!;
    const move = () =>
      request(second.app).patch(`${base}/todos/${todo.id}`).set('Cookie', cookie).send({ position: todo.position });
    // Twice the same, changing nothing: the second answer's plan is worked out from what the first read.
    const [once, twice] = [await move(), await move()];
    expect([once.status, twice.status]).toEqual([200, 200]);
    expect(twice.body.todo.batchPlan).toEqual(once.body.todo.batchPlan);
    const plan = once.body.todo.batchPlan as NonNullable<TodoView['batchPlan']>;
    const recipe = (await request(first.app).get(`${base}/recipes/${plan.recipeId}`).set('Cookie', cookie)).body
      .recipe as { baseMinutes: Record<string, number> };
    const edit = (baseMinutes: Record<string, number>) =>
      request(first.app).patch(`${base}/recipes/${plan.recipeId}`).set('Cookie', cookie).send({ baseMinutes });
    expect((await edit({ ...recipe.baseMinutes, [plan.jarSize]: recipe.baseMinutes[plan.jarSize]! + 5 })).status).toBe(
      200,
    );
    try {
      const after = (await move()).body.todo.batchPlan as NonNullable<TodoView['batchPlan']>;
      expect(after.processing.minutes).toBe(plan.processing.minutes! + 5);
      expect(after.changes!.join(' ')).toContain(
        `Processing is now ${plan.processing.minutes! + 5} minutes (it was ${plan.processing.minutes} minutes)`,
      );
    } finally {
      expect((await edit(recipe.baseMinutes)).status).toBe(200);
    }
  });

  it('answers 304 to a matching If-None-Match, and 200 with the new answer once the other app wrote', async () => {
    const cookie = await cookieOf('cook@larderly.test');
    const base = `/api/households/${first.householdId}`;
    const first200 = await onSecond(`${base}/restock`, cookie);
    expect(first200.headers['cache-control']).toBe('private, no-store');
    const etag = first200.headers.etag;
    expect((await onSecond(`${base}/restock`, cookie).set('If-None-Match', etag)).status).toBe(304);

    const product = first200.body.forecasts[0];
    const patched = await request(first.app)
      .patch(`${base}/products/${product.productId}`)
      .set('Cookie', cookie)
      .send({ minJars: product.minJars + 5 });
    expect(patched.status).toBe(200);
    const changed = await onSecond(`${base}/restock`, cookie).set('If-None-Match', etag);
    expect(changed.status).toBe(200);
    expect(changed.body.forecasts.find((f: { productId: string }) => f.productId === product.productId).minJars).toBe(
      product.minJars + 5,
    );
  });
});

describe('the session and the guard, across both apps', () => {
  it('signing out through the first app signs the person out on the second at its next request', async () => {
    const cookie = await cookieOf('helper@larderly.test');
    const week = `/api/households/${first.householdId}/week`;
    expect((await onSecond(week, cookie)).status).toBe(200);
    expect((await request(first.app).post('/api/auth/logout').set('Cookie', cookie)).status).toBe(204);
    expect((await onSecond(week, cookie)).status).toBe(401);
    expect((await onSecond('/api/auth/me', cookie)).status).toBe(401);
  });

  it('a household renamed or moved by another process (straight in PostgreSQL) shows on the next request of both apps', async () => {
    const cookie = await cookieOf('keeper@larderly.test');
    const path = `/api/households/${first.householdId}`;
    const before = (await onSecond(path, cookie)).body.household;
    expect((await request(first.app).get(path).set('Cookie', cookie)).body.household).toEqual(before);
    const other = new pg.Client({ connectionString: first.ctx.config.databaseUrl });
    await other.connect();
    try {
      await other.query(`UPDATE households SET name = $2, altitude_ft = altitude_ft + 1000 WHERE id = $1`, [
        first.householdId,
        `${before.name} (moved)`,
      ]);
      for (const app of [first.app, second.app]) {
        const after = (await request(app).get(path).set('Cookie', cookie)).body.household;
        expect(after).toEqual({ ...before, name: `${before.name} (moved)`, altitudeFt: before.altitudeFt + 1000 });
      }
      // Only the plan's version moved: the household's own columns are as they were.
      await other.query('UPDATE households SET plan_version = plan_version + 1 WHERE id = $1', [first.householdId]);
      expect((await onSecond(path, cookie)).body.household.name).toBe(`${before.name} (moved)`);
    } finally {
      await other.query(`UPDATE households SET name = $2, altitude_ft = altitude_ft - 1000 WHERE id = $1`, [
        first.householdId,
        before.name,
      ]);
      await other.end();
    }
  });

  it('a member removed through the first app gets 404 on the second at the next request, even for an answer it holds', async () => {
    const helperCookie = await cookieOf('helper@larderly.test');
    const keeperCookie = await cookieOf('keeper@larderly.test');
    const week = `/api/households/${first.householdId}/week`;
    expect((await onSecond(week, helperCookie)).status).toBe(200);
    const helper = (await User.findOne({ where: { email: 'helper@larderly.test' } }))!;
    const membership = (await Membership.findOne({ where: { userId: helper.id, householdId: first.householdId } }))!;
    const removed = await request(first.app)
      .delete(`/api/households/${first.householdId}/members/${helper.id}`)
      .set('Cookie', keeperCookie);
    expect(removed.status).toBeLessThan(300);
    try {
      expect((await onSecond(week, helperCookie)).status).toBe(404);
      expect((await request(first.app).get(week).set('Cookie', helperCookie)).status).toBe(404);
    } finally {
      await Membership.create({
        householdId: membership.householdId,
        userId: membership.userId,
        role: membership.role,
      });
    }
  });

  it('reads write nothing to the session; a session last seen over a day ago is written once and lives 30 more days', async () => {
    const cookie = await cookieOf('keeper@larderly.test');
    const week = `/api/households/${first.householdId}/week`;
    const signedIn = await sessionRow(cookie);
    for (const path of [week, '/api/auth/me', `/api/households/${first.householdId}`]) {
      const response = await onSecond(path, cookie);
      expect(response.status).toBe(200);
      expect(response.headers['set-cookie']).toBeUndefined();
    }
    expect(await sessionRow(cookie)).toEqual(signedIn);

    // As if the last write had been two days ago.
    const twoDaysAgo = Date.now() - 2 * 24 * 60 * 60 * 1000;
    const sid = decodeURIComponent(cookie.split('=')[1]!).slice(2).split('.')[0];
    await first.sequelize.query(
      `UPDATE sessions SET sess = jsonb_set(sess::jsonb, '{seenAt}', to_jsonb(:at::bigint))::json, expire = expire - interval '2 days' WHERE sid = :sid`,
      {
        replacements: { at: twoDaysAgo, sid },
      },
    );
    const touched = await onSecond(week, cookie);
    expect(String(touched.headers['set-cookie'])).toMatch(/larderly\.sid=.*Expires=/);
    const row = await sessionRow(cookie);
    expect(row.sess.seenAt).toBeGreaterThan(twoDaysAgo);
    const daysLeft = (row.expire.getTime() - Date.now()) / (24 * 60 * 60 * 1000);
    expect(daysLeft).toBeGreaterThan(29.9);
    expect(daysLeft).toBeLessThan(30.01);
    expect((await onSecond(week, cookie)).headers['set-cookie']).toBeUndefined();
  });

  it('reads the session, the person and the membership in one round trip, and a stranger still gets 404', async () => {
    const cookie = await cookieOf('cook@larderly.test');
    const texts: string[] = [];
    // Counted at the driver, below both Sequelize and the session store's own pool.
    const query = pg.Client.prototype.query;
    pg.Client.prototype.query = function counted(this: pg.Client, ...args: unknown[]) {
      texts.push(typeof args[0] === 'string' ? args[0] : String((args[0] as { text?: string })?.text));
      return (query as (...a: unknown[]) => unknown).apply(this, args);
    } as typeof query;
    try {
      const answer = await onSecond(`/api/households/${first.householdId}`, cookie);
      expect(answer.status).toBe(200);
      expect(answer.body.household.id).toBe(first.householdId);
      expect(texts).toHaveLength(1);
      expect(texts[0]).toMatch(/FROM sessions/);
      expect(texts[0]).not.toMatch(/password_hash/);
    } finally {
      pg.Client.prototype.query = query;
    }
    // Another household: the joined read finds no membership, and the answer is the same 404 as before.
    const other = await Household.create({ name: 'Not the cook’s', timeZone: 'America/Chicago' });
    try {
      const refused = await onSecond(`/api/households/${other.id}/week`, cookie);
      expect(refused.status).toBe(404);
      expect((await onSecond(`/api/households/${other.id.toUpperCase()}`, cookie)).status).toBe(404);
    } finally {
      await other.destroy();
    }
  });

  it('never reads the password hash on a signed-in request', async () => {
    const cookie = await cookieOf('cook@larderly.test');
    const texts: string[] = [];
    // Sequelize reads its logging option on every query.
    const options = (first.sequelize as unknown as { options: { logging: unknown } }).options;
    options.logging = (sql: string) => texts.push(sql);
    try {
      for (const path of [
        '/api/auth/me',
        `/api/households/${first.householdId}/week`,
        `/api/households/${first.householdId}/today`,
      ]) {
        expect((await onSecond(path, cookie)).status).toBe(200);
      }
    } finally {
      options.logging = false;
    }
    expect(texts.length).toBeGreaterThan(0);
    expect(texts.join('\n')).not.toMatch(/password_hash/);
  });
});

// Last in this file: it takes the demo household's plan away.
describe('the plan has a version of its own (migration 0200)', () => {
  const versions = async () => {
    const [[row]] = (await first.sequelize.query(
      'SELECT data_version::text AS data, plan_version::text AS plan FROM households WHERE id = :id',
      { replacements: { id: first.householdId } },
    )) as [{ data: string; plan: string }[], unknown];
    return { data: Number(row!.data), plan: Number(row!.plan) };
  };

  it('one transaction that writes a planned meal and a product moves each version once; a plan write alone moves only the plan’s', async () => {
    const before = await versions();
    await first.sequelize.transaction(async (transaction) => {
      const run = (sql: string) => first.sequelize.query(sql, { replacements: { id: first.householdId }, transaction });
      // The plan first: under migration 0085's rule its bump of the households row hid the data's bump after it.
      await run('UPDATE plan_entries SET servings = servings WHERE household_id = :id');
      await run('UPDATE products SET notes = notes WHERE household_id = :id');
    });
    expect(await versions()).toEqual({ data: before.data + 1, plan: before.plan + 1 });
    await first.sequelize.query('UPDATE plan_entries SET servings = servings WHERE household_id = :id', {
      replacements: { id: first.householdId },
    });
    expect(await versions()).toEqual({ data: before.data + 1, plan: before.plan + 2 });
    // A settings change is the data's; a settings write that changes nothing moves neither.
    await first.sequelize.query('UPDATE households SET time_zone = time_zone WHERE id = :id', {
      replacements: { id: first.householdId },
    });
    expect(await versions()).toEqual({ data: before.data + 1, plan: before.plan + 2 });
    await first.sequelize.query(`UPDATE households SET name = name || ' ' WHERE id = :id`, {
      replacements: { id: first.householdId },
    });
    expect(await versions()).toEqual({ data: before.data + 2, plan: before.plan + 2 });
    await first.sequelize.query('UPDATE households SET name = rtrim(name) WHERE id = :id', {
      replacements: { id: first.householdId },
    });
  });

  it('the plan taken away through the first app: the second app’s week, Today, fridge and restock follow it, the shelf, products and to-dos stay as they were', async () => {
    const cookie = await cookieOf('cook@larderly.test');
    const base = `/api/households/${first.householdId}`;
    const planned = ['/week', '/today', '/fridge', '/restock'];
    const unplanned = ['/jars?state=sealed', '/products', '/todos'];
    const before: Record<string, unknown> = {};
    for (const path of [...planned, ...unplanned]) {
      const answer = await onSecond(`${base}${path}`, cookie);
      expect(answer.status).toBe(200);
      before[path] = answer.body;
    }
    const entries = before['/week'] as { days: { entries: unknown[] }[] };
    expect(entries.days.flatMap((d) => d.entries).length).toBeGreaterThan(0);
    const versionsBefore = await versions();

    await first.sequelize.query('DELETE FROM plan_entries WHERE household_id = :id', {
      replacements: { id: first.householdId },
    });
    expect(await versions()).toEqual({ data: versionsBefore.data, plan: versionsBefore.plan + 1 });

    const household = (await Household.findByPk(first.householdId))!;
    const cook = (await User.findOne({ where: { email: 'cook@larderly.test' } }))!;
    const today = todayIn(household.timeZone);
    const direct: Record<string, unknown> = {
      '/week': await readWeek(first.sequelize, household, weekStartOf(today, household.weekStartsOn)),
      '/today': await todayView(household, cook.id),
      '/fridge': await viewFridge(household.id, today),
      '/restock': await restockView(household),
    };
    for (const path of planned) {
      const after = await onSecond(`${base}${path}`, cookie);
      expect(after.body, path).toEqual(JSON.parse(JSON.stringify(direct[path])));
      expect(after.body, `${path} should have changed with the plan`).not.toEqual(before[path]);
    }
    for (const path of unplanned) expect((await onSecond(`${base}${path}`, cookie)).body, path).toEqual(before[path]);
  });
});
