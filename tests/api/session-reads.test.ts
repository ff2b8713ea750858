import type { AddressInfo } from 'node:net';
import { connect, type Socket } from 'node:net';
import pg from 'pg';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { SESSION_STATEMENTS } from '../../server/auth/session';
import { sessionReads, type SessionAsk } from '../../server/auth/session-reads';
import { demoApp, DEMO_PASSWORD, type DemoEmail } from '../support/app';

let ctx: Awaited<ReturnType<typeof demoApp>>;
let pool: pg.Pool;
beforeAll(async () => {
  ctx = await demoApp();
  pool = new pg.Pool({ connectionString: ctx.ctx.config.databaseUrl, max: 2 });
});
afterAll(async () => {
  await pool.end();
  await ctx.close();
});

async function cookieOf(email: DemoEmail) {
  const login = await ctx.request.post('/api/auth/login').send({ email, password: DEMO_PASSWORD });
  expect(login.status).toBe(200);
  return String(login.headers['set-cookie']).split(';')[0]!;
}
const sidOf = (cookie: string) => decodeURIComponent(cookie.split('=')[1]!).slice(2).split('.')[0]!;

type Row = Record<string, unknown> & { person_email: string | null; member_role: string | null };

describe('session reads made together', () => {
  it('answers each of many reads sent at once with its own session, person and membership', async () => {
    const cook = sidOf(await cookieOf('cook@larderly.test'));
    const keeper = sidOf(await cookieOf('keeper@larderly.test'));
    const gone = sidOf(await cookieOf('helper@larderly.test'));
    await ctx.sequelize.query('DELETE FROM sessions WHERE sid = :gone', { replacements: { gone } });
    const statements: string[] = [];
    const counted = {
      query: (config: { name: string }, callback: unknown) => {
        statements.push(config.name);
        return (pool.query as (c: unknown, f: unknown) => void)(config, callback);
      },
    } as unknown as pg.Pool;
    const read = sessionReads<Row>(counted, SESSION_STATEMENTS, 2);
    const home = ctx.householdId;
    const away = ctx.neighbourHouseholdId;
    const asks: SessionAsk[] = [
      { sid: cook, householdId: home },
      { sid: keeper, householdId: home },
      { sid: cook, householdId: away },
      { sid: gone, householdId: home },
      { sid: keeper, householdId: null },
      { sid: 'no-such-session', householdId: home },
      { sid: cook, householdId: home },
      { sid: keeper, householdId: away },
    ];
    const rows = await Promise.all(
      asks.map(
        (ask) =>
          new Promise<Row | undefined>((resolve, reject) => read(ask, (e, row) => (e ? reject(e) : resolve(row)))),
      ),
    );
    // Two lanes: the first two reads go alone, the six that came while both were busy go as one query.
    expect(statements).toEqual(['larderly-session-read', 'larderly-session-read', 'larderly-sessions-read']);
    // The demo household: the keeper keeps it, the cook cooks in it (server/demo/demo-accounts.json).
    expect(rows.map((row) => row && [row.person_email, row.member_role])).toEqual([
      ['cook@larderly.test', 'cook'],
      ['keeper@larderly.test', 'keeper'],
      ['cook@larderly.test', null],
      undefined,
      ['keeper@larderly.test', null],
      undefined,
      ['cook@larderly.test', 'cook'],
      ['keeper@larderly.test', null],
    ]);
    // Each is what the one-session query finds for the same ask.
    for (const [index, ask] of asks.entries()) {
      const alone = await pool.query<Row>({ ...SESSION_STATEMENTS.one, values: [ask.sid, ask.householdId] });
      const together = rows[index] && Object.fromEntries(Object.entries(rows[index]).filter(([k]) => k !== 'slot'));
      expect(together).toEqual(alone.rows[0]);
    }
  });

  it('gives every request of a burst its own answer: signed out, no member, or the person it signed in', async () => {
    const people: DemoEmail[] = ['keeper@larderly.test', 'cook@larderly.test', 'helper@larderly.test'];
    const cookies = await Promise.all(people.map(cookieOf));
    const signedOut = await cookieOf('cook@larderly.test');
    expect((await ctx.request.post('/api/auth/logout').set('Cookie', signedOut)).status).toBe(204);
    // One request each first: a session's first read after sign-in marks it seen (the full way, a write).
    for (const cookie of cookies)
      expect((await ctx.request.get('/api/auth/me').set('Cookie', cookie)).status).toBe(200);
    const named: string[] = [];
    const query = pg.Pool.prototype.query;
    pg.Pool.prototype.query = function counted(this: pg.Pool, ...args: unknown[]) {
      named.push((args[0] as { name?: string })?.name ?? '');
      return (query as (...a: unknown[]) => unknown).apply(this, args);
    } as typeof query;
    const server = ctx.app.listen(0, '127.0.0.1');
    await new Promise((resolve) => server.once('listening', resolve));
    const { port } = server.address() as AddressInfo;
    try {
      // The sessions table held by another transaction: the first two reads wait in PostgreSQL, so every
      // request that comes meanwhile waits for a lane, and they go together once the table is free.
      const holder = await pool.connect();
      await holder.query('BEGIN');
      await holder.query('LOCK TABLE sessions IN ACCESS EXCLUSIVE MODE');
      const burst = Array.from({ length: 36 }, (_, i) => {
        const who = i % 4;
        const cookie = who === 3 ? signedOut : cookies[who]!;
        const path =
          i % 3 === 0 ? '/api/auth/me' : `/api/households/${i % 5 === 0 ? ctx.neighbourHouseholdId : ctx.householdId}`;
        return { who, path, cookie, socket: connect(port, '127.0.0.1') };
      });
      await Promise.all(burst.map(({ socket }) => new Promise((resolve) => socket.once('connect', resolve))));
      const answers = burst.map(({ path, cookie, socket }) => {
        socket.write(`GET ${path} HTTP/1.1\r\nHost: 127.0.0.1\r\nCookie: ${cookie}\r\nConnection: close\r\n\r\n`);
        return text(socket);
      });
      try {
        await waitedOn(holder, 2);
        await new Promise((resolve) => setTimeout(resolve, 300));
      } finally {
        await holder.query('COMMIT');
        holder.release();
      }
      for (const [index, { who, path }] of burst.entries()) {
        const answer = await answers[index]!;
        const status = Number(answer.split(' ')[1]);
        const body = JSON.parse(answer.slice(answer.indexOf('\r\n\r\n') + 4));
        if (who === 3) expect(status, path).toBe(401);
        else if (path === '/api/auth/me') expect(body.user.email).toBe(people[who]);
        else if (path.endsWith(ctx.neighbourHouseholdId)) expect(status, path).toBe(404);
        else expect(body.household.id, path).toBe(ctx.householdId);
      }
    } finally {
      pg.Pool.prototype.query = query;
      server.close();
    }
    expect(named).toContain('larderly-sessions-read');
  });
});

/** All a connection's bytes until the server closes it (Connection: close; the answers here are not chunked). */
function text(socket: Socket) {
  return new Promise<string>((resolve, reject) => {
    let received = '';
    socket.setEncoding('utf8');
    socket.on('data', (chunk: string) => (received += chunk));
    socket.once('end', () => resolve(received));
    socket.once('error', reject);
  });
}

/** Until `count` other statements wait for a lock (the ones the burst's first reads sent). */
async function waitedOn(holder: pg.PoolClient, count: number) {
  for (let tries = 0; tries < 100; tries += 1) {
    const { rows } = await holder.query<{ n: number }>(
      `SELECT count(*)::int AS n FROM pg_stat_activity WHERE wait_event_type = 'Lock' AND datname = current_database()`,
    );
    if (rows[0]!.n >= count) return;
    await new Promise((resolve) => setTimeout(resolve, 50));
  }
  throw new Error(`fewer than ${count} session reads waited for the sessions table`);
}
