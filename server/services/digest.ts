import { randomUUID } from 'node:crypto';
import { Op, QueryTypes } from 'sequelize';
import { addDays } from '../../shared/domain';
import type { AppContext } from '../context';
import { DigestDelivery, Household, Jar, Membership, Pairing, PlanEntry, User } from '../db/models';
import { digestMail, type DigestContent } from './mail/digest-mail';
import { clock, hourIn, todayIn } from './clock';
import { digestRestockLines } from './restock/digest-lines';
import { preferencesOf, withinReminderHours } from './notification-preferences';
import { allocatePlan, productsOf } from './plan-allocation';
import { paths } from '../../shared/paths';

type Notifiers = Pick<AppContext, 'config' | 'sequelize' | 'mailer'>;

const SLOT_ORDER = ['breakfast', 'lunch', 'dinner', 'snack'];

/** The week ahead for one household: its plan, the jars to open, the use-by dates this week and restock suggestions. */
export async function buildDigest(household: Household, today: string, origin: string): Promise<DigestContent> {
  const weekEnd = addDays(today, 6);
  const products = await productsOf(household.id);
  const nameOf = (productId: string) => products.get(productId)?.name ?? 'a product';
  const [entries, opened, plan, restock] = await Promise.all([
    PlanEntry.findAll({
      where: { householdId: household.id, date: { [Op.between]: [today, weekEnd] } },
      include: [{ model: Pairing, as: 'pairings' }],
    }),
    Jar.findAll({
      where: { householdId: household.id, state: 'opened', useBy: { [Op.lte]: weekEnd } },
      order: [['useBy', 'ASC']],
    }),
    allocatePlan(household.id, today, weekEnd, products),
    digestRestockLines(household.id, today, household.unitSystem),
  ]);
  const jarProduct = new Map(
    (await Jar.findAll({ where: { id: (plan?.allocation.openings ?? []).map((o) => String(o.jarId)) } })).map((j) => [
      j.id,
      j.productId,
    ]),
  );
  return {
    householdName: household.name,
    weekOf: today,
    plan: entries
      .sort(
        (a, b) =>
          a.date.localeCompare(b.date) ||
          SLOT_ORDER.indexOf(a.slot) - SLOT_ORDER.indexOf(b.slot) ||
          a.position - b.position,
      )
      .map((e) => ({
        date: e.date,
        slot: e.slot,
        title: e.title,
        products: (e.pairings ?? []).map((p) => nameOf(p.productId)),
      })),
    toOpen: (plan?.allocation.openings ?? []).map((o) => ({
      date: o.date,
      productName: nameOf(jarProduct.get(String(o.jarId)) ?? ''),
    })),
    expiring: opened.map((j) => ({ useBy: j.useBy!, productName: nameOf(j.productId), code: j.code })),
    restock,
    link: `${origin}${paths.week(household.id)}`,
  };
}

async function claim(ctx: Notifiers, householdId: string, userId: string, weekOf: string) {
  const rows = await ctx.sequelize.query(
    `INSERT INTO digest_deliveries (id, household_id, user_id, week_of, created_at, updated_at) VALUES (:id, :householdId, :userId, :weekOf, now(), now())
     ON CONFLICT (household_id, user_id, week_of) DO NOTHING RETURNING id`,
    { replacements: { id: randomUUID(), householdId, userId, weekOf }, type: QueryTypes.SELECT },
  );
  return rows.length === 1 ? (rows[0] as { id: string }).id : null;
}

/** Sends the weekly digest on the household's first day of the week, at each person's reminder hour, once. */
export async function sweepDigests(ctx: Notifiers, now = clock.now()) {
  if (!ctx.mailer.enabled) return { sent: 0 };
  let sent = 0;
  for (const household of await Household.findAll()) {
    const today = todayIn(household.timeZone, now);
    if (new Date(`${today}T00:00:00Z`).getUTCDay() !== household.weekStartsOn) continue;
    const hour = hourIn(household.timeZone, now);
    const memberships = await Membership.findAll({
      where: { householdId: household.id },
      include: [{ model: User, as: 'user', required: true }],
    });
    const prefs = await preferencesOf(memberships.map((m) => m.userId));
    const due = memberships.filter(
      (m) => prefs.get(m.userId)!.weeklyDigest && withinReminderHours(hour, prefs.get(m.userId)!.reminderHour),
    );
    if (due.length === 0) continue;
    let digest: DigestContent | undefined;
    for (const membership of due) {
      const deliveryId = await claim(ctx, household.id, membership.userId, today);
      if (!deliveryId) continue;
      digest ??= await buildDigest(household, today, ctx.config.publicOrigin);
      try {
        await ctx.mailer.send(digestMail(membership.user!.email, digest));
        await DigestDelivery.update({ emailSent: true }, { where: { id: deliveryId } });
        sent += 1;
      } catch (error) {
        await DigestDelivery.update({ problem: (error as Error).message }, { where: { id: deliveryId } });
      }
    }
  }
  return { sent };
}
