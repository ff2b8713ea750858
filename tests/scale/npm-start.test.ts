// `npm start` under a supervisor: SIGTERM to npm's own process stops everything the command started
// (the app, the stand-ins and PostgreSQL), as Ctrl-C does, and frees the ports.
import { spawn } from 'node:child_process';
import { chmodSync, existsSync, mkdtempSync, readdirSync, readFileSync, rmSync } from 'node:fs';
import net from 'node:net';
import os from 'node:os';
import path from 'node:path';
import { afterAll, describe, expect, it } from 'vitest';
import { freePort } from '../support/ports';

const dataDir = mkdtempSync(path.join(os.tmpdir(), 'larderly-npm-start-'));
// PostgreSQL runs as its own user (as root), which must reach its folder inside this one.
chmodSync(dataDir, 0o711);
afterAll(() => rmSync(dataDir, { recursive: true, force: true }));

/** Every process whose parent chain leads to `root`, from /proc. */
function descendantsOf(root: number): number[] {
  const parents = new Map<number, number>();
  for (const name of readdirSync('/proc').filter((n) => /^\d+$/.test(n))) {
    try {
      const stat = readFileSync(`/proc/${name}/stat`, 'utf8');
      parents.set(Number(name), Number(stat.slice(stat.lastIndexOf(')') + 2).split(' ')[1]));
    } catch {
      // gone meanwhile
    }
  }
  const found: number[] = [];
  const walk = (pid: number) => {
    for (const [child, parent] of parents) {
      if (parent !== pid) continue;
      found.push(child);
      walk(child);
    }
  };
  walk(root);
  return found;
}

const alive = (pid: number) =>
  existsSync(`/proc/${pid}`) && !/^\S+ \(.*\) Z/.test(readFileSync(`/proc/${pid}/stat`, 'utf8'));
const listening = (port: number) =>
  new Promise<boolean>((resolve) => {
    const socket = net.connect(port, '127.0.0.1');
    socket.once('connect', () => {
      socket.destroy();
      resolve(true);
    });
    socket.once('error', () => resolve(false));
  });

async function until(what: string, test: () => boolean | Promise<boolean>, seconds: number) {
  for (let i = 0; i < seconds * 10; i += 1) {
    if (await test()) return;
    await new Promise((resolve) => setTimeout(resolve, 100));
  }
  throw new Error(`${what} within ${seconds} s`);
}

describe('npm start', () => {
  it('stops the app, the stand-ins and PostgreSQL when npm itself gets SIGTERM, and frees the ports', async () => {
    const [appPort, pgPort] = [await freePort(), await freePort()];
    const env: NodeJS.ProcessEnv = {
      ...process.env,
      PORT: String(appPort),
      PGPORT: String(pgPort),
      LARDERLY_DATA_DIR: dataDir,
      STATIC_DIR: process.env.LARDERLY_TEST_CLIENT_DIR,
    };
    // As a person would run it: development, with the command's own stand-ins and database.
    for (const name of [
      'NODE_ENV',
      'DATABASE_URL',
      'S3_ENDPOINT',
      'S3_BUCKET',
      'S3_ACCESS_KEY_ID',
      'S3_SECRET_ACCESS_KEY',
      'S3_FORCE_PATH_STYLE',
      'SMTP_HOST',
      'SMTP_PORT',
      'VITEST',
      'VITEST_POOL_ID',
      'VITEST_WORKER_ID',
    ])
      delete env[name];
    const npm = spawn('npm', ['start'], { env, stdio: ['ignore', 'pipe', 'pipe'] });
    let output = '';
    npm.stdout.on('data', (chunk) => (output += chunk));
    npm.stderr.on('data', (chunk) => (output += chunk));
    const exited = new Promise<number | null>((resolve) => npm.once('exit', (code) => resolve(code)));
    await until(
      'npm start did not say it was ready',
      () => output.includes('Larderly is ready') || npm.exitCode !== null,
      150,
    ).catch((error) => {
      throw new Error(`${(error as Error).message}:\n${output}`);
    });
    expect(npm.exitCode, output).toBeNull();

    const children = descendantsOf(npm.pid!);
    const postmaster = Number(
      readFileSync(path.join(dataDir, 'main', 'pgdata', 'postmaster.pid'), 'utf8').split('\n')[0],
    );
    // node scripts/start.mjs, the stand-ins and the server at least, and PostgreSQL on its own.
    expect(children.length).toBeGreaterThanOrEqual(3);
    expect(alive(postmaster)).toBe(true);
    expect(await listening(appPort)).toBe(true);
    expect(await listening(pgPort)).toBe(true);

    npm.kill('SIGTERM');
    expect(await exited).not.toBeNull();
    await until(
      'a process npm start had started is still running',
      () => children.every((pid) => !alive(pid)) && !alive(postmaster),
      30,
    );
    expect(await listening(appPort)).toBe(false);
    expect(await listening(pgPort)).toBe(false);
    expect(output).toMatch(/SIGTERM: stopping the server, the stand-ins and the database/);
  });
});
