// Runs one reminder and digest sweep and exits: `tsx server/jobs/sweep-once.ts [--at <ISO instant>]`.
// For operators who want reminders now, and for the tests that run two processes at once.
import { loadConfig } from '../config';
import { acquireDatabase } from '../db/sequelize';
import { sweepDigests } from '../services/digest';
import { createMailer } from '../services/mail/mailer';
import { createPushSender } from '../services/push/push-sender';
import { sweepReminders } from '../services/reminders';

const at = process.argv.indexOf('--at');
const now = at === -1 ? new Date() : new Date(process.argv[at + 1]);
if (Number.isNaN(now.getTime())) throw new Error('--at needs an ISO date and time, such as 2026-05-01T12:00:00Z');

const config = loadConfig();
const database = acquireDatabase(config.databaseUrl, 3);
const ctx = { config, sequelize: database.sequelize, mailer: createMailer(config), push: createPushSender(config) };
try {
  const reminders = await sweepReminders(ctx, now);
  const digests = await sweepDigests(ctx, now);
  process.stdout.write(`${JSON.stringify({ reminders: reminders.claimed, digests: digests.sent })}\n`);
} finally {
  ctx.mailer.close();
  await database.release();
}
