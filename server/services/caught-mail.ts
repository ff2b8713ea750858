import { readdir, readFile } from 'node:fs/promises';
import path from 'node:path';
import type { CaughtMail } from '../../shared/schemas/caught-mail';

/** The newest messages the local catcher kept, for the development mailbox page. */
export async function readCaughtMail(dir: string, limit = 50): Promise<CaughtMail[]> {
  const names = (await readdir(dir).catch(() => [] as string[])).filter((n) => n.endsWith('.json')).sort().reverse().slice(0, limit);
  return Promise.all(names.map(async (name) => JSON.parse(await readFile(path.join(dir, name), 'utf8')) as CaughtMail));
}
