// `npm start`: everything a newcomer needs, from a fresh clone to a running app with demo data.
import { existsSync, readFileSync } from 'node:fs';
import path from 'node:path';
import { ensureNodeModules, log, onStopRequest, projectDir, startChild, stopChild } from './lib/system.mjs';
import { startCluster } from './lib/postgres.mjs';
import { startStandIns } from './lib/stand-ins.mjs';

ensureNodeModules();
const { buildClient, ensureDatabase, persistentSecret, setUpSchema } = await import('./lib/database.mjs');

const cluster = startCluster();
let standInsStarting = null;
let server = null;
let stopping = null;
/** Stops what this script started, in order: the app, the stand-ins, then PostgreSQL (pg_ctl stop, if started here). */
const stopAll = (code) => {
  stopping ??= (async () => {
    await stopChild(server);
    const standIns = await standInsStarting?.catch(() => null);
    await stopChild(standIns?.child);
    cluster.stop();
    process.exit(code);
  })();
  return stopping;
};
// From here on a signal, or npm's shell going away, stops everything, even halfway through the set-up.
onStopRequest((reason) => {
  log(`${reason}: stopping the server, the stand-ins and the database this command started`);
  void stopAll(0);
});
try {
  const database = process.env.PGDATABASE ?? 'larderly';
  await ensureDatabase(cluster, database);
  const databaseUrl = cluster.url(database);
  const production = process.env.NODE_ENV === 'production';
  setUpSchema(databaseUrl, { seedDemo: !production });
  // A client built ahead (STATIC_DIR with an index.html) is served as it is.
  const staticDir = process.env.STATIC_DIR;
  if (staticDir && existsSync(path.join(projectDir, staticDir, 'index.html')))
    log(`serving the client already built in ${staticDir}`);
  else {
    log('building the client');
    buildClient(staticDir);
  }
  // Development sends mail, pushes and photos to local stand-ins unless SMTP_HOST and S3_BUCKET point elsewhere.
  let standIns = null;
  if (!stopping && !production && !(process.env.SMTP_HOST && process.env.S3_BUCKET)) {
    standInsStarting = startStandIns(cluster);
    standIns = await standInsStarting;
    log(standIns.describe);
  }
  // A stop asked for during the set-up is under way: start nothing more.
  if (stopping) await stopping;

  const port = process.env.PORT ?? '3000';
  const host = process.env.HOST ?? '127.0.0.1';
  server = startChild(process.execPath, ['--import', 'tsx', 'server/index.ts'], {
    env: {
      ...process.env,
      NODE_ENV: process.env.NODE_ENV ?? 'development',
      // The local demo keeps its terminal for the welcome and for warnings; LOG_LEVEL=info shows a line per request.
      LOG_LEVEL: process.env.LOG_LEVEL ?? (production ? 'info' : 'warn'),
      DATABASE_URL: process.env.DATABASE_URL ?? databaseUrl,
      SESSION_SECRET: process.env.SESSION_SECRET ?? persistentSecret(cluster, 'session-secret'),
      PORT: port,
      HOST: host,
      ...standIns?.env,
    },
  });
  server.on('exit', (code) => {
    if (!stopping) void stopAll(code ?? 1);
  });
  await waitForHealth(`http://${host}:${port}/api/health`, server);
  printWelcome(`http://${host}:${port}`, production, Boolean(standIns));
} catch (error) {
  if (!stopping) process.stderr.write(`${error.stack ?? error}\n`);
  await stopAll(1);
}

async function waitForHealth(url, child) {
  for (let i = 0; i < 120; i += 1) {
    if (child.exitCode !== null) throw new Error('the server stopped while starting; see the messages above.');
    try {
      const response = await fetch(url);
      if (response.ok) return;
    } catch {
      // not listening yet
    }
    await new Promise((resolve) => setTimeout(resolve, 250));
  }
  throw new Error(`the server did not answer ${url} within 30 seconds.`);
}

function printWelcome(url, production, withStandIns) {
  const accounts = JSON.parse(readFileSync(`${projectDir}/server/demo/demo-accounts.json`, 'utf8'));
  const lines = ['', `  Larderly is ready: ${url}`, ''];
  if (!production) {
    lines.push('  Demo sign-ins (local demo data only), password for all: ' + accounts.password);
    for (const household of accounts.households) {
      for (const member of household.members) {
        lines.push(`    ${member.email.padEnd(26)} ${member.role.padEnd(7)} ${household.name}`);
      }
    }
    lines.push('');
  }
  if (withStandIns)
    lines.push(
      '  E-mail, push and batch photos go to local stand-ins; a keeper reads the caught mail from Household, Invitations.',
      '',
    );
  if (!production && !process.env.LOG_LEVEL)
    lines.push('  Only warnings are logged here; `LOG_LEVEL=info npm start` logs one JSON line per request.', '');
  lines.push('  Press Ctrl-C (or send this process SIGTERM) to stop the server, the stand-ins and the database.', '');
  process.stdout.write(lines.join('\n') + '\n');
}
