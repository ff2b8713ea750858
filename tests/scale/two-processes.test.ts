// The product as a deployment runs it: two app processes (production mode) behind Debian's nginx on
// loopback, round robin with no stickiness, one PostgreSQL and one object store. Each answer names the
// process that made it (X-Larderly-Instance), so every check knows which one answered.
import { spawn, spawnSync, type ChildProcess } from 'node:child_process';
import { randomBytes } from 'node:crypto';
import { mkdtempSync, readFileSync, rmSync } from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { createInterface } from 'node:readline';
import pg from 'pg';
import PgBoss from 'pg-boss';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { startNginx } from '../../scripts/lib/nginx.mjs';
import demo from '../../server/demo/demo-accounts.json' with { type: 'json' };
import { todayIn } from '../../server/services/clock';
import { createTestDatabase } from '../support/database';
import { cameraPhoto } from '../support/photos';
import { freePort } from '../support/ports';
import { startStandIns, type StandIns } from '../support/stand-ins';

type LogLine = {
  msg: string;
  reqId?: string;
  req?: { path: string; remoteAddress?: string };
  res?: { statusCode: number };
};
type App = { name: string; port: number; child: ChildProcess; logs: LogLine[] };

const clientDir = process.env.LARDERLY_TEST_CLIENT_DIR ?? 'dist/client';
const nginxDir = mkdtempSync(path.join(os.tmpdir(), 'larderly-nginx-'));
let database: Awaited<ReturnType<typeof createTestDatabase>>;
let nginx: Awaited<ReturnType<typeof startNginx>>;
const apps: App[] = [];
let origin = '';
let standIns: StandIns;

async function startApp(name: string, env: NodeJS.ProcessEnv): Promise<App> {
  const port = await freePort();
  const child = spawn(process.execPath, ['--import', 'tsx', 'server/index.ts'], {
    env: { ...env, PORT: String(port), INSTANCE_NAME: name },
    stdio: ['ignore', 'pipe', 'inherit'],
  });
  const logs: LogLine[] = [];
  const listening = new Promise<void>((resolve, reject) => {
    createInterface({ input: child.stdout! }).on('line', (text) => {
      const line = JSON.parse(text) as LogLine;
      logs.push(line);
      if (line.msg.startsWith('serving on')) resolve();
    });
    child.once('exit', (code) => reject(new Error(`${name} exited while starting (${code})`)));
  });
  await listening;
  return { name, port, child, logs };
}

beforeAll(async () => {
  database = await createTestDatabase('scale');
  const seeded = spawnSync(process.execPath, ['--import', 'tsx', 'server/setup.ts', 'setup', '--seed-demo'], {
    env: { ...process.env, DATABASE_URL: database.url },
    encoding: 'utf8',
  });
  if (seeded.status !== 0) throw new Error(`seeding failed:\n${seeded.stdout}${seeded.stderr}`);
  const nginxPort = await freePort();
  origin = `http://127.0.0.1:${nginxPort}`;
  // Both processes send their mail to one local catcher, where the test counts it.
  standIns = await startStandIns();
  const { SMTP_HOST, SMTP_PORT, SMTP_SECURE, SMTP_FROM } = standIns.env;
  // As a deployment sets them: one secret for all, the public origin, and X-Forwarded-* believed from loopback (nginx) only.
  const env = {
    ...process.env,
    NODE_ENV: 'production',
    DATABASE_URL: database.url,
    HOST: '127.0.0.1',
    SESSION_SECRET: randomBytes(32).toString('hex'),
    APP_ORIGIN: origin,
    TRUST_PROXY: 'loopback',
    STATIC_DIR: clientDir,
    AUTH_RATE_LIMIT: '10000',
    LOG_LEVEL: 'info',
    SMTP_HOST,
    SMTP_PORT,
    SMTP_SECURE,
    SMTP_FROM,
  };
  apps.push(...(await Promise.all([startApp('app-a', env), startApp('app-b', env)])));
  nginx = await startNginx({
    dir: nginxDir,
    port: nginxPort,
    apps: apps.map((a) => `127.0.0.1:${a.port}`),
    staticDir: clientDir,
  });
});

afterAll(async () => {
  await nginx?.stop();
  await Promise.all(
    apps
      .filter((a) => a.child.exitCode === null && a.child.signalCode === null)
      .map(
        (a) =>
          new Promise((resolve) => {
            a.child.once('exit', resolve);
            a.child.kill('SIGTERM');
          }),
      ),
  );
  await standIns?.close();
  await database?.drop();
  rmSync(nginxDir, { recursive: true, force: true });
});

type Answer = { status: number; instance: string | null; headers: Headers; body: Buffer };
async function call(
  method: string,
  url: string,
  options: { cookie?: string; json?: unknown; form?: FormData; headers?: Record<string, string> } = {},
): Promise<Answer> {
  const headers: Record<string, string> = { ...options.headers };
  if (options.cookie) headers.Cookie = options.cookie;
  if (method !== 'GET') headers.Origin = origin;
  if (options.json !== undefined) headers['Content-Type'] = 'application/json';
  const response = await fetch(`${origin}${url}`, {
    method,
    headers,
    body: options.form ?? (options.json !== undefined ? JSON.stringify(options.json) : undefined),
  });
  return {
    status: response.status,
    instance: response.headers.get('x-larderly-instance'),
    headers: response.headers,
    body: Buffer.from(await response.arrayBuffer()),
  };
}
const json = (answer: Answer) => JSON.parse(answer.body.toString('utf8'));

/** Repeats a read until the process other than `than` answers it (round robin: the next one or the one after). */
async function fromTheOther(than: string | null, read: () => Promise<Answer>) {
  for (let i = 0; i < 4; i += 1) {
    const answer = await read();
    if (answer.instance && answer.instance !== than) return answer;
  }
  throw new Error(`no answer came from the process other than ${than}`);
}

async function signIn(email: string) {
  const answer = await call('POST', '/api/auth/login', { json: { email, password: demo.password } });
  expect(answer.status).toBe(200);
  return { cookie: answer.headers.getSetCookie()[0]!.split(';')[0]!, instance: answer.instance };
}

describe('two app processes behind nginx', () => {
  it('round robin: consecutive requests alternate between the processes', async () => {
    const seen = [];
    for (let i = 0; i < 4; i += 1) seen.push((await call('GET', '/api/ready')).instance);
    expect(new Set(seen)).toEqual(new Set(['app-a', 'app-b']));
    expect(seen[0]).not.toBe(seen[1]);
    console.log(`round robin: /api/ready answered by ${seen.join(', ')}`);
  });

  it('nginx serves the built client files itself with a year of cache; the page comes from an app, never cached', async () => {
    const page = await call('GET', '/');
    expect(page.status).toBe(200);
    expect(page.instance).toMatch(/^app-[ab]$/);
    expect(page.headers.get('cache-control')).toBe('no-cache');
    const script = page.body.toString('utf8').match(/src="(\/assets\/main-[^"]+\.js)"/)![1]!; // the entry: big enough to be precompressed
    const asset = await call('GET', script, { headers: { 'Accept-Encoding': 'gzip' } });
    expect(asset.status).toBe(200);
    expect(asset.instance).toBeNull();
    expect(asset.headers.get('cache-control')).toBe('public, max-age=31536000, immutable');
    expect(asset.headers.get('content-encoding')).toBe('gzip');
    expect(readFileSync(nginx.accessLog, 'utf8')).toMatch(
      new RegExp(`GET ${script.replace(/[.]/g, '\\.')} 200 \\d+ [\\d.]+ upstream=- `),
    );
  });

  it('a session made through one process is honoured by the other; sign-out through one refuses the cookie on the other', async () => {
    const { cookie, instance } = await signIn('helper@larderly.test');
    const me = await fromTheOther(instance, () => call('GET', '/api/auth/me', { cookie }));
    expect(me.status).toBe(200);
    expect(json(me).user.email).toBe('helper@larderly.test');
    console.log(`session: signed in through ${instance}, /api/auth/me answered 200 by ${me.instance}`);

    const out = await call('POST', '/api/auth/logout', { cookie });
    expect(out.status).toBe(204);
    const refused = await fromTheOther(out.instance, () => call('GET', '/api/auth/me', { cookie }));
    expect(refused.status).toBe(401);
    console.log(`sign-out: through ${out.instance}; the cookie refused (401) by ${refused.instance}`);
  });

  it('the request id is nginx’s, believed because nginx is on loopback; a client’s own id and X-Forwarded-For are not', async () => {
    const answer = await call('GET', '/api/health', {
      headers: { 'X-Request-Id': 'chosen-by-the-client-1234', 'X-Forwarded-For': '203.0.113.7' },
    });
    const id = answer.headers.get('x-request-id')!;
    expect(id).toMatch(/^[0-9a-f]{32}$/);
    const app = apps.find((a) => a.name === answer.instance)!;
    // Each process writes its log asynchronously: the line may come a moment after the answer.
    let line: LogLine | undefined;
    for (let i = 0; i < 50 && !line; i += 1) {
      line = app.logs.find((l) => l.reqId === id);
      if (!line) await new Promise((resolve) => setTimeout(resolve, 50));
    }
    expect(line).toMatchObject({ req: { path: '/api/health', remoteAddress: '127.0.0.1' }, res: { statusCode: 200 } });
    expect(readFileSync(nginx.accessLog, 'utf8')).toContain(`request_id=${id}`);

    // An invitation token is a key: neither nginx's log nor the app's keeps it.
    const token = 'an-invitation-token-0123456789abcdef';
    const invitation = await call('GET', `/api/invitations/${token}?from=mail`);
    expect(invitation.status).toBeGreaterThanOrEqual(400);
    // nginx writes its line once the request is done, a moment after the answer.
    const logged = `GET /api/invitations/[token] ${invitation.status}`;
    for (let i = 0; i < 50 && !readFileSync(nginx.accessLog, 'utf8').includes(logged); i += 1)
      await new Promise((resolve) => setTimeout(resolve, 50));
    expect(readFileSync(nginx.accessLog, 'utf8')).toContain(logged);
    expect(readFileSync(nginx.accessLog, 'utf8')).not.toContain(token);
  });

  it('a change written through one process is read through the other (the data version moves past its cache)', async () => {
    const { cookie } = await signIn('cook@larderly.test');
    const hid = json(await call('GET', '/api/auth/me', { cookie })).memberships[0].householdId;
    const week = () => call('GET', `/api/households/${hid}/week`, { cookie });
    // Both processes hold the week in their cache before the change.
    const [one, two] = [await week(), await week()];
    expect(new Set([one.instance, two.instance])).toEqual(new Set(['app-a', 'app-b']));
    const entry = json(one).days.flatMap((d: { entries: { id: string; servings: number }[] }) => d.entries)[0];

    const patched = await call('PATCH', `/api/households/${hid}/plan-entries/${entry.id}`, {
      cookie,
      json: { servings: entry.servings + 2 },
    });
    expect(patched.status).toBe(200);
    const after = await fromTheOther(patched.instance, week);
    const changed = json(after)
      .days.flatMap((d: { entries: { id: string; servings: number }[] }) => d.entries)
      .find((e: { id: string }) => e.id === entry.id);
    expect(changed.servings).toBe(entry.servings + 2);
    console.log(
      `write: servings ${entry.servings} -> ${entry.servings + 2} through ${patched.instance}; read back by ${after.instance}`,
    );
  });

  it('a photo uploaded through one process is served by the other, the same bytes (object store)', async () => {
    const { cookie } = await signIn('cook@larderly.test');
    const hid = json(await call('GET', '/api/auth/me', { cookie })).memberships[0].householdId;
    const batch = json(await call('GET', `/api/households/${hid}/batches`, { cookie })).batches[0];
    const form = new FormData();
    form.append('photo', new Blob([await cameraPhoto(1200, 900)], { type: 'image/jpeg' }), 'shelf.jpg');
    const uploaded = await call('POST', `/api/households/${hid}/batches/${batch.id}/photo`, { cookie, form });
    expect(uploaded.status).toBe(200);
    const photo = () => call('GET', `/api/households/${hid}/batches/${batch.id}/photo`, { cookie });
    const other = await fromTheOther(uploaded.instance, photo);
    const same = await fromTheOther(other.instance, photo);
    expect(other.status).toBe(200);
    expect(other.headers.get('content-type')).toBe('image/webp');
    expect(same.instance).toBe(uploaded.instance);
    expect(other.body.length).toBeGreaterThan(1000);
    expect(other.body.equals(same.body)).toBe(true);
    console.log(
      `photo: uploaded through ${uploaded.instance}; ${other.body.length} bytes from ${other.instance} equal to the ${same.body.length} from ${same.instance}`,
    );
  });

  it('the reminder and digest jobs run in both processes, and each message goes out once', async () => {
    const keeper = await signIn('keeper@larderly.test');
    const cook = await signIn('cook@larderly.test');
    const hid = json(await call('GET', '/api/auth/me', { cookie: keeper.cookie })).memberships[0].householdId;
    const { timeZone } = json(await call('GET', `/api/households/${hid}`, { cookie: keeper.cookie })).household;
    // The digest goes out on the household's first day of the week, at each person's reminder hour:
    // make that now, in the household's own time zone.
    const parts = Object.fromEntries(
      new Intl.DateTimeFormat('en-US', { timeZone, weekday: 'short', hour: 'numeric', hourCycle: 'h23' })
        .formatToParts(new Date())
        .map((p) => [p.type, p.value]),
    );
    const weekday = ['Sun', 'Mon', 'Tue', 'Wed', 'Thu', 'Fri', 'Sat'].indexOf(parts.weekday!);
    const hour = Number(parts.hour);
    expect(
      (await call('PATCH', `/api/households/${hid}`, { cookie: keeper.cookie, json: { weekStartsOn: weekday } }))
        .status,
    ).toBe(200);
    for (const person of [keeper, cook]) {
      const saved = await call('PATCH', '/api/me/notifications', {
        cookie: person.cookie,
        json: { reminderHour: hour, daysBefore: 14, emailReminders: true, weeklyDigest: true },
      });
      expect(saved.status).toBe(200);
    }

    const boss = new PgBoss({
      connectionString: database.url,
      schema: 'pgboss',
      max: 1,
      supervise: false,
      schedule: false,
    });
    const db = new pg.Client({ connectionString: database.url });
    await Promise.all([boss.start(), db.connect()]);
    /** Waits until no sweep is queued or running (30 s at most). */
    const sweepsDone = async () => {
      for (let i = 0; i < 150; i += 1) {
        const { rows } = await db.query(
          "SELECT count(*)::int AS waiting FROM pgboss.job WHERE name IN ('reminder-sweep', 'digest-sweep') AND state IN ('created', 'retry', 'active')",
        );
        if (rows[0].waiting === 0) return;
        await new Promise((resolve) => setTimeout(resolve, 200));
      }
    };
    const sweepsBy = (done: string) => apps.filter((a) => a.logs.some((l) => l.msg === done)).map((a) => a.name);
    try {
      // A sweep is taken by whichever process polls first. After each round the processes that have run both kinds
      // are paused (SIGSTOP) while the next round is sent, so the other one takes it; then they go on (SIGCONT).
      const ranBoth = (app: App) =>
        ['reminder sweep done', 'digest sweep done'].every((done) => app.logs.some((l) => l.msg === done));
      for (let round = 0; round < 6 && !apps.every(ranBoth); round += 1) {
        const paused = round === 0 ? [] : apps.filter(ranBoth);
        for (const app of paused) app.child.kill('SIGSTOP');
        try {
          await boss.send('reminder-sweep', {});
          await boss.send('digest-sweep', {});
          await sweepsDone();
          // Each process writes its log asynchronously: the line may come a moment after the job is marked done.
          await new Promise((resolve) => setTimeout(resolve, 300));
        } finally {
          for (const app of paused) app.child.kill('SIGCONT');
        }
      }
      // One more round for both at once: the claims, not the timing, keep each message once.
      await Promise.all([boss.send('reminder-sweep', {}), boss.send('digest-sweep', {})]);
      await sweepsDone();
      const reminderSweeps = sweepsBy('reminder sweep done');
      const digestSweeps = sweepsBy('digest sweep done');
      expect(reminderSweeps.sort()).toEqual(['app-a', 'app-b']);
      expect(digestSweeps.sort()).toEqual(['app-a', 'app-b']);

      const { rows: reminders } = await db.query(
        `SELECT u.email, count(*)::int AS sent FROM reminder_deliveries d JOIN users u ON u.id = d.user_id
          WHERE d.sent_at IS NOT NULL GROUP BY u.email`,
      );
      const { rows: digests } = await db.query(
        `SELECT u.email, count(*)::int AS sent FROM digest_deliveries d JOIN users u ON u.id = d.user_id
          WHERE d.email_sent GROUP BY u.email`,
      );
      const sentTo = (rows: { email: string; sent: number }[], email: string) =>
        rows.find((r) => r.email === email)?.sent ?? 0;
      for (const email of ['keeper@larderly.test', 'cook@larderly.test']) {
        const mail = standIns.mail.to(email);
        const digestMails = mail.filter((m) => m.subject.includes(': the week of '));
        const reminderMails = mail.filter((m) => !m.subject.includes(': the week of '));
        // One digest each, and one e-mail per reminder the database records as sent, however many sweeps ran.
        expect(digestMails).toHaveLength(1);
        expect(sentTo(digests, email)).toBe(1);
        expect(reminderMails.length).toBe(sentTo(reminders, email));
        console.log(`jobs: ${email} got ${digestMails.length} digest and ${reminderMails.length} reminder e-mail(s)`);
      }
      // The demo fridge holds opened jars within 14 days of their use-by: reminders did go out.
      expect(sentTo(reminders, 'cook@larderly.test')).toBeGreaterThan(0);
      const counted = apps.map((a) => `${a.name}: ${a.logs.filter((l) => l.msg.endsWith('sweep done')).length} sweeps`);
      console.log(`jobs: ${counted.join(', ')}; ${standIns.mail.messages.length} e-mails in all`);
    } finally {
      await Promise.all([boss.stop({ graceful: false, wait: true }), db.end()]);
    }
  });

  it('one process killed mid-run: every request is still answered, by the one left', async () => {
    const { cookie } = await signIn('keeper@larderly.test');
    const victim = apps.find((a) => a.name === 'app-b')!;
    const answers: Answer[] = [];
    let killedAt = -1;
    const hid = json(await call('GET', '/api/auth/me', { cookie })).memberships[0].householdId;
    const db = new pg.Client({ connectionString: database.url });
    await db.connect();
    const { rows: recipes } = await db.query(
      "SELECT r.id, r.product_id FROM recipes r JOIN products p ON p.id = r.product_id WHERE p.household_id = $1 AND r.name = 'Pickled beets'",
      [hid],
    );
    const writes: { index: number; answer: Answer }[] = [];
    // The household's own day, not the UTC one: near midnight the two differ and the day after is refused.
    const { rows: zones } = await db.query('SELECT time_zone FROM households WHERE id = $1', [hid]);
    const cannedOn = todayIn(zones[0].time_zone);
    // 4 clients, 15 reads each, and 2 writers recording batches of 6 jars; app-b is killed once 12 reads are in.
    await Promise.all([
      ...Array.from({ length: 4 }, async () => {
        for (let i = 0; i < 15; i += 1) {
          answers.push(await call('GET', '/api/auth/me', { cookie }));
          if (answers.length >= 12 && killedAt < 0) {
            killedAt = answers.length;
            victim.child.kill('SIGKILL');
          }
        }
      }),
      ...Array.from({ length: 2 }, async (_, writer) => {
        for (let i = 0; i < 8; i += 1) {
          const index = writer * 8 + i;
          const answer = await call('POST', `/api/households/${hid}/batches`, {
            cookie,
            json: {
              productId: recipes[0].product_id,
              recipeId: recipes[0].id,
              cannedOn,
              jarSize: 'pint',
              jarsFilled: 6,
              jarsSealed: 6,
              method: 'boiling-water',
              notes: `killed-process run ${index}`,
            },
          });
          writes.push({ index, answer });
        }
      }),
    ]);
    expect(answers).toHaveLength(60);
    // A change cut off with its process is answered with an error (nginx does not retry a POST it has sent);
    // every change answered 201 is in the database, and every batch there is whole: all 6 jars or none of it.
    const { rows: batches } = await db.query(
      "SELECT b.id, b.notes, b.jars_filled, count(j.id)::int AS jars FROM batches b LEFT JOIN jars j ON j.batch_id = b.id WHERE b.notes LIKE 'killed-process run %' GROUP BY b.id",
    );
    await db.end();
    const created = writes.filter((w) => w.answer.status === 201);
    const refused = writes.filter((w) => w.answer.status !== 201);
    expect(writes).toHaveLength(16);
    expect(refused.filter((w) => w.answer.status < 500).map((w) => `${w.answer.status} ${w.answer.body}`)).toEqual([]);
    expect(batches.every((b) => b.jars === 6 && b.jars_filled === 6)).toBe(true);
    const stored = new Set(batches.map((b) => b.id));
    expect(created.every((w) => stored.has(json(w.answer).batch.id))).toBe(true);
    expect(batches.length).toBeGreaterThanOrEqual(created.length);
    expect(batches.length).toBeLessThanOrEqual(writes.length);
    console.log(
      `kill: ${created.length} of 16 batch writes answered 201, ${refused.length} answered ${[...new Set(refused.map((w) => w.answer.status))].join('/') || '-'}; ${batches.length} batches stored, each with its 6 jars`,
    );
    expect(answers.filter((a) => a.status !== 200)).toEqual([]);
    const before = answers.slice(0, killedAt).map((a) => a.instance);
    expect(before).toContain('app-b');
    // Requests already at app-b when it died were retried by nginx on app-a (GET is idempotent).
    const last = answers.slice(-20).map((a) => a.instance);
    expect(new Set(last)).toEqual(new Set(['app-a']));
    // Writes go on through the one left.
    const written = await call('PATCH', `/api/households/${hid}`, {
      cookie,
      json: { name: json(await call('GET', `/api/households/${hid}`, { cookie })).household.name },
    });
    expect(written.status).toBe(200);
    expect(written.instance).toBe('app-a');
    console.log(
      `kill: app-b SIGKILLed after ${killedAt} answers; 60 of 60 answered 200 (${answers.filter((a) => a.instance === 'app-a').length} by app-a, ${answers.filter((a) => a.instance === 'app-b').length} by app-b)`,
    );
  });
});
