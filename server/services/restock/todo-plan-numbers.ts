// The numbers of a restock batch plan: the tested recipe scaled, processed for the household as it is now.
import { recipeProcessingPlan } from '../../../shared/processing-plan';
import {
  amountIn,
  cannerFor,
  cannerLoads,
  batchShopping,
  type Mouth,
  type StockItem,
  scaleRecipe,
  type UnitSystem,
  type JarSize,
  type RestockReason,
  type ScaledIngredient,
} from '../../../shared/domain';
import {
  altitudeWords,
  dateWords,
  METHOD_NAMES,
  minutesWords,
  pressureWords,
  amountWords,
} from '../../../shared/words';
import { batchShoppingTodo, batchShoppingWords } from '../../../shared/words/stock';
import type { BatchPlan, BatchPlanStock, ShoppingItem } from '../../../shared/schemas/todos';
import { Household, Product, Recipe } from '../../db/models';
import { AppError } from '../../http/errors';
import { deepFrozen, frozen, householdMemo, type HouseholdVersions } from '../household-memo';
import { stockFor, usualMouths } from '../stock/jar-stock';
import { targetDate } from './harvest-target';

/** The amount as the recipe keeps it, and as the household measures it (its text and its shown number). */
function shoppingItem(ingredient: ScaledIngredient, system: UnitSystem): ShoppingItem {
  const amount = amountWords(ingredient.amount, ingredient.unit, system);
  return {
    name: ingredient.name,
    role: ingredient.role,
    amount: ingredient.amount,
    unit: ingredient.unit,
    shown: (({ value, unit }) => ({ amount: value, unit }))(amountIn(ingredient.amount, ingredient.unit, system)),
    text: `${amount} ${ingredient.name}`.trim(),
  };
}

export interface PlanQuestion {
  household: Household;
  product: Product;
  recipe: Recipe;
  today: string;
  jars: number;
  jarSize: JarSize;
  reason: RestockReason | null;
  runOutOn: string | null;
}

/** The batch plan for a count of jars, worked out for the household as it is now; its processing may be refused. */
function planFor({ household, product, recipe, today, jars, jarSize, reason, runOutOn }: PlanQuestion): BatchPlan {
  const scaled = scaleRecipe(
    {
      yield: { jars: recipe.yieldJars, jarSize: recipe.yieldJarSize },
      ingredients: recipe.ingredients,
      kind: product.kind,
    },
    { jars, jarSize },
  );
  const processing = recipeProcessingPlan(recipe, {
    jarSize,
    method: recipe.method,
    altitudeFt: household.altitudeFt,
    unitSystem: household.unitSystem,
  });
  const target = targetDate(today, product.harvestMonths, runOutOn);
  const system = household.unitSystem;
  // The canner the recipe's method goes into; a household without one for it is counted in its default canner's loads.
  const canner = cannerFor(household.canners, recipe.method);
  const capacity = canner?.capacityJars ?? household.defaultCannerCapacity();
  return {
    productId: product.id,
    productName: product.name,
    recipeId: recipe.id,
    recipeName: recipe.name,
    recipeSource: recipe.source,
    reason,
    jars,
    jarSize,
    method: recipe.method,
    altitudeFt: household.altitudeFt,
    headspaceInches: recipe.headspaceInches,
    scaled,
    processing,
    // Flat lids seal once (common practice); bands and jars are reused.
    equipment: {
      jars,
      newLids: jars,
      cannerMethod: canner?.method ?? household.defaultMethod,
      cannerCapacityJars: capacity,
      cannerLoads: cannerLoads(jars, capacity),
    },
    shopping: {
      produce: scaled.ingredients.filter((i) => i.role === 'produce').map((i) => shoppingItem(i, system)),
      pantry: scaled.ingredients.filter((i) => i.role !== 'produce').map((i) => shoppingItem(i, system)),
    },
    targetOn: target.targetOn,
    targetWhy: target.why,
    plannedOn: today,
  };
}

/** The batch plan for a count of jars, or a refusal where no tested process fits this household. */
export function composeBatchPlan(question: PlanQuestion): BatchPlan {
  const plan = planFor(question);
  if (!plan.processing.allowed) {
    throw new AppError(
      422,
      'not_allowed',
      `There is no tested process for this batch at ${altitudeWords(question.household.altitudeFt, question.household.unitSystem)}: ${plan.processing.reasons.join(' ')}`,
    );
  }
  return plan;
}

/** What the plan's jars and lids need bought after the empty jars and new lids in stock now. */
function planStock(plan: BatchPlan, mouth: Mouth, inStock: (item: StockItem, size: string) => number): BatchPlanStock {
  const shop = batchShopping(plan.equipment.jars, {
    emptyJars: inStock('jar', plan.jarSize),
    lids: inStock('lid', mouth),
  });
  return {
    mouth,
    ...shop,
    words: batchShoppingWords(plan.jarSize, mouth, shop),
    todoTitle: batchShoppingTodo(plan.jarSize, mouth, shop),
  };
}

function processingWords(plan: Pick<BatchPlan, 'processing'>, system: UnitSystem): string {
  const { minutes, pressurePsi, allowed } = plan.processing;
  if (!allowed) return 'no tested process';
  return pressurePsi !== null
    ? `${minutesWords(minutes!)} at ${pressureWords(pressurePsi, false, system)}`
    : minutesWords(minutes!);
}

/** What differs between a plan as made and as worked out now, in words a cook reads on canning day. */
export function planChanges(made: BatchPlan, now: BatchPlan, system: UnitSystem = 'us'): string[] {
  const since = `when it was planned on ${dateWords(made.plannedOn)}`;
  const changes: string[] = [];
  if (made.altitudeFt !== now.altitudeFt)
    changes.push(
      `The household’s altitude is now ${altitudeWords(now.altitudeFt, system)} (it was ${altitudeWords(made.altitudeFt, system)} ${since}).`,
    );
  if (processingWords(made, system) !== processingWords(now, system))
    changes.push(`Processing is now ${processingWords(now, system)} (it was ${processingWords(made, system)}).`);
  if (made.method !== now.method)
    changes.push(
      `The recipe now uses a ${METHOD_NAMES[now.method].toLowerCase()} (it was a ${METHOD_NAMES[made.method].toLowerCase()}).`,
    );
  if (made.equipment.cannerCapacityJars !== now.equipment.cannerCapacityJars) {
    changes.push(
      `Your ${METHOD_NAMES[now.equipment.cannerMethod ?? now.method].toLowerCase()} now holds ${now.equipment.cannerCapacityJars} jars a load (it was ${made.equipment.cannerCapacityJars}), so the loads are ${now.equipment.cannerLoads.join(' + ')}.`,
    );
  }
  // The recipe's own amounts, not their words: a change of the household's units is not an edit of the recipe.
  const ingredients = (plan: BatchPlan) =>
    JSON.stringify([...plan.shopping.produce, ...plan.shopping.pantry].map((i) => [i.name, i.amount, i.unit]));
  if (
    ingredients(made) !== ingredients(now) ||
    made.headspaceInches !== now.headspaceInches ||
    made.recipeName !== now.recipeName
  ) {
    changes.push(`The recipe “${now.recipeName}” was edited since; the amounts below follow it as it is now.`);
  }
  return changes;
}

/** A plan whose recipe or product is gone: its numbers cannot be trusted, so its processing is refused with the reason. */
function orphaned(made: BatchPlan, why: string): BatchPlan {
  return {
    ...made,
    processing: {
      ...made.processing,
      allowed: false,
      minutes: null,
      pressurePsi: null,
      altitudeAddMinutes: null,
      reasons: [why],
    },
    changes: [why],
  };
}

/**
 * What a restock to-do's plan is worked out again from: its recipes and products, the lids and jars in stock and the
 * mouths the household cans in. All of it is household data, so it is kept until the data version moves: a to-do
 * ticked or moved again and again (each answer carries its plan) reads none of it again. Shared: only read from.
 */
const planInputs = householdMemo<{
  recipes: Recipe[];
  products: Product[];
  inStock: Awaited<ReturnType<typeof stockFor>>;
  mouthOf: Awaited<ReturnType<typeof usualMouths>>;
  /** Each to-do's plan as now, by to-do id, worked out at the first read that needs it. */
  plans: Map<string, BatchPlan>;
}>();

/**
 * Restock to-dos keep the plan as made; every read works it out again for the household's altitude, canner and
 * recipe as they are now, and says what changed, so canning day never follows stale numbers.
 */
export async function refreshPlans<T extends { id: string; batchPlan: BatchPlan | null }>(
  household: Household,
  views: T[],
  versions?: HouseholdVersions,
): Promise<T[]> {
  const householdId = household.id;
  const planned = views.filter((view) => view.batchPlan);
  if (planned.length === 0) return views;
  const recipeIds = [...new Set(planned.map((view) => view.batchPlan!.recipeId))].sort();
  const productIds = [...new Set(planned.map((view) => view.batchPlan!.productId))].sort();
  // The household is the guard's, read with the session in this request; the rest is kept per data version.
  const { recipes, products, inStock, mouthOf, plans } = await planInputs(
    `${householdId} ${recipeIds.join(',')} ${productIds.join(',')}`,
    versions?.data,
    async () => {
      const [recipes, products, inStock, mouthOf] = await Promise.all([
        Recipe.findAll({ where: { householdId, id: recipeIds } }),
        Product.findAll({ where: { householdId, id: productIds } }),
        stockFor(Household.sequelize!, householdId),
        usualMouths(Household.sequelize!, householdId, productIds),
      ]);
      return { ...frozen({ recipes, products, inStock, mouthOf }), plans: new Map<string, BatchPlan>() };
    },
  );
  return views.map((view) => {
    const made = view.batchPlan;
    if (!made) return view;
    // A to-do's plan as made never changes (it is written with the to-do), so its plan as now is kept with the inputs.
    let batchPlan = plans.get(view.id);
    if (!batchPlan) {
      batchPlan = deepFrozen(planAsNow(household, made, recipes, products, inStock, mouthOf));
      plans.set(view.id, batchPlan);
    }
    return { ...view, batchPlan };
  });
}

function planAsNow(
  household: Household,
  made: BatchPlan,
  recipes: Recipe[],
  products: Product[],
  inStock: Awaited<ReturnType<typeof stockFor>>,
  mouthOf: Awaited<ReturnType<typeof usualMouths>>,
): BatchPlan {
  const recipe = recipes.find((r) => r.id === made.recipeId);
  const product = products.find((p) => p.id === made.productId);
  if (!recipe || !product)
    return orphaned(
      made,
      'The recipe or product this plan was made from has been removed; plan the batch again from Restock.',
    );
  const now = planFor({
    household,
    product,
    recipe,
    today: made.plannedOn,
    jars: made.jars,
    jarSize: made.jarSize,
    reason: made.reason,
    runOutOn: null,
  });
  const fresh: BatchPlan = {
    ...now,
    targetOn: made.targetOn,
    targetWhy: made.targetWhy,
    changes: planChanges(made, now, household.unitSystem),
  };
  fresh.stock = planStock(fresh, mouthOf(fresh.productId, fresh.jarSize), inStock);
  if (!household.altitudeConfirmedAt)
    return orphaned(fresh, 'Confirm the household’s altitude first: processing depends on it.');
  return fresh;
}
