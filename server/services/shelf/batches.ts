import type { Sequelize, Transaction } from 'sequelize';
import { recipeProcessingPlan } from '../../../shared/processing-plan';
import { mouthFor, type JarSize, type Method, type ProcessingPlan } from '../../../shared/domain';
import type { BatchCreate, BatchCreated, BatchDetail } from '../../../shared/schemas/batches';
import { Batch, BatchProcessing, Jar, JarEvent, Place, Product, Recipe, User, type Household } from '../../db/models';
import { AppError, notFound } from '../../http/errors';
import { clock, todayIn } from '../clock';
import { requireConfirmedAltitude } from '../households';
import { placeNewJars, placeOfHousehold } from './places';
import { findProduct } from './products';
import { findRecipe } from './recipes';
import { processingView, sealCheckView } from './seal-check-view';
import { batchView, jarView, shelfClock } from './views';
import { takeForBatch } from '../stock/jar-stock';
import { withFreshJarCodes, writeBatch } from './write-batch';

export function notAllowed(plan: ProcessingPlan, what = 'This batch'): AppError {
  return new AppError(422, 'not_allowed', `${what} cannot be saved: ${plan.reasons.join(' ')}`, undefined, { plan });
}

export async function previewPlan(household: Household, recipeId: string, jarSize: JarSize, method: Method) {
  requireConfirmedAltitude(household);
  const recipe = await findRecipe(household.id, recipeId);
  return recipeProcessingPlan(recipe, {
    jarSize,
    method,
    altitudeFt: household.altitudeFt,
    unitSystem: household.unitSystem,
  });
}

export async function createBatch(
  sequelize: Sequelize,
  household: Household,
  input: Required<Omit<BatchCreate, 'headspaceInches' | 'placeId' | 'mouth'>> &
    Pick<BatchCreate, 'headspaceInches' | 'mouth'> & { placeId?: string | null },
  userId: string,
): Promise<BatchCreated> {
  requireConfirmedAltitude(household);
  const [product, recipe] = await Promise.all([
    findProduct(household.id, input.productId),
    findRecipe(household.id, input.recipeId),
  ]);
  if (recipe.productId !== product.id) {
    throw new AppError(400, 'invalid_input', 'That recipe makes another product. Choose a recipe for this product.', {
      recipeId: 'This recipe is for another product.',
    });
  }
  if (input.cannedOn > todayIn(household.timeZone)) {
    throw new AppError(400, 'invalid_input', 'A batch cannot be dated in the future.', {
      cannedOn: 'Use today or an earlier day.',
    });
  }
  if (input.seals === 'to-check' && input.cannedOn !== todayIn(household.timeZone)) {
    throw new AppError(
      400,
      'invalid_input',
      'Seals are left to check only for a batch processed today. For an earlier batch, check the seals and enter how many sealed.',
      {
        seals: 'Choose “Seals checked already” for an earlier day.',
      },
    );
  }
  const plan = recipeProcessingPlan(recipe, {
    jarSize: input.jarSize,
    method: input.method,
    altitudeFt: household.altitudeFt,
    unitSystem: household.unitSystem,
  });
  if (!plan.allowed) throw notAllowed(plan);
  // Left out, the jars go to the product's usual place. Read in the write's transaction, share-locked, so a place
  // removed at the same time is either still there for the jars or refused (a usual place since removed: none).
  const placeFor = (transaction: Transaction) =>
    input.placeId !== undefined
      ? placeOfHousehold(household.id, input.placeId, 'placeId', transaction)
      : product.defaultPlaceId
        ? placeOfHousehold(household.id, product.defaultPlaceId, 'placeId', transaction).catch(() => null)
        : null;

  const { batch, jars, stock } = await withFreshJarCodes(sequelize, async (transaction) => {
    const place = await placeFor(transaction);
    const written = await writeBatch(
      household,
      product,
      {
        productId: product.id,
        recipeId: recipe.id,
        cannedOn: input.cannedOn,
        jarSize: input.jarSize,
        // Kept as chosen or assumed, so the next plan for this product buys the lids its jars take.
        mouth: mouthFor(input.jarSize, input.mouth),
        jarsFilled: input.jarsFilled,
        jarsSealed: input.jarsSealed,
        method: input.method,
        minutes: plan.minutes,
        pressurePsi: plan.pressurePsi,
        headspaceInches: input.headspaceInches ?? recipe.headspaceInches,
        notes: input.notes,
      },
      userId,
      transaction,
      input.seals === 'to-check' ? clock.now() : undefined,
    );
    await placeNewJars(written.jars, place, transaction);
    // Every jar filled took an empty jar and a new lid, sealed or not (lids seal once: USDA 2015, NCHFP).
    const stock = await takeForBatch(
      sequelize,
      household.id,
      written.batch,
      input.jarsFilled,
      'record',
      userId,
      transaction,
    );
    return { ...written, stock };
  });
  const shelf = shelfClock(household);
  return {
    batch: batchView(
      batch,
      product,
      recipe,
      jars.map((j) => j.state),
    ),
    jars: jars.map((jar) => jarView(jar, batch, product, shelf)),
    plan,
    stockWarnings: stock.flatMap((applied) => (applied.warning ? [applied.warning] : [])),
  };
}

export async function listBatches(householdId: string) {
  const [batches, products, recipes, jars] = await Promise.all([
    Batch.findAll({
      where: { householdId },
      order: [
        ['cannedOn', 'DESC'],
        ['createdAt', 'DESC'],
      ],
    }),
    Product.findAll({ where: { householdId } }),
    Recipe.findAll({ where: { householdId }, attributes: ['id', 'name'] }),
    Jar.findAll({ where: { householdId }, attributes: ['batchId', 'state'] }),
  ]);
  const productById = new Map(products.map((p) => [p.id, p]));
  const recipeById = new Map(recipes.map((r) => [r.id, r]));
  return batches.map((batch) =>
    batchView(
      batch,
      productById.get(batch.productId)!,
      batch.recipeId ? (recipeById.get(batch.recipeId) ?? null) : null,
      jars.filter((j) => j.batchId === batch.id).map((j) => j.state),
    ),
  );
}

export async function findBatch(householdId: string, batchId: string) {
  const batch = await Batch.findOne({ where: { householdId, id: batchId } });
  if (!batch) throw notFound('That batch');
  return batch;
}

export async function batchDetail(household: Household, batchId: string): Promise<BatchDetail> {
  const batch = await findBatch(household.id, batchId);
  const [product, recipe, jars, events, processings] = await Promise.all([
    findProduct(household.id, batch.productId),
    batch.recipeId ? Recipe.findOne({ where: { householdId: household.id, id: batch.recipeId } }) : null,
    Jar.findAll({
      where: { batchId: batch.id },
      include: [{ model: Place, as: 'place', required: false }],
      order: [['code', 'ASC']],
    }),
    JarEvent.findAll({
      where: { batchId: batch.id },
      include: [{ model: User, as: 'user', attributes: ['name'] }],
      order: [
        ['happenedOn', 'DESC'],
        ['createdAt', 'DESC'],
      ],
    }),
    BatchProcessing.findAll({
      where: { batchId: batch.id },
      include: [{ model: User, as: 'user', attributes: ['name'] }],
      order: [['number', 'ASC']],
    }),
  ]);
  const shelf = shelfClock(household);
  const codes = new Map(jars.map((jar) => [jar.id, jar.code]));
  return {
    ...batchView(
      batch,
      product,
      recipe,
      jars.map((j) => j.state),
    ),
    jars: jars.map((jar) => jarView(jar, batch, product, shelf)),
    history: events.map((event) => ({
      id: event.id,
      kind: event.kind,
      happenedOn: event.happenedOn,
      jarCode: codes.get(event.jarId) ?? '',
      givenTo: event.givenTo ?? null,
      who: (event as JarEvent & { user?: User | null }).user?.name ?? null,
      placeMove: event.placeMove ?? null,
    })),
    processings: processings.map(processingView),
    timeZone: household.timeZone,
    sealCheck: sealCheckView(batch, product, jars, processings, clock.now(), household.timeZone),
  };
}
