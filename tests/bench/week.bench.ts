// GET /week under load beside a bare Express JSON route, and the queries one request makes.
// Run: node --import tsx tests/bench/week.bench.ts   (starts or reuses the project's PostgreSQL; port 3201 or BENCH_PORT)
import { spawn, type ChildProcess } from 'node:child_process';
import { randomBytes } from 'node:crypto';
import { readdirSync, readFileSync } from 'node:fs';
// @ts-expect-error autocannon ships no type declarations
import autocannon from 'autocannon';
import pg from 'pg';
import request from 'supertest';
import { weekStartOf } from '../../shared/schemas/week';
import { createApp } from '../../server/app';
import { PERSON_AND_MEMBERSHIP } from '../../server/auth/session';
import { loadConfig } from '../../server/config';
import { migrate } from '../../server/db/migrate';
import { todayIn } from '../../server/services/clock';
import { startCluster } from '../../scripts/lib/postgres.mjs';
import { dropDatabase, recreateDatabase } from '../../scripts/lib/database.mjs';
import { BENCH_EMAIL, BENCH_PASSWORD, generateHousehold } from './week-household';

const CONNECTIONS = 32;
const SECONDS = Number(process.env.BENCH_SECONDS ?? 10);
// BENCH_PORT moves the app's port, so parallel runs on one machine never collide; the bare route takes a free one.
const APP_PORT = Number(process.env.BENCH_PORT ?? 3201);

const cluster = startCluster();
const database = `larderly_bench_${process.pid}`;
await recreateDatabase(cluster, database);
const databaseUrl = cluster.url(database);
const children: ChildProcess[] = [];

try {
  const built = createApp(
    loadConfig({
      ...process.env,
      NODE_ENV: 'test',
      DATABASE_URL: databaseUrl,
      STATIC_DIR: 'no-static-in-bench',
      BCRYPT_COST: '4',
    }),
  );
  await migrate(built.sequelize);
  const today = todayIn('America/New_York');
  const { household, jars, entries } = await generateHousehold(today);
  const start = weekStartOf(today, household.weekStartsOn);
  const path = `/api/households/${household.id}/week?start=${start}`;
  console.log(`generated: 60 products, 400 batches, ${jars} jars, ${entries} plan entries; week of ${start}`);

  // Queries per request, counted at the driver: the session, the guard and the week's own reads.
  const agent = request.agent(built.app);
  await agent.post('/api/auth/login').send({ email: BENCH_EMAIL, password: BENCH_PASSWORD }).expect(200);
  const texts: string[] = [];
  const query = pg.Client.prototype.query;
  pg.Client.prototype.query = function counted(this: pg.Client, ...args: unknown[]) {
    const sql = typeof args[0] === 'string' ? args[0] : ((args[0] as { text?: string })?.text ?? '');
    texts.push(sql.replace(/\s+/g, ' ').slice(0, 90));
    return (query as (...a: unknown[]) => unknown).apply(this, args);
  } as typeof query;
  const rounds = 20;
  const began = performance.now();
  for (let i = 0; i < rounds; i += 1) await agent.get(path).expect(200);
  const sequentialMs = (performance.now() - began) / rounds;
  pg.Client.prototype.query = query;
  console.log(`one at a time, in process: ${sequentialMs.toFixed(1)} ms per GET /week`);
  console.log(
    `\nqueries per GET /week: ${texts.length / rounds} (${rounds} requests, ${texts.length} queries); one request's:`,
  );
  for (const sql of texts.slice(0, texts.length / rounds)) console.log(`  ${sql}`);
  const answered = await agent.get(path);
  const payload = answered.body;
  console.log(`answer: ${answered.text.length} bytes of JSON`);
  console.log(
    `payload: ${payload.days.reduce((n: number, d: { entries: unknown[] }) => n + d.entries.length, 0)} entries, ${payload.allocation.assignments.length} assignments, ${payload.allocation.openings.length} openings, ${payload.allocation.warnings.length} warnings`,
  );
  // The plan of the one query every household request pays, run twice so the second shows it warm.
  const [[session]] = (await built.sequelize.query('SELECT sid FROM sessions LIMIT 1')) as [{ sid: string }[], unknown];
  for (const round of [1, 2]) {
    const [plan] = (await built.sequelize.query(`EXPLAIN (ANALYZE, BUFFERS) ${PERSON_AND_MEMBERSHIP}`, {
      bind: [session!.sid, household.id],
    })) as [{ 'QUERY PLAN': string }[], unknown];
    if (round === 2) {
      console.log('\nthe session read (session, person, membership, household), warm:');
      for (const row of plan) console.log(`  ${row['QUERY PLAN']}`);
    }
  }
  const cookie = (
    await request(built.app).post('/api/auth/login').send({ email: BENCH_EMAIL, password: BENCH_PASSWORD })
  ).headers['set-cookie']![0].split(';')[0];
  await built.close();

  // The real server and a bare Express route, each in its own process, so the load generator does not share their event loop.
  // BENCH_CPU_PROF=<dir> writes the server's CPU profile there when it stops (node --cpu-prof).
  const profile = process.env.BENCH_CPU_PROF ? ['--cpu-prof', `--cpu-prof-dir=${process.env.BENCH_CPU_PROF}`] : [];
  const server = spawn(process.execPath, [...profile, '--import', 'tsx', 'server/index.ts'], {
    env: {
      ...process.env,
      NODE_ENV: 'production',
      DATABASE_URL: databaseUrl,
      PORT: String(APP_PORT),
      HOST: '127.0.0.1',
      SESSION_SECRET: randomBytes(32).toString('hex'),
      STATIC_DIR: 'no-static-in-bench',
      LOG_LEVEL: process.env.LOG_LEVEL ?? 'warn',
    },
    stdio: ['ignore', 'inherit', 'inherit'],
  });
  const bare = spawn(
    process.execPath,
    [
      '--input-type=module',
      '-e',
      `import express from 'express'; const app = express(); app.get('/bare', (_req, res) => res.json({ ok: true, start: '${start}' })); const s = app.listen(0, '127.0.0.1', () => console.log(s.address().port));`,
    ],
    { stdio: ['ignore', 'pipe', 'inherit'] },
  );
  children.push(server, bare);
  const BARE_PORT = await new Promise<number>((resolve) =>
    bare.stdout!.once('data', (chunk) => resolve(Number(String(chunk).trim()))),
  );
  await waitFor(`http://127.0.0.1:${APP_PORT}/api/health`);
  await waitFor(`http://127.0.0.1:${BARE_PORT}/bare`);

  // The session cookie was signed with the test secret; sign in again against the real server.
  const login = await fetch(`http://127.0.0.1:${APP_PORT}/api/auth/login`, {
    method: 'POST',
    headers: { 'content-type': 'application/json' },
    body: JSON.stringify({ email: BENCH_EMAIL, password: BENCH_PASSWORD }),
  });
  const serverCookie = login.headers.get('set-cookie')?.split(';')[0] ?? cookie;
  const probe = await fetch(`http://127.0.0.1:${APP_PORT}${path}`, { headers: { cookie: serverCookie } });
  if (!probe.ok)
    throw new Error(
      `GET /week answered ${probe.status} on the server (sign-in ${login.status} ${await login.clone().text()}): ${(await probe.text()).slice(0, 300)}`,
    );

  const os = await import('node:os');
  const loadBefore = os.loadavg()[0];
  // BENCH_ROUTES=guard,bare (say) runs only those of week, week-br, guard and bare.
  const only = (name: string) => !process.env.BENCH_ROUTES || process.env.BENCH_ROUTES.split(',').includes(name);
  const skipped = {
    medianMs: NaN,
    p99Ms: NaN,
    requestsPerSecond: NaN,
    non2xx: 0,
    serverCpuMsPerRequest: NaN,
    mainThreadMs: NaN,
    postgresCpuMsPerRequest: NaN,
  };
  const week = only('week')
    ? await load(`http://127.0.0.1:${APP_PORT}${path}`, { cookie: serverCookie }, server.pid)
    : skipped;
  // The same session and household guard with almost no work behind them: what any household route costs here.
  // The same read as a browser asks for it (every browser sends Accept-Encoding): the cached answer's brotli copy.
  const weekAsBrowser = only('week-br')
    ? await load(
        `http://127.0.0.1:${APP_PORT}${path}`,
        { cookie: serverCookie, 'accept-encoding': 'br, gzip' },
        server.pid,
      )
    : skipped;
  const guarded = only('guard')
    ? await load(`http://127.0.0.1:${APP_PORT}/api/households/${household.id}`, { cookie: serverCookie }, server.pid)
    : skipped;
  const base = only('bare') ? await load(`http://127.0.0.1:${BARE_PORT}/bare`, {}, bare.pid) : skipped;
  console.log(
    `\n${CONNECTIONS} connections, ${SECONDS} s each, on ${os.cpus().length} cores; machine load average before the run: ${loadBefore.toFixed(1)}`,
  );
  console.table({
    'GET /week': week,
    'GET /week, Accept-Encoding: br, gzip': weekAsBrowser,
    'GET /households/:hid (same session and guard)': guarded,
    'bare Express JSON': base,
  });
  console.log(
    `server CPU per request, against bare Express's: week ${(week.serverCpuMsPerRequest / base.serverCpuMsPerRequest).toFixed(1)}x, guard only ${(guarded.serverCpuMsPerRequest / base.serverCpuMsPerRequest).toFixed(1)}x (PostgreSQL's CPU is its own column)`,
  );
  console.log(
    `throughput ratio (week / bare): ${(week.requestsPerSecond / base.requestsPerSecond).toFixed(3)}, as a browser asks ${(weekAsBrowser.requestsPerSecond / base.requestsPerSecond).toFixed(3)}; guard / bare ${(guarded.requestsPerSecond / base.requestsPerSecond).toFixed(3)}; aim: p99 < 25 ms and ratio >= 0.333 (guard >= 0.5)`,
  );
} finally {
  // Waits for each child to exit (up to 6 s), so a CPU profile is written before the database goes.
  await Promise.all(
    children.map(
      (child) =>
        new Promise((resolve) => {
          if (child.exitCode !== null) return resolve(null);
          child.once('exit', resolve);
          child.kill('SIGTERM');
          setTimeout(resolve, 6_000).unref();
        }),
    ),
  );
  await dropDatabase(cluster, database).catch(() => {});
  cluster.stop();
}

/** CPU time a process has used (user and system, ms), from /proc: steadier than throughput on a shared machine. */
function cpuMsOf(pid: number | undefined, file = 'stat') {
  if (!pid) return NaN;
  try {
    const fields = readFileSync(`/proc/${pid}/${file}`, 'utf8').split(') ')[1]!.split(' ');
    return ((Number(fields[11]) + Number(fields[12])) * 1000) / 100; // utime and stime, in clock ticks of 1/100 s
  } catch {
    return NaN;
  }
}

/** CPU time of each of the cluster's server processes (the postmaster's children: the backends serving the app), by pid. */
function postgresCpuMs() {
  const postmaster = Number(readFileSync(`${cluster.dataDir}/postmaster.pid`, 'utf8').split('\n')[0]);
  const byPid = new Map<string, number>();
  for (const entry of readdirSync('/proc')) {
    if (!/^\d+$/.test(entry)) continue;
    try {
      const fields = readFileSync(`/proc/${entry}/stat`, 'utf8').split(') ')[1]!.split(' ');
      if (Number(fields[1]) === postmaster) byPid.set(entry, ((Number(fields[11]) + Number(fields[12])) * 1000) / 100);
    } catch {
      // gone meanwhile
    }
  }
  return byPid;
}

/** CPU the cluster used since `before`: processes that ended meanwhile drop out, new ones count whole. */
function postgresCpuSince(before: Map<string, number>) {
  let total = 0;
  for (const [pid, ms] of postgresCpuMs()) total += ms - (before.get(pid) ?? 0);
  return total;
}

async function load(url: string, headers: Record<string, string>, pid?: number) {
  const cpuBefore = cpuMsOf(pid);
  // The main thread's own share: the rest is V8's garbage-collector helpers and libuv's threads.
  const mainBefore = cpuMsOf(pid, `task/${pid}/stat`);
  const postgresBefore = postgresCpuMs();
  const result = await autocannon({ url, connections: CONNECTIONS, duration: SECONDS, headers });
  const cpuPerRequest = (cpuMsOf(pid) - cpuBefore) / result.requests.total;
  const mainPerRequest = (cpuMsOf(pid, `task/${pid}/stat`) - mainBefore) / result.requests.total;
  const postgresPerRequest = postgresCpuSince(postgresBefore) / result.requests.total;
  if (result.non2xx > 0 || result.errors > 0)
    console.log(`  ${url}: ${result.non2xx} non-2xx, ${result.errors} errors`);
  return {
    medianMs: result.latency.p50,
    p99Ms: result.latency.p99,
    requestsPerSecond: result.requests.average,
    non2xx: result.non2xx,
    serverCpuMsPerRequest: Number(cpuPerRequest.toFixed(3)),
    mainThreadMs: Number(mainPerRequest.toFixed(3)),
    postgresCpuMsPerRequest: Number(postgresPerRequest.toFixed(3)),
  };
}

async function waitFor(url: string) {
  for (let i = 0; i < 120; i += 1) {
    try {
      if ((await fetch(url)).ok) return;
    } catch {
      // not listening yet
    }
    await new Promise((resolve) => setTimeout(resolve, 250));
  }
  throw new Error(`${url} did not answer`);
}
