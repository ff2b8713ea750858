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
  // The seal checks' unique index holds only their own rows (migration 0190), so the conflict names its predicate.
  const arbiter = jarReminder
    ? '(jar_id, kind, user_id)'
    : '(processing_id, kind, user_id) WHERE processing_id IS NOT NULL';
  const rows = await ctx.sequelize.query<{ id: string }>(
    `INSERT INTO reminder_deliveries (id, household_id, ${subject}, user_id, kind, use_by, claimed_at, attempts, created_at, updated_at)
     VALUES (:id, :householdId, :subject, :userId, :kind, :useBy, :now, 1, :now, :now)
     ON CONFLICT ${arbiter} DO UPDATE SET claimed_at = :now, attempts = reminder_deliveries.attempts + 1, updated_at = :now
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

/** A use-by reminder this sweep claimed and has something to send for: a push device, or an e-mail to write. */
interface Claimed {
  deliveryId: string;
  kind: 'soon' | 'today';
  jarId: string;
  code: string;
  useBy: string;
  householdName: string;
  timeZone: string;
  productName: string;
  userId: string;
  email: string;
  emailReminders: boolean | null;
  reminderHour: number | null;
  daysBefore: number | null;
}

/**
 * The use-by sweep is split into this many ranges of household ids; each is claimed in one transaction holding an
 * advisory lock on its range, so two processes sweeping at once share the work instead of both doing all of it.
 * Ids are random UUIDs, so the ranges hold about as many households each; a range's opened jars are read on the
 * partial index jars_opened_household_use_by (migration 0180).
 */
const USE_BY_PARTS = 16; // one hex digit of the id each
/** The household ids of one range: from the first id starting with the part's hex digit, to the next part's. */
function partRange(part: number) {
  const start = (digit: number) => `${digit.toString(16)}0000000-0000-0000-0000-000000000000`;
  return { lowest: start(part), above: part + 1 < USE_BY_PARTS ? start(part + 1) : null };
}
/** The first key of the parts' advisory locks ("LR" for Larderly reminders). */
const USE_BY_LOCK = 0x4c52;
/** Reminders sent at once: pushes and e-mails go out in parallel, up to this many. */
const SEND_CONCURRENCY = 16;

/**
 * Claims every use-by reminder due now in one part of the households, in one statement: opened jars near their
 * use-by, each with every member whose reminder hour (in the household's time zone) has come and whose "days
 * before" reaches the jar (the rule of dueReminder(), in SQL). A new claim, or one whose sends never finished and
 * went stale, as claim() does. A reminder with nothing to send (no push device, no e-mail for that person) is
 * recorded sent in the same statement; the others come back to be sent.
 */
async function claimUseByPart(ctx: Notifiers, now: Date, part: number) {
  const utcToday = now.toISOString().slice(0, 10);
  // Raw SQL: a set-based claim, where a query per household, member and jar took minutes for 100,000 jars.
  const [row] = await ctx.sequelize.query<{ claimed: number; toSend: Claimed[] }>(
    `WITH homes AS MATERIALIZED (
         -- Each household: its today and hour, worked out once (not per jar and member; MATERIALIZED keeps the planner
         -- from folding these time-zone conversions back into the joins below, where they ran for every row).
         SELECT h.id, (t.local)::date AS today, extract(hour FROM t.local)::int AS hour
           FROM households h, LATERAL (SELECT :now::timestamptz AT TIME ZONE h.time_zone AS local) t
          WHERE h.id >= :lowest::uuid AND (:above::uuid IS NULL OR h.id < :above::uuid)
       ), members AS (
         -- The members whose reminder hour has come, with how many days before the use-by they want reminding.
         SELECT hm.id AS household_id, hm.today, m.user_id, np.email_reminders,
                COALESCE(np.days_before, :defaultDaysBefore) AS days_before
           FROM homes hm
           JOIN memberships m ON m.household_id = hm.id
           LEFT JOIN notification_preferences np ON np.user_id = m.user_id
          WHERE hm.hour >= COALESCE(np.reminder_hour, :defaultHour) AND hm.hour < COALESCE(np.reminder_hour, :defaultHour) + :catchUpHours
       ), due AS (
         -- The opened jars of their households whose use-by is from today to that many days ahead (read on the partial
         -- index jars_opened_household_use_by; the fixed window around the UTC date narrows the index range).
         SELECT j.id AS jar_id, j.use_by, mb.household_id, mb.user_id,
                CASE WHEN j.use_by = mb.today THEN 'today' ELSE 'soon' END AS kind,
                NOT EXISTS (SELECT 1 FROM push_subscriptions ps WHERE ps.user_id = mb.user_id)
                  AND NOT (:mailEnabled AND COALESCE(mb.email_reminders, :defaultEmail)) AS nothing_to_send
           FROM members mb
           JOIN jars j ON j.household_id = mb.household_id AND j.state = 'opened'
            AND j.use_by BETWEEN :from AND :to
            AND j.use_by BETWEEN mb.today AND mb.today + mb.days_before
       ), claimed AS (
         INSERT INTO reminder_deliveries (id, household_id, jar_id, user_id, kind, use_by, claimed_at, attempts,
                                          pushes_sent, email_sent, sent_at, created_at, updated_at)
         SELECT gen_random_uuid(), household_id, jar_id, user_id, kind, use_by, :now, 1,
                0, false, CASE WHEN nothing_to_send THEN :now::timestamptz END, :now, :now
           FROM due
         -- Sent, given up on, or claimed by a sweep still within its time: the conflict leaves it be. No NOT EXISTS
         -- before it: with the table's statistics out of date (a first sweep) the planner may scan the whole table
         -- for every row, while the arbiter index is always used.
         ON CONFLICT (jar_id, kind, user_id) DO UPDATE
           SET claimed_at = EXCLUDED.claimed_at, attempts = reminder_deliveries.attempts + 1, updated_at = EXCLUDED.updated_at,
               sent_at = EXCLUDED.sent_at, pushes_sent = 0, email_sent = false, problem = NULL
           WHERE reminder_deliveries.sent_at IS NULL
             AND reminder_deliveries.claimed_at < :now::timestamptz - make_interval(mins => :staleMinutes)
             AND reminder_deliveries.attempts < :maxAttempts
         RETURNING id, household_id, jar_id, user_id, kind, use_by, sent_at
       )
       -- One row: how many were claimed, and those with something to send, with what their messages need.
       SELECT (SELECT count(*) FROM claimed)::int AS claimed,
              COALESCE((
                SELECT json_agg(json_build_object(
                         'deliveryId', c.id, 'kind', c.kind, 'jarId', c.jar_id, 'code', j.code, 'useBy', c.use_by,
                         'householdName', h.name, 'timeZone', h.time_zone, 'productName', p.name,
                         'userId', c.user_id, 'email', u.email, 'emailReminders', np.email_reminders,
                         'reminderHour', np.reminder_hour, 'daysBefore', np.days_before))
                  -- By primary keys, not a join back to the rows above: only the claims with something to send.
                  FROM claimed c
                  JOIN jars j ON j.id = c.jar_id
                  JOIN households h ON h.id = c.household_id
                  JOIN products p ON p.id = j.product_id
                  JOIN users u ON u.id = c.user_id
                  LEFT JOIN notification_preferences np ON np.user_id = c.user_id
                 WHERE c.sent_at IS NULL), '[]') AS "toSend"`,
    {
      replacements: {
        now,
        from: addDays(utcToday, -1),
        to: addDays(utcToday, 16),
        ...partRange(part),
        mailEnabled: ctx.mailer.enabled,
        defaultEmail: DEFAULT_PREFERENCES.emailReminders,
        defaultDaysBefore: DEFAULT_PREFERENCES.daysBefore,
        defaultHour: DEFAULT_PREFERENCES.reminderHour,
        catchUpHours: CATCH_UP_HOURS,
        maxAttempts: MAX_ATTEMPTS,
        staleMinutes: STALE_CLAIM_MINUTES,
      },
      type: QueryTypes.SELECT,
    },
  );
  return row!;
}

/** Runs `work` over `items`, at most `limit` at a time; the first failure stops the rest and is thrown. */
async function eachAtMost<T>(items: T[], limit: number, work: (item: T) => Promise<void>) {
  let next = 0;
  let failed = false;
  const worker = async () => {
    while (!failed && next < items.length) {
      const item = items[next++]!;
      try {
        await work(item);
      } catch (error) {
        failed = true;
        throw error;
      }
    }
  };
  await Promise.all(Array.from({ length: Math.min(limit, items.length) }, worker));
}

/** Sends the use-by reminders one part's claim returned, up to SEND_CONCURRENCY at a time. */
async function sendUseBy(ctx: Notifiers, now: Date, claimed: Claimed[], hooks: SweepHooks) {
  if (claimed.length === 0) return;
  const subscriptions = new Map<string, PushSubscription[]>();
  for (const device of await subscriptionsOf([...new Set(claimed.map((r) => r.userId))])) {
    subscriptions.set(device.userId, [...(subscriptions.get(device.userId) ?? []), device]);
  }
  const zones = new Map<string, string>();
  await eachAtMost(claimed, SEND_CONCURRENCY, async (row) => {
    await hooks.afterClaim?.(row.deliveryId);
    let today = zones.get(row.timeZone);
    if (!today) zones.set(row.timeZone, (today = todayIn(row.timeZone, now)));
    const prefs: Preferences = {
      ...DEFAULT_PREFERENCES,
      ...(row.emailReminders === null ? {} : { emailReminders: row.emailReminders }),
      ...(row.reminderHour === null ? {} : { reminderHour: row.reminderHour }),
      ...(row.daysBefore === null ? {} : { daysBefore: row.daysBefore }),
    };
    await deliver(
      ctx,
      now,
      row.deliveryId,
      { userId: row.userId, email: row.email, prefs, subscriptions: subscriptions.get(row.userId) ?? [] },
      row.householdName,
      useByMessage({ id: row.jarId, code: row.code }, row.productName, row.kind, daysBetween(today, row.useBy)),
    );
  });
}

/**
 * One pass of the reminder schedule: every opened jar whose use-by is near, in each household's
 * time zone, for each member whose reminder hour has come. Safe to run often and in parallel:
 * the claims in reminder_deliveries make each reminder go out once, whichever process wins it.
 */
export async function sweepReminders(ctx: Notifiers, now = clock.now(), hooks: SweepHooks = {}) {
  let claimed = 0;
  // Each process starts at its own part, so two sweeps started together rarely meet at a lock.
  const first = Math.floor(Math.random() * USE_BY_PARTS);
  // The parts this sweep takes stay locked (in a transaction that only holds the locks) until it is done, so
  // another sweep running at the same time skips them, both the ones in progress and the ones already swept;
  // each part's claims commit on their own, before their sends. A process that dies lets its locks go.
  await ctx.sequelize.transaction(async (locks) => {
    for (let i = 0; i < USE_BY_PARTS; i += 1) {
      const part = (first + i) % USE_BY_PARTS;
      const [lock] = await ctx.sequelize.query<{ held: boolean }>(
        'SELECT pg_try_advisory_xact_lock(:key, :part) AS held',
        { replacements: { key: USE_BY_LOCK, part }, type: QueryTypes.SELECT, transaction: locks },
      );
      // Another sweep holds this part: it claims (and sends) all of it.
      if (!lock.held) continue;
      const done = await claimUseByPart(ctx, now, part);
      claimed += done.claimed;
      await sendUseBy(ctx, now, done.toSend, hooks);
    }
  });
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
