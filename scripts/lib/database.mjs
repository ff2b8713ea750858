// Database creation with the pg driver; imported only after `npm ci` has run.
import { randomBytes } from 'node:crypto';
import { existsSync, readFileSync, writeFileSync } from 'node:fs';
import path from 'node:path';
import { run, projectDir } from './system.mjs';

async function admin(cluster, work) {
  const { default: pg } = await import('pg');
  const client = new pg.Client({ connectionString: cluster.url('postgres') });
  await client.connect();
  try {
    return await work(client);
  } finally {
    await client.end();
  }
}

const quote = (name) => `"${name.replaceAll('"', '""')}"`;

export function ensureDatabase(cluster, name) {
  return admin(cluster, async (client) => {
    const { rowCount } = await client.query('SELECT 1 FROM pg_database WHERE datname = $1', [name]);
    if (!rowCount) await client.query(`CREATE DATABASE ${quote(name)}`);
  });
}

export function recreateDatabase(cluster, name, template) {
  return admin(cluster, async (client) => {
    await client.query(`DROP DATABASE IF EXISTS ${quote(name)} WITH (FORCE)`);
    await client.query(`CREATE DATABASE ${quote(name)}${template ? ` TEMPLATE ${quote(template)}` : ''}`);
  });
}

/** Runs the migrations (and, with seedDemo, the demo scenario on an empty database). */
export function setUpSchema(databaseUrl, { seedDemo = false } = {}) {
  run(process.execPath, ['--import', 'tsx', 'server/setup.ts', 'setup', ...(seedDemo ? ['--seed-demo'] : [])], {
    cwd: projectDir,
    env: { ...process.env, DATABASE_URL: databaseUrl },
  });
}

/** A random secret kept beside the cluster, so sessions survive restarts in development. */
export function persistentSecret(cluster, name) {
  const file = path.join(path.dirname(cluster.dataDir), name);
  if (!existsSync(file)) writeFileSync(file, randomBytes(32).toString('base64url'), { mode: 0o600 });
  return readFileSync(file, 'utf8').trim();
}

export function dropDatabase(cluster, name) {
  return admin(cluster, (client) => client.query(`DROP DATABASE IF EXISTS ${quote(name)} WITH (FORCE)`));
}

export function buildClient(outDir = 'dist/client') {
  run(process.execPath, ['node_modules/vite/bin/vite.js', 'build', '--logLevel', 'warn', '--outDir', outDir], {
    cwd: projectDir,
  });
}
