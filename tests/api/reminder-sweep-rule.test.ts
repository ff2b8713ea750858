// The use-by sweep claims its reminders in SQL, many at a time. This checks that it claims exactly the reminders the
// rule in plain code (dueReminder, each household's today and hour from the runtime's time zones) says are due, on
// generated households: several time zones (one a half-hour zone), members with and without their own settings, jars
// whose use-by falls before, on and after the window, and claims already made (sent, fresh, stale, given up on).
// The households, people and preserves are our own invented test data.
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { addDays, daysBetween } from '../../shared/domain';
import {
  Batch,
  Household,
  Jar,
  Membership,
  NotificationPreference,
  Product,
  ReminderDelivery,
  User,
} from '../../server/db/models';
import { hourIn, todayIn } from '../../server/services/clock';
import { preferencesOf } from '../../server/services/notification-preferences';
import { dueReminder, MAX_ATTEMPTS, STALE_CLAIM_MINUTES, sweepReminders } from '../../server/services/reminders';
import { bareApp } from '../support/bare-app';

let built: ReturnType<typeof bareApp>;
beforeAll(() => {
  // No mail server: the whole suite's browser set-up puts its mail catcher in the environment, which would make
  // every claim one with an e-mail to send; this test checks the claims alone.
  built = bareApp({ SMTP_HOST: '' });
});
afterAll(async () => {
  await built.close();
});

const ZONES = ['America/Denver', 'Europe/London', 'Asia/Kolkata', 'Pacific/Auckland', 'UTC'];
const HOUSEHOLDS = 25;
/** A small deterministic generator, so a failure can be repeated. */
function numbers(seed: number) {
  let state = seed;
  return (below: number) => {
    state = (state * 1103515245 + 12345) % 2147483648;
    return state % below;
  };
}

async function generate(now: Date) {
  const pick = numbers(15);
  const utcToday = now.toISOString().slice(0, 10);
  for (let h = 0; h < HOUSEHOLDS; h += 1) {
    const household = await Household.create({ name: `Rule household ${h}`, timeZone: ZONES[h % ZONES.length]! });
    const people = await User.bulkCreate(
      Array.from({ length: 1 + pick(3) }, (_, k) => ({
        email: `rule-${h}-${k}@example.test`,
        name: `Rule member ${k}`,
        passwordHash: '',
      })),
    );
    await Membership.bulkCreate(
      people.map((p, k) => ({ householdId: household.id, userId: p.id, role: k === 0 ? 'keeper' : 'cook' })),
    );
    // Half the people keep the defaults (no row); the others their own hour, days before and e-mail choice.
    await NotificationPreference.bulkCreate(
      people
        .filter(() => pick(2) === 0)
        .map((p) => ({
          userId: p.id,
          emailReminders: pick(2) === 0,
          weeklyDigest: false,
          reminderHour: pick(24),
          daysBefore: 1 + pick(14),
        })),
    );
    const product = await Product.create({ householdId: household.id, name: `Rule relish ${h}`, kind: 'relish' });
    const batch = await Batch.create({
      householdId: household.id,
      productId: product.id,
      cannedOn: addDays(utcToday, -90),
      jarSize: 'half-pint',
      jarsFilled: 8,
      jarsSealed: 8,
      method: 'boiling-water',
      altitudeFt: 0,
    });
    const jars = await Jar.bulkCreate(
      Array.from({ length: 6 }, (_, j) => ({
        householdId: household.id,
        batchId: batch.id,
        productId: product.id,
        code: `R${String(h).padStart(3, '0')}${j}`,
        state: 'opened' as const,
        capacityTbsp: 16,
        remainingTbsp: 8,
        bestBy: addDays(utcToday, 200),
        openedOn: addDays(utcToday, -3),
        // From two days ago to 17 days ahead: before, inside and past every window.
        useBy: addDays(utcToday, pick(20) - 2),
      })),
    );
    // Claims made before: sent, fresh, stale, stale but given up on; the first jar and person of some households.
    const state = h % 5;
    if (state < 4) {
      const days = daysBetween(todayIn(household.timeZone, now), jars[0]!.useBy!);
      await ReminderDelivery.create({
        householdId: household.id,
        jarId: jars[0]!.id,
        userId: people[0]!.id,
        kind: days === 0 ? 'today' : 'soon',
        useBy: jars[0]!.useBy!,
        claimedAt: new Date(now.getTime() - (state === 1 ? 1 : STALE_CLAIM_MINUTES + 5) * 60_000),
        sentAt: state === 0 ? new Date(now.getTime() - 3_600_000) : null,
        attempts: state === 3 ? MAX_ATTEMPTS : 1,
      });
    }
  }
}

/** The reminders due at `now` by the rule in plain code, against the claims in the database. */
async function dueByTheRule(now: Date) {
  const jars = await Jar.findAll({ where: { state: 'opened' } });
  const households = new Map((await Household.findAll()).map((h) => [h.id, h]));
  const memberships = await Membership.findAll();
  const prefs = await preferencesOf(memberships.map((m) => m.userId));
  const claims = new Map(
    (await ReminderDelivery.findAll()).map((d) => [`${d.jarId} ${d.userId} ${d.kind}`, d] as const),
  );
  const due = new Set<string>();
  for (const jar of jars) {
    const zone = households.get(jar.householdId)!.timeZone;
    const daysLeft = daysBetween(todayIn(zone, now), jar.useBy!);
    for (const member of memberships.filter((m) => m.householdId === jar.householdId)) {
      const kind = dueReminder(daysLeft, hourIn(zone, now), prefs.get(member.userId)!);
      if (!kind) continue;
      const claim = claims.get(`${jar.id} ${member.userId} ${kind}`);
      const open =
        !claim ||
        (claim.sentAt === null &&
          claim.attempts < MAX_ATTEMPTS &&
          claim.claimedAt.getTime() < now.getTime() - STALE_CLAIM_MINUTES * 60_000);
      if (open) due.add(`${jar.id} ${member.userId} ${kind}`);
    }
  }
  return due;
}

describe('the use-by sweep in SQL', () => {
  it('claims exactly the reminders the rule in plain code says are due, at several hours of one day', async () => {
    const start = new Date();
    start.setUTCMinutes(10, 0, 0);
    // The demo household's jars still to check would add a seal-check reminder at some of these hours, depending on
    // the hour the suite runs; this test counts the use-by claims alone.
    await Jar.update({ seal: 'checked' }, { where: { seal: 'to-check' } });
    await generate(start);
    let claimedInAll = 0;
    for (const hoursLater of [0, 5, 9, 14, 20]) {
      const now = new Date(start.getTime() + hoursLater * 3_600_000);
      const expected = await dueByTheRule(now);
      const { claimed } = await sweepReminders(built.ctx, now);
      const made = await ReminderDelivery.findAll({ where: { claimedAt: now } });
      expect(new Set(made.map((d) => `${d.jarId} ${d.userId} ${d.kind}`))).toEqual(expected);
      expect(claimed).toBe(expected.size);
      // No push device and no mail server here: each is recorded sent, with nothing sent, in the claim itself.
      expect(made.every((d) => d.sentAt?.getTime() === now.getTime() && d.pushesSent === 0 && !d.emailSent)).toBe(true);
      claimedInAll += claimed;
      // The same instant again claims nothing.
      expect((await sweepReminders(built.ctx, now)).claimed).toBe(0);
    }
    // The generated households do reach the rule's branches: something was due (a test of nothing proves nothing).
    expect(claimedInAll).toBeGreaterThan(20);
  });
});
