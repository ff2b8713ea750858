// The seal check: after the jars have cooled, each jar still to check is sealed, goes to the fridge, or is reprocessed.
import { Op, type Sequelize, type Transaction } from 'sequelize';
import { recipeProcessingPlan } from '../../../shared/processing-plan';
import {
  defaultUseWithinDays,
  mayReprocess,
  MAX_PROCESSINGS,
  REPROCESS_WITHIN_HOURS,
  SEAL_CHECK_AFTER_HOURS,
  sealCheckFrom,
  useBy,
} from '../../../shared/domain';
import type { SealCheckDone, SealCheckInput, SealCheckView } from '../../../shared/schemas/batches';
import { can, type Role } from '../../../shared/roles';
import { clockWords } from '../../../shared/words';
import { Batch, BatchProcessing, Jar, JarEvent, Product, Recipe, type Household } from '../../db/models';
import { AppError, conflict, forbidden, notFound } from '../../http/errors';
import { clock, todayIn } from '../clock';
import { takeForBatch, type StockApplied } from '../stock/jar-stock';
import { batchDetail, notAllowed } from './batches';
import { sealCheckView } from './seal-check-view';

type Pick = NonNullable<SealCheckInput['fridge']>;

function picked(pick: Pick, from: Jar[], taken: Set<string>, field: string): Jar[] {
  if ('jarIds' in pick) {
    const byId = new Map(from.map((jar) => [jar.id, jar]));
    const jars = [...new Set(pick.jarIds)].map((id) => byId.get(id));
    if (jars.some((jar) => jar === undefined)) {
      throw new AppError(
        400,
        'invalid_input',
        'A jar in the list is not one of this batch’s jars still to check. Refresh and choose again.',
        { [field]: 'Choose jars still to check.' },
      );
    }
    return jars as Jar[];
  }
  // By count: the batch's last jars by code, skipping any already named for the other way.
  const free = from.filter((jar) => !taken.has(jar.id));
  if (pick.count > free.length) {
    throw new AppError(
      400,
      'invalid_input',
      `Only ${from.length} jars are still to check; the jars that did not seal cannot be more.`,
      { [field]: `Use at most ${free.length}.` },
    );
  }
  return pick.count === 0 ? [] : free.slice(-pick.count);
}

async function lockedBatch(householdId: string, batchId: string, transaction: Transaction) {
  const batch = await Batch.findOne({
    where: { householdId, id: batchId },
    lock: transaction.LOCK.UPDATE,
    transaction,
  });
  if (!batch) throw notFound('That batch');
  return batch;
}

export async function checkSeals(
  sequelize: Sequelize,
  household: Household,
  role: Role,
  batchId: string,
  input: Required<SealCheckInput>,
  userId: string,
): Promise<SealCheckDone> {
  const now = clock.now();
  const today = todayIn(household.timeZone, now);
  const outcome = await sequelize.transaction(async (transaction) => {
    // The batch row is the lock: two people checking the same jars at once cannot both write.
    const batch = await lockedBatch(household.id, batchId, transaction);
    const toCheck = await Jar.findAll({
      where: { batchId: batch.id, state: 'sealed', seal: 'to-check' },
      order: [['code', 'ASC']],
      transaction,
    });
    if (toCheck.length === 0)
      throw conflict('The seals of this batch have been checked already. Refresh to see where its jars are.');
    const processings = await BatchProcessing.findAll({
      where: { batchId: batch.id },
      order: [['number', 'ASC']],
      transaction,
    });
    const first = processings[0];
    const latest = processings.find((p) => p.id === toCheck[0].processingId) ?? processings[processings.length - 1];
    const from = sealCheckFrom(latest.processedAt);
    if (now < from) {
      throw new AppError(
        422,
        'not_allowed',
        `These jars came out of the canner at ${clockWords(latest.processedAt, household.timeZone)}. Leave them undisturbed ${SEAL_CHECK_AFTER_HOURS} hours, until ${clockWords(from, household.timeZone)}, then check the seals.`,
      );
    }

    const reprocess = picked(input.reprocess, toCheck, new Set(), 'reprocess');
    const fridge = picked(input.fridge, toCheck, new Set(reprocess.map((j) => j.id)), 'fridge');
    if (fridge.some((jar) => reprocess.includes(jar))) {
      throw new AppError(
        400,
        'invalid_input',
        'A jar cannot go to the fridge and be reprocessed. Choose one way for each jar.',
        { fridge: 'Leave out the jars to reprocess.' },
      );
    }

    let plan = null;
    let stock: StockApplied[] = [];
    if (reprocess.length > 0) {
      if (!can(role, 'cook'))
        throw forbidden('Reprocessing is recorded by a cook or a keeper. Put the jars in the fridge, or ask a cook.');
      if (!mayReprocess(first.processedAt, now, latest.number)) {
        const why =
          latest.number >= MAX_PROCESSINGS
            ? 'These jars have been reprocessed once already.'
            : `More than ${REPROCESS_WITHIN_HOURS} hours have passed since the first processing at ${clockWords(first.processedAt, household.timeZone)}.`;
        throw new AppError(
          422,
          'not_allowed',
          `${why} A jar that did not seal can only go to the fridge now, to be used like an opened jar.`,
          { reprocess: 'Put these jars in the fridge.' },
        );
      }
      const recipe = batch.recipeId
        ? await Recipe.findOne({ where: { householdId: household.id, id: batch.recipeId }, transaction })
        : null;
      if (!recipe)
        throw new AppError(
          422,
          'not_allowed',
          'This batch has no recipe recorded, so there is no tested time to reprocess it with. Put the jars in the fridge.',
        );
      plan = recipeProcessingPlan(recipe, {
        jarSize: batch.jarSize,
        method: batch.method,
        altitudeFt: household.altitudeFt,
        unitSystem: household.unitSystem,
      });
      if (!plan.allowed) throw notAllowed(plan, 'This reprocess');
      const again = await BatchProcessing.create(
        {
          householdId: household.id,
          batchId: batch.id,
          number: latest.number + 1,
          processedAt: now,
          method: batch.method,
          altitudeFt: household.altitudeFt,
          minutes: plan.minutes,
          pressurePsi: plan.pressurePsi,
          jars: reprocess.length,
          createdBy: userId,
        },
        { transaction },
      );
      await Jar.update({ processingId: again.id }, { where: { id: reprocess.map((j) => j.id) }, transaction });
      // A reprocessed jar gets a new lid; the jar and band are the same (NCHFP; USDA Complete Guide, 2015).
      stock = await takeForBatch(sequelize, household.id, batch, reprocess.length, 'reprocess', userId, transaction);
    }

    if (fridge.length > 0) {
      const product = await Product.findByPk(batch.productId, { transaction });
      const keepsDays = product!.useWithinDays ?? defaultUseWithinDays(product!.kind);
      const [moved] = await Jar.update(
        { state: 'opened', unsealed: true, seal: 'checked', openedOn: today, useBy: useBy(today, keepsDays) },
        { where: { id: fridge.map((j) => j.id), state: 'sealed', seal: 'to-check' }, transaction },
      );
      if (moved !== fridge.length)
        throw conflict('Someone changed these jars while you checked them. Refresh and check again.');
      await batch.update({ jarsSealed: Math.max(0, batch.jarsSealed - fridge.length) }, { transaction });
    }

    const handled = new Set([...fridge, ...reprocess].map((j) => j.id));
    const sealed = toCheck.filter((jar) => !handled.has(jar.id));
    if (sealed.length > 0) {
      await Jar.update(
        { seal: 'checked' },
        { where: { id: sealed.map((j) => j.id), state: 'sealed', seal: 'to-check' }, transaction },
      );
    }
    const event = (jar: Jar, kind: 'seal-checked' | 'unsealed' | 'reprocessed') => ({
      householdId: household.id,
      jarId: jar.id,
      batchId: batch.id,
      kind,
      userId,
      happenedOn: today,
    });
    await JarEvent.bulkCreate(
      [
        ...sealed.map((j) => event(j, 'seal-checked')),
        ...fridge.map((j) => event(j, 'unsealed')),
        ...reprocess.map((j) => event(j, 'reprocessed')),
      ],
      { transaction },
    );
    return {
      sealed: sealed.length,
      toFridge: fridge.length,
      reprocessed: reprocess.length,
      plan,
      stockWarnings: stock.flatMap((applied) => (applied.warning ? [applied.warning] : [])),
    };
  });
  return { ...outcome, batch: await batchDetail(household, batchId) };
}

/** Every batch of the household with jars still to check, for Today: oldest processing first. */
export async function sealChecksOf(household: Household, now = clock.now()): Promise<SealCheckView[]> {
  const householdId = household.id;
  const jars = await Jar.findAll({
    where: { householdId, state: 'sealed', seal: 'to-check' },
    order: [['code', 'ASC']],
  });
  const batchIds = [...new Set(jars.map((j) => j.batchId))];
  if (batchIds.length === 0) return [];
  const [batches, processings] = await Promise.all([
    Batch.findAll({
      where: { householdId, id: { [Op.in]: batchIds } },
      include: [{ model: Product, as: 'product', required: true }],
    }),
    BatchProcessing.findAll({ where: { householdId, batchId: { [Op.in]: batchIds } }, order: [['number', 'ASC']] }),
  ]);
  return batches
    .flatMap((batch) => {
      const view = sealCheckView(
        batch,
        (batch as Batch & { product: Product }).product,
        jars.filter((j) => j.batchId === batch.id),
        processings.filter((p) => p.batchId === batch.id),
        now,
        household.timeZone,
      );
      return view ? [view] : [];
    })
    .sort((a, b) => a.processedAt.localeCompare(b.processedAt));
}
