// Graceful shutdown of the real server process: SIGTERM stops new connections, lets the request in
// flight finish, stops the job runner and the pools, and exits 0; one that cannot finish in
// SHUTDOWN_TIMEOUT_MS is cut and the exit says so.
import { spawn, type ChildProcess } from 'node:child_process';
import http from 'node:http';
import { createInterface } from 'node:readline';
import { afterEach, describe, expect, it } from 'vitest';
import { freePort } from '../support/ports';

type Line = { msg: string; level: number; reqId?: string; res?: { statusCode: number } };
const started: ChildProcess[] = [];
afterEach(() => {
  for (const child of started.splice(0)) if (child.exitCode === null) child.kill('SIGKILL');
});

/** server/index.ts as `npm start` runs it, on this file's database; resolves once it listens. */
async function startServer(env: Record<string, string> = {}, preload: string[] = []) {
  const port = await freePort();
  const child = spawn(
    process.execPath,
    ['--import', 'tsx', ...preload.flatMap((file) => ['--import', file]), 'server/index.ts'],
    {
      env: {
        ...process.env,
        NODE_ENV: 'test',
        LOG_LEVEL: 'info',
        PORT: String(port),
        HOST: '127.0.0.1',
        STATIC_DIR: 'none',
        BCRYPT_COST: '4',
        ...env,
      },
      stdio: ['ignore', 'pipe', 'inherit'],
    },
  );
  started.push(child);
  const lines: Line[] = [];
  const waiters: { test: (l: Line) => boolean; resolve: (l: Line) => void }[] = [];
  createInterface({ input: child.stdout! }).on('line', (text) => {
    const line = JSON.parse(text) as Line;
    lines.push(line);
    for (const w of waiters.filter((w) => w.test(line))) w.resolve(line);
  });
  const exited = new Promise<number | null>((resolve) => child.once('exit', (code) => resolve(code)));
  const logged = (test: (l: Line) => boolean) =>
    new Promise<Line>((resolve, reject) => {
      const seen = lines.find(test);
      if (seen) return resolve(seen);
      waiters.push({ test, resolve });
      void exited.then(() =>
        reject(new Error(`the server exited before logging it; it logged:\n${lines.map((l) => l.msg).join('\n')}`)),
      );
    });
  await logged((l) => l.msg.startsWith('serving on'));
  return { child, port, lines, logged, exited };
}

/**
 * A sign-in whose body is held back: `Expect: 100-continue` makes the server say when it has read the
 * headers (the request is then in flight), and the body is sent only at `finish()`.
 */
async function halfSentRequest(port: number) {
  const body = JSON.stringify({ email: 'nobody-here@larderly.test', password: 'not-the-password' });
  const req = http.request({
    host: '127.0.0.1',
    port,
    method: 'POST',
    path: '/api/auth/login',
    headers: { 'Content-Type': 'application/json', 'Content-Length': Buffer.byteLength(body), Expect: '100-continue' },
  });
  const answered = new Promise<{ status: number; body: string }>((resolve, reject) => {
    req.on('response', (res) => {
      let text = '';
      res.on('data', (c) => (text += c));
      res.on('end', () => resolve({ status: res.statusCode!, body: text }));
    });
    req.on('error', reject);
  });
  answered.catch(() => {});
  req.flushHeaders();
  await new Promise((resolve) => req.once('continue', resolve));
  return { answered, finish: () => req.end(body) };
}

const connects = (port: number) =>
  fetch(`http://127.0.0.1:${port}/api/health`).then(
    () => true,
    () => false,
  );

describe('SIGTERM', () => {
  it('finishes the request in flight, refuses new connections meanwhile, stops the jobs and the pools, and exits 0', async () => {
    const server = await startServer();
    expect(await connects(server.port)).toBe(true);
    const slow = await halfSentRequest(server.port);
    server.child.kill('SIGTERM');
    await server.logged((l) => l.msg.startsWith('stopping (SIGTERM)'));
    expect(await connects(server.port)).toBe(false);
    expect(server.child.exitCode).toBeNull();

    slow.finish();
    const answer = await slow.answered;
    expect(answer.status).toBe(401);
    expect(JSON.parse(answer.body).error.code).toBe('signed_out');
    expect(await server.exited).toBe(0);

    const messages = server.lines.map((l) => l.msg);
    const requestLine = messages.indexOf('POST /api/auth/login 401');
    expect(requestLine).toBeGreaterThan(messages.indexOf('stopping (SIGTERM): finishing the requests in flight'));
    expect(messages.indexOf('stopping: no request in flight; stopping the job runner')).toBeGreaterThan(requestLine);
    expect(messages.at(-1)).toBe('stopped');
  });

  it('cuts a request that does not finish within SHUTDOWN_TIMEOUT_MS and exits 1', async () => {
    const server = await startServer({ SHUTDOWN_TIMEOUT_MS: '1000' });
    const stuck = await halfSentRequest(server.port);
    const sent = Date.now();
    server.child.kill('SIGTERM');
    expect(await server.exited).toBe(1);
    expect(Date.now() - sent).toBeGreaterThanOrEqual(1000);
    await expect(stuck.answered).rejects.toThrow();
    expect(server.lines.some((l) => l.level === 50 && l.msg.includes('not done after 1000 ms'))).toBe(true);
  });

  it('an unhandled promise rejection is logged as fatal with its error, and the process stops cleanly with exit code 1', async () => {
    const server = await startServer({}, ['./tests/support/reject-later.mjs']);
    server.child.kill('SIGUSR2');
    expect(await server.exited).toBe(1);
    const fatal = server.lines.find((l) => l.level === 60) as (Line & { err?: { message: string } }) | undefined;
    expect(fatal?.msg).toBe('unhandled promise rejection; stopping');
    expect(fatal?.err?.message).toBe('a promise nobody awaited failed');
    expect(server.lines.at(-1)).toMatchObject({ msg: 'stopped', exitCode: 1 });
  });
});
