import { randomUUID } from 'node:crypto';
import { Op, QueryTypes } from 'sequelize';
import {
  addDays,
  daysBetween,
  mayReprocess,
  reprocessUntil,
  SEAL_CHECK_AFTER_HOURS,
  sealCheckFrom,
} from '../../shared/domain';
import {
  CANNING_CAUTION_SENTENCE,
  clockWords,
  sealCheckMessage,
  sealCheckTitle,
  USE_BY_CAUTION_SENTENCE,
} from '../../shared/words';
import type { AppContext } from '../context';
import { Batch, BatchProcessing, Household, Jar, Membership, Product, ReminderDelivery, User } from '../db/models';
import type { ReminderKind } from '../db/models/reminder-delivery';
import { reminderMail, reminderWords, type ReminderWords } from './mail/reminder-mail';
import { clock, hourIn, todayIn } from './clock';
import { preferencesOf, withinReminderHours, type Preferences } from './notification-preferences';
import { subscriptionsOf } from './push/subscriptions';
import { paths } from '../../shared/paths';

type Notifiers = Pick<AppContext, 'config' | 'sequelize' | 'mailer' | 'push'>;

/** Which reminder, if any, a person is due for a jar at this hour of the household's day. */
export function dueReminder(daysLeft: number, hour: number, prefs: Preferences): 'soon' | 'today' | null {
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
async function claim(
  ctx: Notifiers,
  now: Date,
  values: { householdId: string; userId: string; kind: ReminderKind } & (
    { jarId: string; useBy: string } | { processingId: string }
  ),
) {
  const jarReminder = 'jarId' in values;
  // A use-by reminder is one per jar, kind and person; a seal check one per processing and person.
  const subject = jarReminder ? 'jar_id' : 'processing_id';
  const rows = await ctx.sequelize.query<{ id: string }>(
    `INSERT INTO reminder_deliveries (id, household_id, ${subject}, user_id, kind, use_by, claimed_at, attempts, created_at, updated_at)
     VALUES (:id, :householdId, :subject, :userId, :kind, :useBy, :now, 1, :now, :now)
     ON CONFLICT (${subject}, kind, user_id) DO UPDATE SET claimed_at = :now, attempts = reminder_deliveries.attempts + 1, updated_at = :now
       WHERE reminder_deliveries.sent_at IS NULL
         AND reminder_deliveries.claimed_at < :now::timestamptz - make_interval(mins => :staleMinutes)
         AND reminder_deliveries.attempts < :maxAttempts
     RETURNING id`,
    {
      replacements: {
        id: randomUUID(),
        now,
        staleMinutes: STALE_CLAIM_MINUTES,
        maxAttempts: MAX_ATTEMPTS,
        householdId: values.householdId,
        userId: values.userId,
        kind: values.kind,
        subject: jarReminder ? values.jarId : values.processingId,
        useBy: jarReminder ? values.useBy : null,
      },
      type: QueryTypes.SELECT,
    },
  );
  return rows.length === 1 ? rows[0].id : null;
}

interface Message {
  words: ReminderWords;
  path: string;
  tag: string;
  button: string;
  caution: string;
}

async function deliver(
  ctx: Notifiers,
  now: Date,
  deliveryId: string,
  to: { user: User; prefs: Preferences },
  household: Household,
  message: Message,
) {
  const { words, path, tag } = message;
  let pushesSent = 0;
  const problems: string[] = [];
  for (const subscription of await subscriptionsOf([to.user.id])) {
    // The delivery's id as the push topic: a retried send replaces the first at the push service instead of adding a second.
    const outcome = await ctx.push.send(
      subscription,
      { ...words, url: path, tag },
      { topic: deliveryId.replaceAll('-', '') },
    );
    if (outcome === 'sent') pushesSent += 1;
    else problems.push(`push ${outcome}`);
  }
  let emailSent = false;
  if (to.prefs.emailReminders && ctx.mailer.enabled) {
    try {
      // One Message-ID per delivery: a retried send is the same message to the mail server and the reader's mail program.
      const mail = reminderMail({
        to: to.user.email,
        words,
        householdName: household.name,
        link: `${ctx.config.publicOrigin}${path}`,
        button: message.button,
        caution: message.caution,
      });
      await ctx.mailer.send({ ...mail, messageId: `<reminder-${deliveryId}@larderly.invalid>` });
      emailSent = true;
    } catch (error) {
      problems.push(`e-mail: ${(error as Error).message}`);
    }
  }
  await ReminderDelivery.update(
    { pushesSent, emailSent, problem: problems.join('; ') || null, sentAt: now },
    { where: { id: deliveryId } },
  );
}

function useByMessage(jar: Jar, product: Product, kind: 'soon' | 'today', daysLeft: number): Message {
  return {
    words: reminderWords(kind, product.name, daysLeft, jar.code),
    path: paths.jar(jar.code),
    tag: `jar-${jar.id}-${kind}`,
    button: 'Open the jar',
    caution: USE_BY_CAUTION_SENTENCE,
  };
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
  const jars = await Jar.findAll({
    where: { state: 'opened', useBy: { [Op.between]: [addDays(utcToday, -1), addDays(utcToday, 16)] } },
  });
  let claimed = 0;
  const householdIds = [...new Set(jars.map((j) => j.householdId))];
  for (const household of await Household.findAll({ where: { id: householdIds } })) {
    const today = todayIn(household.timeZone, now);
    const hour = hourIn(household.timeZone, now);
    const memberships = await Membership.findAll({
      where: { householdId: household.id },
      include: [{ model: User, as: 'user', required: true }],
    });
    const prefs = await preferencesOf(memberships.map((m) => m.userId));
    const products = new Map((await Product.findAll({ where: { householdId: household.id } })).map((p) => [p.id, p]));
    for (const jar of jars.filter((j) => j.householdId === household.id)) {
      const daysLeft = daysBetween(today, jar.useBy!);
      for (const membership of memberships) {
        const mine = prefs.get(membership.userId)!;
        const kind = dueReminder(daysLeft, hour, mine);
        if (!kind) continue;
        const deliveryId = await claim(ctx, now, {
          householdId: household.id,
          jarId: jar.id,
          userId: membership.userId,
          kind,
          useBy: jar.useBy!,
        });
        if (!deliveryId) continue;
        claimed += 1;
        await hooks.afterClaim?.(deliveryId);
        await deliver(
          ctx,
          now,
          deliveryId,
          { user: membership.user!, prefs: mine },
          household,
          useByMessage(jar, products.get(jar.productId)!, kind, daysLeft),
        );
      }
    }
  }
  const seals = await sweepSealChecks(ctx, now, hooks);
  return { claimed: claimed + seals };
}

/**
 * Is the seal check due for this person? From 12 hours after processing, and not before their reminder hour
 * on the day those 12 hours end (a later day, or a later hour that day, is past it).
 */
export function sealCheckDue(processedAt: Date, now: Date, timeZone: string, reminderHour: number): boolean {
  const from = sealCheckFrom(processedAt);
  if (now < from) return false;
  return todayIn(timeZone, now) > todayIn(timeZone, from) || hourIn(timeZone, now) >= reminderHour;
}

/** The seal-check reminder: once per processing, to the person who recorded it, while jars of it are still to check. */
async function sweepSealChecks(ctx: Notifiers, now: Date, hooks: SweepHooks) {
  // A week back is plenty: a check is offered until it is done, the reminder only once.
  const processings = await BatchProcessing.findAll({
    where: {
      processedAt: {
        [Op.between]: [
          new Date(now.getTime() - 7 * 86_400_000),
          new Date(now.getTime() - SEAL_CHECK_AFTER_HOURS * 3_600_000),
        ],
      },
      createdBy: { [Op.ne]: null },
    },
  });
  let claimed = 0;
  for (const processing of processings) {
    const jarsLeft = await Jar.count({ where: { processingId: processing.id, state: 'sealed', seal: 'to-check' } });
    if (jarsLeft === 0) continue;
    const membership = await Membership.findOne({
      where: { householdId: processing.householdId, userId: processing.createdBy! },
      include: [
        { model: User, as: 'user', required: true },
        { model: Household, as: 'household', required: true },
      ],
    });
    if (!membership) continue;
    const household = membership.household!;
    const prefs = (await preferencesOf([membership.userId])).get(membership.userId)!;
    if (!sealCheckDue(processing.processedAt, now, household.timeZone, prefs.reminderHour)) continue;
    const deliveryId = await claim(ctx, now, {
      householdId: household.id,
      processingId: processing.id,
      userId: membership.userId,
      kind: 'seal-check',
    });
    if (!deliveryId) continue;
    claimed += 1;
    await hooks.afterClaim?.(deliveryId);
    const batch = await Batch.findByPk(processing.batchId, {
      include: [{ model: Product, as: 'product', required: true }],
    });
    const first = await BatchProcessing.findOne({ where: { batchId: processing.batchId, number: 1 } });
    const reprocessBy =
      first && mayReprocess(first.processedAt, now, processing.number)
        ? clockWords(reprocessUntil(first.processedAt), household.timeZone)
        : null;
    const productName = (batch as Batch & { product: Product }).product.name;
    await deliver(ctx, now, deliveryId, { user: membership.user!, prefs }, household, {
      words: { title: sealCheckTitle(productName), body: sealCheckMessage(productName, jarsLeft, reprocessBy) },
      path: paths.batch(household.id, processing.batchId),
      tag: `seal-check-${processing.id}`,
      button: 'Check the seals',
      caution: CANNING_CAUTION_SENTENCE,
    });
  }
  return claimed;
}
