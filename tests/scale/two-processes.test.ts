// The product as a deployment runs it: two app processes (production mode) behind Debian's nginx on
// loopback, round robin with no stickiness, one PostgreSQL and one object store. Each answer names the
// process that made it (X-Larderly-Instance), so every check knows which one answered.
import { spawn, spawnSync, type ChildProcess } from 'node:child_process';
import { randomBytes } from 'node:crypto';
import { mkdtempSync, readFileSync, rmSync } from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { createInterface } from 'node:readline';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { startNginx } from '../../scripts/lib/nginx.mjs';
import demo from '../../server/demo/demo-accounts.json' with { type: 'json' };
import { createTestDatabase } from '../support/database';
import { cameraPhoto } from '../support/photos';
import { freePort } from '../support/ports';

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
    const script = page.body.toString('utf8').match(/src="(\/assets\/[^"]+\.js)"/)![1]!;
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

  it('one process killed mid-run: every request is still answered, by the one left', async () => {
    const { cookie } = await signIn('keeper@larderly.test');
    const victim = apps.find((a) => a.name === 'app-b')!;
    const answers: Answer[] = [];
    let killedAt = -1;
    // 4 clients, 15 reads each; app-b is killed once 12 answers are in.
    await Promise.all(
      Array.from({ length: 4 }, async () => {
        for (let i = 0; i < 15; i += 1) {
          answers.push(await call('GET', '/api/auth/me', { cookie }));
          if (answers.length >= 12 && killedAt < 0) {
            killedAt = answers.length;
            victim.child.kill('SIGKILL');
          }
        }
      }),
    );
    expect(answers).toHaveLength(60);
    expect(answers.filter((a) => a.status !== 200)).toEqual([]);
    const before = answers.slice(0, killedAt).map((a) => a.instance);
    expect(before).toContain('app-b');
    // Requests already at app-b when it died were retried by nginx on app-a (GET is idempotent).
    const last = answers.slice(-20).map((a) => a.instance);
    expect(new Set(last)).toEqual(new Set(['app-a']));
    // Writes go on through the one left.
    const hid = json(answers[0]!).memberships[0].householdId;
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
