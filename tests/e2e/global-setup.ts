import { spawn, spawnSync, type ChildProcess } from 'node:child_process';
import { randomBytes } from 'node:crypto';
import type { TestProject } from 'vitest/node';
import { createTestDatabase } from '../support/database';
import { freePort } from '../support/ports';

declare module 'vitest' {
  export interface ProvidedContext {
    baseURL: string;
  }
}

/** The real server, built client and demo data on a database of the browser tests' own. */
export default async function startServer(project: TestProject) {
  const database = await createTestDatabase('e2e');
  const env = { ...process.env, DATABASE_URL: database.url };
  const seeded = spawnSync(process.execPath, ['--import', 'tsx', 'server/setup.ts', 'setup', '--seed-demo'], {
    env,
    encoding: 'utf8',
  });
  if (seeded.status !== 0)
    throw new Error(`seeding the browser-test database failed:\n${seeded.stdout}${seeded.stderr}`);

  const port = await freePort();
  const server: ChildProcess = spawn(process.execPath, ['--import', 'tsx', 'server/index.ts'], {
    env: {
      ...env,
      NODE_ENV: 'production',
      PORT: String(port),
      HOST: '127.0.0.1',
      SESSION_SECRET: randomBytes(32).toString('hex'),
      STATIC_DIR: process.env.LARDERLY_TEST_CLIENT_DIR ?? 'dist/client',
      // Every browser test signs in from 127.0.0.1; the limit itself has its own API test.
      AUTH_RATE_LIMIT: '10000',
      // Only warnings and errors: a line per request would bury the test output.
      LOG_LEVEL: process.env.LOG_LEVEL ?? 'warn',
    },
    stdio: ['ignore', 'inherit', 'inherit'],
  });
  const baseURL = `http://127.0.0.1:${port}`;
  await waitUntilHealthy(`${baseURL}/api/health`, server);
  project.provide('baseURL', baseURL);

  return async () => {
    server.kill('SIGTERM');
    await new Promise((resolve) => server.once('exit', resolve));
    await database.drop();
  };
}

async function waitUntilHealthy(url: string, server: ChildProcess) {
  for (let i = 0; i < 120; i += 1) {
    if (server.exitCode !== null) throw new Error('the server stopped while starting');
    try {
      if ((await fetch(url)).ok) return;
    } catch {
      // not listening yet
    }
    await new Promise((resolve) => setTimeout(resolve, 250));
  }
  throw new Error(`the server did not become healthy at ${url}`);
}
