import { randomUUID } from 'node:crypto';
import { Op, QueryTypes } from 'sequelize';
import { addDays, daysBetween } from '../../shared/domain';
import type { AppContext } from '../context';
import { Household, Jar, Membership, Product, ReminderDelivery, User } from '../db/models';
import type { ReminderKind } from '../db/models/reminder-delivery';
import { reminderMail, reminderWords } from './mail/reminder-mail';
import { clock, hourIn, todayIn } from './clock';
import { preferencesOf, withinReminderHours, type Preferences } from './notification-preferences';
import { subscriptionsOf } from './push/subscriptions';

type Notifiers = Pick<AppContext, 'config' | 'sequelize' | 'mailer' | 'push'>;

/** Which reminder, if any, a person is due for a jar at this hour of the household's day. */
export function dueReminder(daysLeft: number, hour: number, prefs: Preferences): ReminderKind | null {
  if (!withinReminderHours(hour, prefs.reminderHour)) return null;
  if (daysLeft === 0) return 'today';
  if (daysLeft >= 1 && daysLeft <= prefs.daysBefore) return 'soon';
  return null;
}

/** A claim whose sends did not finish in this long (its process died) is taken again by a later sweep. */
export const STALE_CLAIM_MINUTES = 5;
/** Tries per reminder before it is left with its problem recorded. */
export const MAX_ATTEMPTS = 5;

/**
 * Claims the reminder in the database: a new claim, or one whose sends never finished and whose
 * claim went stale. Null when another run (or process) holds it or it has been sent.
 */
async function claim(ctx: Notifiers, now: Date, values: { householdId: string; jarId: string; userId: string; kind: ReminderKind; useBy: string }) {
  const rows = await ctx.sequelize.query<{ id: string }>(
    `INSERT INTO reminder_deliveries (id, household_id, jar_id, user_id, kind, use_by, claimed_at, attempts, created_at, updated_at)
     VALUES (:id, :householdId, :jarId, :userId, :kind, :useBy, :now, 1, :now, :now)
     ON CONFLICT (jar_id, kind, user_id) DO UPDATE SET claimed_at = :now, attempts = reminder_deliveries.attempts + 1, updated_at = :now
       WHERE reminder_deliveries.sent_at IS NULL
         AND reminder_deliveries.claimed_at < :now::timestamptz - make_interval(mins => :staleMinutes)
         AND reminder_deliveries.attempts < :maxAttempts
     RETURNING id`,
    { replacements: { id: randomUUID(), now, staleMinutes: STALE_CLAIM_MINUTES, maxAttempts: MAX_ATTEMPTS, ...values }, type: QueryTypes.SELECT },
  );
  return rows.length === 1 ? rows[0].id : null;
}

async function deliver(ctx: Notifiers, now: Date, deliveryId: string, to: { user: User; prefs: Preferences }, jar: Jar, product: Product, household: Household, kind: ReminderKind, daysLeft: number) {
  const words = reminderWords(kind, product.name, daysLeft, jar.code);
  const path = `/j/${jar.code}`;
  let pushesSent = 0;
  const problems: string[] = [];
  for (const subscription of await subscriptionsOf([to.user.id])) {
    // The delivery's id as the push topic: a retried send replaces the first at the push service instead of adding a second.
    const outcome = await ctx.push.send(subscription, { ...words, url: path, tag: `jar-${jar.id}-${kind}` }, { topic: deliveryId.replaceAll('-', '') });
    if (outcome === 'sent') pushesSent += 1;
    else problems.push(`push ${outcome}`);
  }
  let emailSent = false;
  if (to.prefs.emailReminders && ctx.mailer.enabled) {
    try {
      // One Message-ID per delivery: a retried send is the same message to the mail server and the reader's mail program.
      await ctx.mailer.send({ ...reminderMail({ to: to.user.email, words, householdName: household.name, link: `${ctx.config.publicOrigin}${path}` }), messageId: `<reminder-${deliveryId}@larderly.invalid>` });
      emailSent = true;
    } catch (error) {
      problems.push(`e-mail: ${(error as Error).message}`);
    }
  }
  await ReminderDelivery.update({ pushesSent, emailSent, problem: problems.join('; ') || null, sentAt: now }, { where: { id: deliveryId } });
}

/** For tests: runs between a claim and its sends, where a crash would leave the claim unsent. */
export interface SweepHooks {
  afterClaim?: (deliveryId: string) => void | Promise<void>;
}

/**
 * One pass of the reminder schedule: every opened jar whose use-by is near, in each household's
 * time zone, for each member whose reminder hour has come. Safe to run often and in parallel.
 */
export async function sweepReminders(ctx: Notifiers, now = clock.now(), hooks: SweepHooks = {}) {
  const utcToday = now.toISOString().slice(0, 10);
  // Time zones are at most a day apart from UTC, so this window holds every jar due anywhere.
  const jars = await Jar.findAll({ where: { state: 'opened', useBy: { [Op.between]: [addDays(utcToday, -1), addDays(utcToday, 16)] } } });
  let claimed = 0;
  const householdIds = [...new Set(jars.map((j) => j.householdId))];
  for (const household of await Household.findAll({ where: { id: householdIds } })) {
    const today = todayIn(household.timeZone, now);
    const hour = hourIn(household.timeZone, now);
    const memberships = await Membership.findAll({ where: { householdId: household.id }, include: [{ model: User, as: 'user', required: true }] });
    const prefs = await preferencesOf(memberships.map((m) => m.userId));
    const products = new Map((await Product.findAll({ where: { householdId: household.id } })).map((p) => [p.id, p]));
    for (const jar of jars.filter((j) => j.householdId === household.id)) {
      const daysLeft = daysBetween(today, jar.useBy!);
      for (const membership of memberships) {
        const mine = prefs.get(membership.userId)!;
        const kind = dueReminder(daysLeft, hour, mine);
        if (!kind) continue;
        const deliveryId = await claim(ctx, now, { householdId: household.id, jarId: jar.id, userId: membership.userId, kind, useBy: jar.useBy! });
        if (!deliveryId) continue;
        claimed += 1;
        await hooks.afterClaim?.(deliveryId);
        await deliver(ctx, now, deliveryId, { user: membership.user!, prefs: mine }, jar, products.get(jar.productId)!, household, kind, daysLeft);
      }
    }
  }
  return { claimed };
}
