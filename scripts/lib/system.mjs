// Plain Node helpers for the set-up scripts: they must run before node_modules exists.
import { spawnSync, spawn } from 'node:child_process';
import { createHash } from 'node:crypto';
import { existsSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import path from 'node:path';
import { fileURLToPath } from 'node:url';

export const projectDir = path.resolve(path.dirname(fileURLToPath(import.meta.url)), '../..');
export const isRoot = typeof process.getuid === 'function' && process.getuid() === 0;

export function log(message) {
  process.stdout.write(`larderly: ${message}\n`);
}

export function fail(message) {
  process.stderr.write(`\nlarderly: ${message}\n`);
  process.exit(1);
}

/** Runs a command to completion, streaming its output; throws with the command line on failure. */
export function run(command, args, options = {}) {
  const result = spawnSync(command, args, { stdio: options.quiet ? 'pipe' : 'inherit', encoding: 'utf8', ...options });
  if (result.error) throw result.error;
  if (result.status !== 0) {
    const output = options.quiet ? `\n${result.stdout ?? ''}${result.stderr ?? ''}` : '';
    throw new Error(`${command} ${args.join(' ')} exited with ${result.status}${output}`);
  }
  return result.stdout ?? '';
}

export function commandExists(command) {
  return spawnSync('sh', ['-c', `command -v ${command}`], { stdio: 'ignore' }).status === 0;
}

/** Installs Debian packages when root; otherwise stops with the exact command to run. */
export function ensureDebianPackages(packages, why) {
  if (!isRoot) {
    fail(
      `${why} is missing. Install it with:\n\n  sudo apt-get install -y ${packages.join(' ')}\n\nthen run the command again.`,
    );
  }
  log(`installing ${packages.join(', ')} with apt-get (${why})`);
  run('apt-get', ['update', '-qq']);
  run('apt-get', ['install', '-y', '-qq', '--no-install-recommends', ...packages], {
    env: { ...process.env, DEBIAN_FRONTEND: 'noninteractive' },
  });
}

/** `npm ci` when node_modules is missing or older than package-lock.json. */
export function ensureNodeModules() {
  const lockFile = path.join(projectDir, 'package-lock.json');
  const stampFile = path.join(projectDir, 'node_modules', '.larderly-lock-sha256');
  const lockHash = createHash('sha256').update(readFileSync(lockFile)).digest('hex');
  if (existsSync(stampFile) && readFileSync(stampFile, 'utf8') === lockHash) return;
  log('installing npm packages (npm ci)');
  run('npm', ['ci', '--no-audit', '--no-fund'], { cwd: projectDir });
  writeFileSync(stampFile, lockHash);
}

export function ensureChromium() {
  if (existsSync(process.env.CHROMIUM_PATH ?? '/usr/bin/chromium')) return;
  ensureDebianPackages(['chromium'], 'Chromium, for the browser tests');
}

/** Debian's nginx, the load balancer in front of several app processes (the scale tests, `scripts/lib/nginx.mjs`). */
export function ensureNginx() {
  if (existsSync(process.env.NGINX_PATH ?? '/usr/sbin/nginx')) return;
  // The package would start a system-wide nginx on port 80; the project runs its own, so none is started.
  const policy = '/usr/sbin/policy-rc.d';
  const ownPolicy = isRoot && !existsSync(policy);
  if (ownPolicy) writeFileSync(policy, '#!/bin/sh\nexit 101\n', { mode: 0o755 });
  try {
    ensureDebianPackages(['nginx'], 'nginx, the load balancer for the scale tests');
  } finally {
    if (ownPolicy) rmSync(policy, { force: true });
  }
}

/** Starts a long-running child that shares this terminal. */
export function startChild(command, args, options = {}) {
  return spawn(command, args, { stdio: 'inherit', cwd: projectDir, ...options });
}

/** Sends a child SIGTERM and waits for it to exit; SIGKILL after `graceMs`. Resolves at once if it has exited. */
export function stopChild(child, graceMs = 15_000) {
  if (!child || child.exitCode !== null || child.signalCode !== null) return Promise.resolve();
  return new Promise((resolve) => {
    const kill = setTimeout(() => child.kill('SIGKILL'), graceMs);
    child.once('exit', () => {
      clearTimeout(kill);
      resolve();
    });
    child.kill('SIGTERM');
  });
}

/**
 * Calls `stop(reason)` once on SIGINT (Ctrl-C), SIGTERM (a supervisor, or `kill` of npm's process),
 * SIGHUP (the terminal closed), or when the parent process is gone: npm runs a script through a
 * shell, and a shell that is killed leaves its child running with no parent of its own.
 */
export function onStopRequest(stop) {
  let called = false;
  const once = (reason) => {
    if (called) return;
    called = true;
    stop(reason);
  };
  for (const signal of ['SIGINT', 'SIGTERM', 'SIGHUP']) process.on(signal, () => once(signal));
  const parent = process.ppid;
  setInterval(() => {
    if (process.ppid !== parent) once('the parent process exited');
  }, 500).unref();
}
