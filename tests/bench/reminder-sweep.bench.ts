// The reminder sweep over 100,000 opened jars in 10,000 households, run by two processes at the same moment
// (each `server/jobs/sweep-once.ts`, as two app processes' job runners would): how long until both are done,
// and whether each reminder was claimed exactly once (the delivery rows against the reminders due).
// Run: npm run bench:sweep   (starts or reuses the project's PostgreSQL; BENCH_HOUSEHOLDS, BENCH_OPENED to change it;
// BENCH_DATABASE=<name> keeps the generated database under that name and reuses it on the next run, its deliveries emptied)
// No mail server and no push devices: every reminder is claimed and recorded with nothing to send, so the figure is
// the sweep's own work (the database), not an SMTP server's speed.
import { spawn } from 'node:child_process';
import os from 'node:os';
import pg from 'pg';
import { QueryTypes } from 'sequelize';
import { createApp } from '../../server/app';
import { loadConfig } from '../../server/config';
import { migrate } from '../../server/db/migrate';
import { startCluster } from '../../scripts/lib/postgres.mjs';
import { dropDatabase, recreateDatabase } from '../../scripts/lib/database.mjs';
import { generateCrowd } from './crowd';

const HOUSEHOLDS = Number(process.env.BENCH_HOUSEHOLDS ?? 10_000);
const OPENED = Number(process.env.BENCH_OPENED ?? 100_000);
const ZONE = 'America/New_York';
const cluster = startCluster();
const kept = process.env.BENCH_DATABASE;
const database = kept ?? `larderly_sweep_${process.pid}`;

function withoutMail(env: NodeJS.ProcessEnv) {
  return Object.fromEntries(Object.entries(env).filter(([name]) => !name.startsWith('SMTP_')));
}

function sweepProcess(url: string, at: Date) {
  return new Promise<{ ms: number; claimed: number }>((resolve, reject) => {
    const began = performance.now();
    const child = spawn(process.execPath, ['--import', 'tsx', 'server/jobs/sweep-once.ts', '--at', at.toISOString()], {
      env: { ...withoutMail(process.env), NODE_ENV: 'test', DATABASE_URL: url },
    });
    let output = '';
    child.stdout.on('data', (chunk) => (output += chunk));
    child.stderr.on('data', (chunk) => (output += chunk));
    child.on('exit', (code) => {
      if (code !== 0) return reject(new Error(`sweep process exited with ${code}: ${output}`));
      const line = output.trim().split('\n').pop()!;
      resolve({ ms: performance.now() - began, claimed: JSON.parse(line).reminders });
    });
  });
}

const loadBefore = os.loadavg()[0];
const url = cluster.url(database);
const reuse = kept ? await hasCrowd(url) : false;
if (!reuse) await recreateDatabase(cluster, database);
const built = createApp(
  loadConfig({ ...process.env, NODE_ENV: 'test', DATABASE_URL: url, STATIC_DIR: 'no-static-in-bench' }),
);
try {
  await migrate(built.sequelize);
  const began = performance.now();
  if (reuse) await built.sequelize.query('TRUNCATE reminder_deliveries');
  const counts = reuse
    ? { households: await built.sequelize.models.Household!.count(), jars: await built.sequelize.models.Jar!.count() }
    : await generateCrowd(built.sequelize, HOUSEHOLDS);
  const q = (sql: string, replacements: Record<string, unknown> = {}) =>
    built.sequelize.transaction(async (transaction) => {
      // Bulk set-up statements on a busy machine may outlast the app's 15 s limit for a request.
      await built.sequelize.query('SET LOCAL statement_timeout = 0', { transaction });
      return built.sequelize.query<Record<string, number>>(sql, { replacements, type: QueryTypes.SELECT, transaction });
    });
  // Open sealed jars until OPENED are open, their use-by spread over the next two weeks.
  await q(
    `UPDATE jars SET state = 'opened', opened_on = current_date - 3, use_by = current_date, remaining_tbsp = 8
      WHERE id IN (SELECT id FROM jars WHERE state = 'sealed' ORDER BY id LIMIT greatest(0, :opened - (SELECT count(*) FROM jars WHERE state = 'opened')))`,
    { opened: OPENED },
  );
  await q(`UPDATE jars SET use_by = current_date + (abs(hashtext(id::text)) % 14) WHERE state = 'opened'`);
  // Everyone's reminder hour is now, in the households' time zone, 14 days before the use-by.
  const now = new Date();
  const hour = Number(
    new Intl.DateTimeFormat('en-US', { timeZone: ZONE, hour: 'numeric', hourCycle: 'h23' }).format(now),
  );
  await q('DELETE FROM notification_preferences');
  await q(
    `INSERT INTO notification_preferences (user_id, email_reminders, weekly_digest, reminder_hour, days_before, created_at, updated_at)
     SELECT id, true, false, :hour, 14, now(), now() FROM users`,
    { hour },
  );
  await q('ANALYZE');
  const [{ opened }] = await q("SELECT count(*)::int AS opened FROM jars WHERE state = 'opened'");
  const [{ due }] = await q(
    `SELECT count(*)::int AS due FROM jars j JOIN memberships m ON m.household_id = j.household_id
      WHERE j.state = 'opened' AND j.use_by BETWEEN (:now::timestamptz AT TIME ZONE :zone)::date AND (:now::timestamptz AT TIME ZONE :zone)::date + 14`,
    { now, zone: ZONE },
  );
  const made = `${counts.households} households, ${counts.jars} jars, ${opened.toLocaleString('en-US')} opened, ${reuse ? 'reused' : 'made'} in ${((performance.now() - began) / 1000).toFixed(1)} s`;

  const wall = performance.now();
  const [one, two] = await Promise.all([sweepProcess(url, now), sweepProcess(url, now)]);
  const bothMs = performance.now() - wall;
  const again = await sweepProcess(url, now);
  const [{ rows, people, sent }] = await q(
    `SELECT count(*)::int AS rows, count(DISTINCT (jar_id, kind, user_id))::int AS people, count(sent_at)::int AS sent FROM reminder_deliveries WHERE jar_id IS NOT NULL`,
  );

  console.log(`\nreminder sweep: ${made}`);
  console.log(
    `machine: ${os.cpus().length} cores, load average ${loadBefore.toFixed(1)} before and ${os.loadavg()[0].toFixed(1)} after`,
  );
  console.table({
    'process one': { ms: Math.round(one.ms), claimed: one.claimed },
    'process two': { ms: Math.round(two.ms), claimed: two.claimed },
    'both, wall clock': { ms: Math.round(bothMs), claimed: one.claimed + two.claimed },
    'a third sweep after': { ms: Math.round(again.ms), claimed: again.claimed },
  });
  console.log(
    `reminders due ${due.toLocaleString('en-US')}; delivery rows ${rows.toLocaleString('en-US')} (${people.toLocaleString('en-US')} distinct jar, kind and person), ${sent.toLocaleString('en-US')} recorded sent`,
  );
  const once =
    rows === due && people === due && sent === due && one.claimed + two.claimed === due && again.claimed === 0;
  console.log(
    `each reminder exactly once: ${once ? 'yes' : 'NO'}; both processes done in ${(bothMs / 1000).toFixed(1)} s (aim <= 10 s, process start-up included)`,
  );
  if (!once) process.exitCode = 1;
} finally {
  await built.close();
  if (!kept) await dropDatabase(cluster, database).catch(() => {});
  cluster.stop();
}

/** Whether a kept database already holds a generated crowd. */
async function hasCrowd(databaseUrl: string) {
  const client = new pg.Client({ connectionString: databaseUrl });
  try {
    await client.connect();
    const { rows } = await client.query("SELECT to_regclass('households') IS NOT NULL AS made");
    return rows[0].made && (await client.query('SELECT count(*)::int AS n FROM households')).rows[0].n > 0;
  } catch {
    return false;
  } finally {
    await client.end().catch(() => {});
  }
}
