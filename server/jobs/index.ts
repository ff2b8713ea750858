import PgBoss from 'pg-boss';
import type { AppContext } from '../context';
import { forgetOldRequestKeys } from '../http/idempotency';
import { sweepDigests } from '../services/digest';
import { sweepReminders } from '../services/reminders';

const REMINDERS = 'reminder-sweep';
/**
 * A sweep whose worker died stays "active" until expired; expiry is checked at each maintenance
 * run. Together at most a minute before the next sweep may start. A slow live sweep that is
 * expired too does no harm: the claims in reminder_deliveries keep every reminder once.
 */
export const SWEEP_EXPIRE_SECONDS = 40;
export const MAINTENANCE_INTERVAL_SECONDS = 20;
const DIGESTS = 'digest-sweep';

/**
 * The job runner: pg-boss queues in PostgreSQL, with schedules every few minutes. The singleton
 * policy lets one sweep run at a time across every app process; the delivery tables' unique
 * keys make each reminder and digest go out once even so.
 */
export async function startJobs(ctx: AppContext) {
  const boss = new PgBoss({
    connectionString: ctx.config.databaseUrl,
    schema: 'pgboss',
    max: 3,
    application_name: 'larderly-jobs',
    maintenanceIntervalSeconds: MAINTENANCE_INTERVAL_SECONDS,
  });
  boss.on('error', (error) =>
    ctx.log ? ctx.log.warn({ err: error }, 'job runner error') : console.warn(`larderly jobs: ${error.message}`),
  );
  await boss.start();
  // Processes starting together would deadlock creating the same queues; an advisory lock takes turns.
  await ctx.sequelize.transaction(async (transaction) => {
    await ctx.sequelize.query("SELECT pg_advisory_xact_lock(hashtext('larderly-job-queues'))", { transaction });
    for (const name of [REMINDERS, DIGESTS]) {
      const settings = { name, policy: 'singleton' as const, expireInSeconds: SWEEP_EXPIRE_SECONDS, retryLimit: 2 };
      // Queues made by an earlier version keep their old expiry unless updated.
      if (await boss.getQueue(name)) await boss.updateQueue(name, settings);
      else await boss.createQueue(name, settings);
    }
  });
  await boss.schedule(REMINDERS, '*/5 * * * *');
  await boss.schedule(DIGESTS, '2,32 * * * *');
  await boss.work(REMINDERS, async () => {
    const { claimed } = await sweepReminders(ctx);
    ctx.log?.info({ job: REMINDERS, claimed }, 'reminder sweep done');
  });
  await boss.work(DIGESTS, async () => {
    const { sent } = await sweepDigests(ctx);
    await forgetOldRequestKeys(ctx.sequelize);
    ctx.log?.info({ job: DIGESTS, sent }, 'digest sweep done');
  });
  return {
    /** queue a reminder sweep now instead of waiting for the schedule */
    sweepNow: () => boss.send(REMINDERS, {}),
    stop: () => boss.stop({ graceful: true, timeout: 5_000 }),
  };
}
