import { readdir, readFile } from 'node:fs/promises';
import path from 'node:path';
import type { CaughtMail } from '../../shared/schemas/caught-mail';
import { Membership, User } from '../db/models';

/** The addresses whose caught mail a member may read: the household's members and the caller. */
export async function mailboxAddresses(householdId: string, callerEmail: string) {
  const members = await Membership.findAll({
    where: { householdId },
    include: [{ model: User, as: 'user', required: true, attributes: ['email'] }],
  });
  return new Set([callerEmail, ...members.map((m) => m.user!.email)].map((a) => a.toLowerCase()));
}

/**
 * The newest messages the local catcher kept for the development mailbox page, only those whose
 * every recipient is one of `addresses`: another household's invitation links stay unseen.
 */
export async function readCaughtMail(dir: string, addresses: Set<string>, limit = 50): Promise<CaughtMail[]> {
  const names = (await readdir(dir).catch(() => [] as string[]))
    .filter((n) => n.endsWith('.json'))
    .sort()
    .reverse();
  const shown: CaughtMail[] = [];
  for (const name of names) {
    if (shown.length >= limit) break;
    const mail = JSON.parse(await readFile(path.join(dir, name), 'utf8')) as CaughtMail;
    if (mail.to.length > 0 && mail.to.every((to) => addresses.has(bareAddress(to)))) shown.push(mail);
  }
  return shown;
}

/** "Ada <ada@example.test>" and "ada@example.test" both give the address, lower-cased. */
const bareAddress = (to: string) => (/<([^>]+)>/.exec(to)?.[1] ?? to).trim().toLowerCase();
