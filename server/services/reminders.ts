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
import {
  Batch,
  BatchProcessing,
  Household,
  Jar,
  Membership,
  Product,
  PushSubscription,
  ReminderDelivery,
  User,
} from '../db/models';
import type { ReminderKind } from '../db/models/reminder-delivery';
import { reminderMail, reminderWords, type ReminderWords } from './mail/reminder-mail';
import { clock, hourIn, todayIn } from './clock';
import {
  CATCH_UP_HOURS,
  DEFAULT_PREFERENCES,
  preferencesOf,
  withinReminderHours,
  type Preferences,
} from './notification-preferences';
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
  to: { userId: string; email: string; prefs: Preferences; subscriptions?: PushSubscription[] },
  householdName: string,
  message: Message,
) {
  const { words, path, tag } = message;
  let pushesSent = 0;
  const problems: string[] = [];
  for (const subscription of to.subscriptions ?? (await subscriptionsOf([to.userId]))) {
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
        to: to.email,
        words,
        householdName,
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

function useByMessage(
  jar: { id: string; code: string },
  productName: string,
  kind: 'soon' | 'today',
  daysLeft: number,
): Message {
  return {
    words: reminderWords(kind, productName, daysLeft, jar.code),
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

/** One opened jar near its use-by and one member of its household, with that member's settings (null: defaults). */
interface Candidate {
  jarId: string;
  code: string;
  useBy: string;
  householdId: string;
  householdName: string;
  timeZone: string;
  productName: string;
  userId: string;
  email: string;
  emailReminders: boolean | null;
  reminderHour: number | null;
  daysBefore: number | null;
}

/** Claims are written this many at a time: one INSERT ... SELECT FROM unnest(...) each. */
const CLAIM_CHUNK = 2_000;

/**
 * The candidates for a use-by reminder now, found in one query: opened jars near their use-by, each with every
 * member whose reminder hour (in the household's time zone) has come and whose "days before" reaches the jar.
 * The SQL only narrows the rows; dueReminder() below is the rule. Reminders already sent, given up on, or
 * claimed by a sweep still within its time are left out here, as the claim would refuse them.
 */
async function useByCandidates(ctx: Notifiers, now: Date) {
  const utcToday = now.toISOString().slice(0, 10);
  // Raw SQL: one set-based read instead of a query per household, member and jar (the sweep bench's 100,000 jars).
  return ctx.sequelize.query<Candidate>(
    `WITH local AS (
       SELECT j.id, j.code, j.use_by, j.household_id, j.product_id, h.name, h.time_zone,
              (:now::timestamptz AT TIME ZONE h.time_zone)::date AS today,
              extract(hour FROM :now::timestamptz AT TIME ZONE h.time_zone)::int AS hour
         FROM jars j JOIN households h ON h.id = j.household_id
        WHERE j.state = 'opened' AND j.use_by BETWEEN :from AND :to
     )
     SELECT l.id AS "jarId", l.code, l.use_by AS "useBy", l.household_id AS "householdId", l.name AS "householdName",
            l.time_zone AS "timeZone", p.name AS "productName", m.user_id AS "userId", u.email,
            np.email_reminders AS "emailReminders", np.reminder_hour AS "reminderHour", np.days_before AS "daysBefore"
       FROM local l
       JOIN products p ON p.id = l.product_id
       JOIN memberships m ON m.household_id = l.household_id
       JOIN users u ON u.id = m.user_id
       LEFT JOIN notification_preferences np ON np.user_id = m.user_id
      WHERE l.use_by - l.today BETWEEN 0 AND COALESCE(np.days_before, :defaultDaysBefore)
        AND l.hour >= COALESCE(np.reminder_hour, :defaultHour) AND l.hour < COALESCE(np.reminder_hour, :defaultHour) + :catchUpHours
        AND NOT EXISTS (
              SELECT 1 FROM reminder_deliveries d
               WHERE d.jar_id = l.id AND d.user_id = m.user_id
                 AND d.kind = CASE WHEN l.use_by = l.today THEN 'today' ELSE 'soon' END
                 AND (d.sent_at IS NOT NULL OR d.attempts >= :maxAttempts
                      OR d.claimed_at >= :now::timestamptz - make_interval(mins => :staleMinutes)))
      ORDER BY l.household_id, l.id, m.user_id`,
    {
      replacements: {
        now,
        from: addDays(utcToday, -1),
        to: addDays(utcToday, 16),
        defaultDaysBefore: DEFAULT_PREFERENCES.daysBefore,
        defaultHour: DEFAULT_PREFERENCES.reminderHour,
        catchUpHours: CATCH_UP_HOURS,
        maxAttempts: MAX_ATTEMPTS,
        staleMinutes: STALE_CLAIM_MINUTES,
      },
      type: QueryTypes.SELECT,
    },
  );
}

/**
 * Claims many use-by reminders in one statement, with the same rule as claim(): a new claim, or one whose sends
 * never finished and went stale. Returns the claims won, by "jarId userId kind".
 */
async function claimMany(ctx: Notifiers, now: Date, rows: { candidate: Candidate; kind: 'soon' | 'today' }[]) {
  const claimed = await ctx.sequelize.query<{ id: string; jar_id: string; user_id: string; kind: string }>(
    `INSERT INTO reminder_deliveries (id, household_id, jar_id, user_id, kind, use_by, claimed_at, attempts, created_at, updated_at)
     SELECT gen_random_uuid(), c.household_id, c.jar_id, c.user_id, c.kind, c.use_by, $1, 1, $1, $1
       FROM unnest($2::uuid[], $3::uuid[], $4::uuid[], $5::text[], $6::date[]) AS c(household_id, jar_id, user_id, kind, use_by)
     ON CONFLICT (jar_id, kind, user_id) DO UPDATE SET claimed_at = $1, attempts = reminder_deliveries.attempts + 1, updated_at = $1
       WHERE reminder_deliveries.sent_at IS NULL
         AND reminder_deliveries.claimed_at < $1::timestamptz - make_interval(mins => $7)
         AND reminder_deliveries.attempts < $8
     RETURNING id, jar_id, user_id, kind`,
    {
      bind: [
        now,
        rows.map((r) => r.candidate.householdId),
        rows.map((r) => r.candidate.jarId),
        rows.map((r) => r.candidate.userId),
        rows.map((r) => r.kind),
        rows.map((r) => r.candidate.useBy),
        STALE_CLAIM_MINUTES,
        MAX_ATTEMPTS,
      ],
      type: QueryTypes.SELECT,
    },
  );
  return new Map(claimed.map((c) => [`${c.jar_id} ${c.user_id} ${c.kind}`, c.id]));
}

/** Marks many claims done at once: those with nothing to send (no push device, no e-mail for that person). */
async function markSentWithNothingToSend(ctx: Notifiers, now: Date, ids: string[]) {
  if (ids.length === 0) return;
  await ctx.sequelize.query(
    `UPDATE reminder_deliveries SET pushes_sent = 0, email_sent = false, problem = NULL, sent_at = $1, updated_at = $1
      WHERE id = ANY($2::uuid[])`,
    { bind: [now, ids] },
  );
}

/**
 * One pass of the reminder schedule: every opened jar whose use-by is near, in each household's
 * time zone, for each member whose reminder hour has come. Safe to run often and in parallel:
 * the claims in reminder_deliveries make each reminder go out once, whichever process wins it.
 */
export async function sweepReminders(ctx: Notifiers, now = clock.now(), hooks: SweepHooks = {}) {
  const due: { candidate: Candidate; kind: 'soon' | 'today'; daysLeft: number; prefs: Preferences }[] = [];
  const zones = new Map<string, { today: string; hour: number }>();
  for (const candidate of await useByCandidates(ctx, now)) {
    let zone = zones.get(candidate.timeZone);
    if (!zone)
      zones.set(
        candidate.timeZone,
        (zone = { today: todayIn(candidate.timeZone, now), hour: hourIn(candidate.timeZone, now) }),
      );
    const prefs: Preferences = {
      ...DEFAULT_PREFERENCES,
      ...(candidate.emailReminders === null ? {} : { emailReminders: candidate.emailReminders }),
      ...(candidate.reminderHour === null ? {} : { reminderHour: candidate.reminderHour }),
      ...(candidate.daysBefore === null ? {} : { daysBefore: candidate.daysBefore }),
    };
    const daysLeft = daysBetween(zone.today, candidate.useBy);
    const kind = dueReminder(daysLeft, zone.hour, prefs);
    if (kind) due.push({ candidate, kind, daysLeft, prefs });
  }

  let claimed = 0;
  for (let at = 0; at < due.length; at += CLAIM_CHUNK) {
    const chunk = due.slice(at, at + CLAIM_CHUNK);
    const won = await claimMany(ctx, now, chunk);
    if (won.size === 0) continue;
    claimed += won.size;
    const mine = chunk.flatMap((row) => {
      const deliveryId = won.get(`${row.candidate.jarId} ${row.candidate.userId} ${row.kind}`);
      return deliveryId ? [{ ...row, deliveryId }] : [];
    });
    const subscriptions = new Map<string, PushSubscription[]>();
    for (const device of await subscriptionsOf([...new Set(mine.map((r) => r.candidate.userId))])) {
      subscriptions.set(device.userId, [...(subscriptions.get(device.userId) ?? []), device]);
    }
    const nothingToSend: string[] = [];
    for (const row of mine) {
      await hooks.afterClaim?.(row.deliveryId);
      const devices = subscriptions.get(row.candidate.userId) ?? [];
      if (devices.length === 0 && !(row.prefs.emailReminders && ctx.mailer.enabled)) {
        nothingToSend.push(row.deliveryId);
        continue;
      }
      await deliver(
        ctx,
        now,
        row.deliveryId,
        { userId: row.candidate.userId, email: row.candidate.email, prefs: row.prefs, subscriptions: devices },
        row.candidate.householdName,
        useByMessage(
          { id: row.candidate.jarId, code: row.candidate.code },
          row.candidate.productName,
          row.kind,
          row.daysLeft,
        ),
      );
    }
    await markSentWithNothingToSend(ctx, now, nothingToSend);
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
    await deliver(
      ctx,
      now,
      deliveryId,
      { userId: membership.userId, email: membership.user!.email, prefs },
      household.name,
      {
        words: { title: sealCheckTitle(productName), body: sealCheckMessage(productName, jarsLeft, reprocessBy) },
        path: paths.batch(household.id, processing.batchId),
        tag: `seal-check-${processing.id}`,
        button: 'Check the seals',
        caution: CANNING_CAUTION_SENTENCE,
      },
    );
  }
  return claimed;
}
