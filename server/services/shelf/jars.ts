// Jars on the shelf and in the fridge, and the three things a member does with one.
import { Op, type Sequelize, type WhereOptions } from 'sequelize';
import { defaultUseWithinDays, useBy, type JarState } from '../../../shared/domain';
import type { GiftsThisYear, JarAction, JarActed, JarByCode, OpeningAdvice } from '../../../shared/schemas/batches';
import { Batch, Household, Jar, JarEvent, Membership, Place, Product } from '../../db/models';
import { conflict, notFound } from '../../http/errors';
import { todayIn } from '../clock';
import { normaliseJarCode } from './jar-codes';
import { jarEnded, type JarEnding } from '../stock/jar-stock';
import { jarBefore, lastJarChange } from './jar-undo';
import { jarView, shelfClock } from './views';

type JarWithParts = Jar & { batch: Batch; product: Product };
const withParts = [
  { model: Batch, as: 'batch', required: true },
  { model: Product, as: 'product', required: true },
  { model: Place, as: 'place', required: false },
];

export async function listJars(
  household: Household,
  filter: { state?: JarState | 'all'; productId?: string; batchId?: string; placeId?: string },
) {
  const where: WhereOptions<Jar> = { householdId: household.id };
  if (filter.state !== 'all') Object.assign(where, { state: filter.state ?? { [Op.in]: ['sealed', 'opened'] } });
  if (filter.productId) Object.assign(where, { productId: filter.productId });
  if (filter.batchId) Object.assign(where, { batchId: filter.batchId });
  if (filter.placeId) Object.assign(where, { placeId: filter.placeId === 'none' ? null : filter.placeId });
  const jars = (await Jar.findAll({
    where,
    include: withParts,
    order: [
      ['bestBy', 'ASC'],
      ['code', 'ASC'],
    ],
  })) as JarWithParts[];
  const clock = shelfClock(household);
  return jars.map((jar) => jarView(jar, jar.batch, jar.product, clock));
}

const FROM: Record<JarAction, JarState[]> = { open: ['sealed'], finish: ['opened'], discard: ['sealed', 'opened'] };
const EVENT: Record<JarAction, 'opened' | 'finished' | 'discarded'> = {
  open: 'opened',
  finish: 'finished',
  discard: 'discarded',
};

/** What has happened to a jar, as a refusal says it. */
function jarNow(jar: Jar): string {
  return {
    opened: `was opened on ${jar.openedOn}`,
    finished: `was finished on ${jar.finishedOn}`,
    discarded: `was discarded on ${jar.discardedOn}`,
    given: `was given away on ${jar.givenOn}`,
    sealed: 'is still sealed',
  }[jar.state];
}

function refusal(action: JarAction, jar: Jar): string {
  const what = {
    open: 'Only a sealed jar can be opened.',
    finish: 'Only an opened jar can be finished; open it first.',
    discard: 'A finished, discarded or given jar cannot be discarded.',
  }[action];
  return `Jar ${jar.code} ${jarNow(jar)}. ${what} Refresh to see its state now.`;
}

/** One step in a jar's life: what it changes, the states it may start from, and what a refusal says. */
interface JarStep {
  kind: 'opened' | 'finished' | 'discarded' | 'given';
  changes: Partial<Jar>;
  /** Added to the conditional UPDATE's where: the states (and seal) the step may start from. */
  from: WhereOptions<Jar>;
  refuse: (jar: Jar) => string;
  event?: { givenTo?: string | null };
  /** A jar that leaves the shelf for good: its empty jar comes back to stock or not, by the one rule of jar-stock. */
  ending?: JarEnding;
}

/**
 * Takes one step on a jar in one transaction: the jar's history row, and the stock its ending returns. The
 * conditional UPDATE is the lock: of many people acting on one jar at once, exactly one changes it and the others
 * get 409.
 */
async function stepJar(
  sequelize: Sequelize,
  household: Household,
  jarId: string,
  userId: string,
  plan: (jar: JarWithParts, today: string) => JarStep,
): Promise<JarActed> {
  const today = todayIn(household.timeZone);
  return sequelize.transaction(async (transaction) => {
    const jar = (await Jar.findOne({
      where: { id: jarId, householdId: household.id },
      include: withParts,
      transaction,
    })) as JarWithParts | null;
    if (!jar) throw notFound('That jar');
    const step = plan(jar, today);
    const [count, rows] = await Jar.update(step.changes, {
      where: { id: jar.id, ...step.from },
      returning: true,
      transaction,
    });
    if (count === 0) {
      await jar.reload({ transaction });
      throw conflict(step.refuse(jar));
    }
    const event = await JarEvent.create(
      {
        householdId: household.id,
        jarId: jar.id,
        batchId: jar.batchId,
        kind: step.kind,
        userId,
        happenedOn: today,
        stateBefore: jarBefore(jar),
        ...step.event,
      },
      { transaction },
    );
    if (step.ending) {
      await jarEnded(
        sequelize,
        household.id,
        { jarSize: jar.batch.jarSize, batchId: jar.batchId },
        step.ending,
        userId,
        event.id,
        transaction,
      );
    }
    return { jar: jarView(rows[0], jar.batch, jar.product, shelfClock(household)), eventId: event.id };
  });
}

/** Moves a jar along sealed -> opened -> finished, or to discarded. */
export function actOnJar(
  sequelize: Sequelize,
  household: Household,
  jarId: string,
  action: JarAction,
  userId: string,
  options: { kept?: boolean } = {},
): Promise<JarActed> {
  return stepJar(sequelize, household, jarId, userId, (jar, today) => ({
    kind: EVENT[action],
    changes:
      action === 'open'
        ? {
            state: 'opened',
            openedOn: today,
            useBy: useBy(today, jar.product.useWithinDays ?? defaultUseWithinDays(jar.product.kind)),
          }
        : action === 'finish'
          ? { state: 'finished', finishedOn: today, remainingTbsp: 0 }
          : { state: 'discarded', discardedOn: today },
    from: { state: { [Op.in]: FROM[action] } },
    refuse: (now) => refusal(action, now),
    // A discarded jar's glass is usually washed and kept; the person says when it broke or went out with the food.
    ending:
      action === 'open'
        ? undefined
        : action === 'finish'
          ? { reason: 'finish' }
          : { reason: 'discard', kept: options.kept ?? true },
  }));
}

/**
 * Gives a sealed jar away: it leaves the shelf in a state of its own, so its empty jar does not come back and the
 * forecast does not count it as eaten. Only a jar known to be sealed goes: one still cooling is checked first
 * (USDA Complete Guide to Home Canning, 2015: check the seals 12 to 24 hours after processing), and an unsealed jar
 * is in the fridge already (NCHFP: refrigerate it or reprocess it).
 */
export function giveJar(
  sequelize: Sequelize,
  household: Household,
  jarId: string,
  to: string | null,
  userId: string,
): Promise<JarActed> {
  return stepJar(sequelize, household, jarId, userId, (_jar, today) => ({
    kind: 'given',
    changes: { state: 'given', givenOn: today, givenTo: to },
    from: { state: 'sealed', seal: 'checked' },
    refuse: (now) =>
      now.state === 'sealed'
        ? `Jar ${now.code} is still cooling and its seal is not checked yet. Check its seal first.`
        : `Jar ${now.code} ${jarNow(now)}. Only a sealed jar on the shelf can be given away. Refresh to see its state now.`,
    event: { givenTo: to },
    // A given jar's empty jar leaves with it: the one rule for jar endings says so.
    ending: { reason: 'given' },
  }));
}

/** How many jars the household gave away this calendar year (its own time zone's year), by product. */
export async function giftsThisYear(household: Household): Promise<GiftsThisYear> {
  const today = todayIn(household.timeZone);
  const year = Number(today.slice(0, 4));
  const jars = await Jar.findAll({
    where: { householdId: household.id, state: 'given', givenOn: { [Op.gte]: `${year}-01-01`, [Op.lte]: today } },
    attributes: ['productId'],
    include: [{ model: Product, as: 'product', required: true, attributes: ['id', 'name'] }],
  });
  const byProduct = new Map<string, { productId: string; productName: string; jars: number }>();
  for (const jar of jars as (Jar & { product: Product })[]) {
    const entry = byProduct.get(jar.productId) ?? { productId: jar.productId, productName: jar.product.name, jars: 0 };
    entry.jars += 1;
    byProduct.set(jar.productId, entry);
  }
  return {
    year,
    jars: jars.length,
    byProduct: [...byProduct.values()].sort((a, b) => b.jars - a.jars || a.productName.localeCompare(b.productName)),
  };
}

/**
 * Jars to use before this one: the product's opened jars (opened first is the rule of the fridge) and its sealed jars
 * canned earlier (oldest first is the rule of the shelf). Common practice; it advises and never refuses.
 */
export async function openingAdvice(household: Household, jarId: string): Promise<OpeningAdvice> {
  const jar = await Jar.findOne({ where: { id: jarId, householdId: household.id }, include: withParts });
  if (!jar) throw notFound('That jar');
  const others = (await Jar.findAll({
    where: {
      householdId: household.id,
      productId: jar.productId,
      id: { [Op.ne]: jar.id },
      state: { [Op.in]: ['sealed', 'opened'] },
    },
    include: withParts,
    order: [
      ['useBy', 'ASC'],
      ['bestBy', 'ASC'],
      ['code', 'ASC'],
    ],
  })) as JarWithParts[];
  const cannedOn = (jar as JarWithParts).batch.cannedOn;
  const clock = shelfClock(household);
  return {
    openedJars: others
      .filter((other) => other.state === 'opened')
      .map((other) => jarView(other, other.batch, other.product, clock)),
    olderSealed: others
      .filter((other) => other.state === 'sealed' && other.batch.cannedOn < cannedOn)
      .sort((a, b) => a.batch.cannedOn.localeCompare(b.batch.cannedOn) || a.code.localeCompare(b.code))
      .map((other) => jarView(other, other.batch, other.product, clock)),
  };
}

export async function jarInHousehold(household: Household, rawCode: string) {
  const code = normaliseJarCode(rawCode);
  const jar = code
    ? ((await Jar.findOne({ where: { code, householdId: household.id }, include: withParts })) as JarWithParts | null)
    : null;
  if (!jar) throw notFound('That jar');
  return jarView(jar, jar.batch, jar.product, shelfClock(household));
}

/** A label's code, for someone signed in: the jar and its household when they belong to it, 404 otherwise. */
export async function jarByCode(rawCode: string, userId: string): Promise<JarByCode> {
  const code = normaliseJarCode(rawCode);
  const jar = code ? await Jar.findOne({ where: { code }, attributes: ['id', 'householdId'] }) : null;
  const membership = jar
    ? await Membership.findOne({
        where: { householdId: jar.householdId, userId },
        include: [{ model: Household, as: 'household', required: true }],
      })
    : null;
  if (!membership?.household) throw notFound('That jar');
  return {
    householdId: membership.householdId,
    householdName: membership.household.name,
    role: membership.role,
    jar: await jarInHousehold(membership.household, code!),
    lastChange: await lastJarChange(membership.householdId, jar!.id),
  };
}
