import { existsSync, readdirSync, readFileSync } from 'node:fs';
import path from 'node:path';
import type { CaughtMail } from '../../shared/schemas/caught-mail';
import type { CaughtPush } from '../../dev/stand-ins/push-endpoint';

function readAll<T>(dir: string): T[] {
  if (!existsSync(dir)) return [];
  return readdirSync(dir)
    .filter((name) => name.endsWith('.json'))
    .sort()
    .map((name) => JSON.parse(readFileSync(path.join(dir, name), 'utf8')) as T);
}

/** What the browser tests' stand-ins caught, read from their folders. */
export const caughtPushes = (standInsDir: string) => readAll<CaughtPush>(path.join(standInsDir, 'push'));
export const caughtMail = (standInsDir: string) => readAll<CaughtMail>(path.join(standInsDir, 'mail'));

/** Polls until `find` returns something, for at most `ms`. */
export async function eventually<T>(find: () => T | undefined, ms = 10_000): Promise<T> {
  for (let waited = 0; waited < ms; waited += 100) {
    const found = find();
    if (found !== undefined) return found;
    await new Promise((resolve) => setTimeout(resolve, 100));
  }
  throw new Error(`nothing arrived within ${ms} ms`);
}
