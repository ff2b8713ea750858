// `npm start`: everything a newcomer needs, from a fresh clone to a running app with demo data.
import { readFileSync } from 'node:fs';
import { ensureNodeModules, fail, log, projectDir, startChild } from './lib/system.mjs';
import { startCluster } from './lib/postgres.mjs';
import { startStandIns } from './lib/stand-ins.mjs';

ensureNodeModules();
const { buildClient, ensureDatabase, persistentSecret, setUpSchema } = await import('./lib/database.mjs');

const cluster = startCluster();
let standIns = null;
const stopAll = (code) => {
  standIns?.child.kill('SIGTERM');
  cluster.stop();
  process.exit(code);
};
try {
  const database = process.env.PGDATABASE ?? 'larderly';
  await ensureDatabase(cluster, database);
  const databaseUrl = cluster.url(database);
  const production = process.env.NODE_ENV === 'production';
  setUpSchema(databaseUrl, { seedDemo: !production });
  log('building the client');
  buildClient();
  // Development sends mail, pushes and photos to local stand-ins unless SMTP_HOST and S3_BUCKET point elsewhere.
  if (!production && !(process.env.SMTP_HOST && process.env.S3_BUCKET)) {
    standIns = await startStandIns(cluster);
    log(standIns.describe);
  }

  const port = process.env.PORT ?? '3000';
  const host = process.env.HOST ?? '127.0.0.1';
  const server = startChild(process.execPath, ['--import', 'tsx', 'server/index.ts'], {
    env: {
      ...process.env,
      NODE_ENV: process.env.NODE_ENV ?? 'development',
      DATABASE_URL: process.env.DATABASE_URL ?? databaseUrl,
      SESSION_SECRET: process.env.SESSION_SECRET ?? persistentSecret(cluster, 'session-secret'),
      PORT: port,
      HOST: host,
      ...standIns?.env,
    },
  });
  await waitForHealth(`http://${host}:${port}/api/health`, server);
  printWelcome(`http://${host}:${port}`, production);

  let stopping = false;
  const stop = (signal) => {
    if (stopping) return;
    stopping = true;
    log(`${signal}: stopping the server and the database it started`);
    server.kill('SIGTERM');
  };
  process.on('SIGINT', () => stop('SIGINT'));
  process.on('SIGTERM', () => stop('SIGTERM'));
  server.on('exit', (code) => stopAll(stopping ? 0 : (code ?? 1)));
} catch (error) {
  process.stderr.write(`${error.stack ?? error}\n`);
  stopAll(1);
}

async function waitForHealth(url, child) {
  for (let i = 0; i < 120; i += 1) {
    if (child.exitCode !== null) fail('the server stopped while starting; see the messages above.');
    try {
      const response = await fetch(url);
      if (response.ok) return;
    } catch {
      // not listening yet
    }
    await new Promise((resolve) => setTimeout(resolve, 250));
  }
  fail(`the server did not answer ${url} within 30 seconds.`);
}

function printWelcome(url, production) {
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
  if (standIns) lines.push('  E-mail, push and batch photos go to local stand-ins; a keeper reads the caught mail from Household, Invitations.', '');
  lines.push('  Press Ctrl-C to stop the server and the database.', '');
  process.stdout.write(lines.join('\n') + '\n');
}
