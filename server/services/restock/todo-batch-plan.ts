// A restock to-do's batch plan: the tested recipe scaled to the jars wanted, processed for this household.
import type { Sequelize } from 'sequelize';
import { jarFluidOunces, restockSuggestions, type JarSize, type UnitSystem } from '../../../shared/domain';
import { count, jarSizeWords } from '../../../shared/words';
import type { BatchPlan, RestockTodoCreate, TodoView } from '../../../shared/schemas/todos';
import { Batch, Household, Product, Recipe } from '../../db/models';
import { AppError, notFound } from '../../http/errors';
import { composeBatchPlan } from './todo-plan-numbers';
import { todayIn } from '../clock';
import { requireConfirmedAltitude } from '../households';
import { stockSnapshot } from './stock-snapshot';
import { createTodo } from '../todos';
import { paths } from '../../../shared/paths';

/** The recipe the household last made this product with, else its newest recipe. */
async function chooseRecipe(product: Product): Promise<Recipe | null> {
  const lastBatch = await Batch.findOne({
    where: { householdId: product.householdId, productId: product.id },
    order: [
      ['cannedOn', 'DESC'],
      ['createdAt', 'DESC'],
    ],
    include: [{ model: Recipe, as: 'recipe', required: true }],
  });
  if (lastBatch) return (lastBatch as Batch & { recipe: Recipe }).recipe;
  return Recipe.findOne({
    where: { householdId: product.householdId, productId: product.id },
    order: [['createdAt', 'DESC']],
  });
}

function refuse(message: string, action?: { label: string; href: string }): AppError {
  return new AppError(422, 'not_allowed', message, undefined, action ? { action } : undefined);
}

export function jarSizeFor(
  recipe: Recipe,
  product: Product,
  wanted: JarSize | undefined,
  system: UnitSystem = 'us',
): JarSize {
  const tested = Object.keys(recipe.baseMinutes) as JarSize[];
  const size = wanted ?? (tested.includes(product.jarSize) ? product.jarSize : recipe.yieldJarSize);
  if (recipe.baseMinutes[size] === undefined) {
    const names = tested.map((s) => jarSizeWords(s, system)).join(', ') || 'none';
    throw refuse(
      `"${recipe.name}" has no tested time for ${jarSizeWords(size, system)} jars. Choose a size it was tested for: ${names}.`,
    );
  }
  return size;
}

/** One tested batch, in the jars chosen: what to make when nothing says how many. */
export function oneTestedBatch(recipe: Recipe, jarSize: JarSize): number {
  return Math.max(1, Math.ceil((recipe.yieldJars * jarFluidOunces(recipe.yieldJarSize)) / jarFluidOunces(jarSize)));
}

export function restockTitle(plan: BatchPlan, system: UnitSystem = 'us'): string {
  return `Make ${count(plan.jars, `${jarSizeWords(plan.jarSize, system)} jar`)} of ${plan.productName}`;
}

/** Makes the restock to-do, or refuses with what to do first. */
export async function addRestockTodo(
  sequelize: Sequelize,
  household: Household,
  userId: string,
  productId: string,
  input: RestockTodoCreate,
): Promise<TodoView> {
  requireConfirmedAltitude(household);
  const product = await Product.findOne({ where: { id: productId, householdId: household.id } });
  if (!product) throw notFound('That product');
  const recipe = await chooseRecipe(product);
  if (!recipe) {
    throw refuse(`${product.name} has no recipe yet. Add a tested recipe for it first, then plan the batch.`, {
      label: 'Add a recipe',
      href: paths.newRecipe(household.id, product.id),
    });
  }
  const jarSize = jarSizeFor(recipe, product, input.jarSize, household.unitSystem);

  const today = todayIn(household.timeZone);
  const snapshot = await stockSnapshot(household.id, today);
  const { forecasts, suggestions } = restockSuggestions({
    today,
    products: [
      {
        id: product.id,
        favourite: product.favourite,
        minJars: product.minJars,
        harvestMonths: product.harvestMonths,
        jarSize: product.jarSize,
      },
    ],
    jars: snapshot.shelfJars.map((jar) => ({
      productId: jar.productId,
      state: jar.state,
      remainingTbsp: jar.remainingTbsp,
    })),
    finished: snapshot.finished,
    given: snapshot.given,
    planned: snapshot.planned,
  });
  const suggestion = suggestions[0];
  const suggestedInSize =
    suggestion && Math.ceil((suggestion.suggestedJars * jarFluidOunces(product.jarSize)) / jarFluidOunces(jarSize));
  const jars = input.jars ?? suggestedInSize ?? oneTestedBatch(recipe, jarSize);
  const plan = composeBatchPlan({
    household,
    product,
    recipe,
    today,
    jars,
    jarSize,
    reason: suggestion?.reason ?? null,
    runOutOn: forecasts[0].runOutOn,
  });
  return createTodo(sequelize, household, userId, {
    title: restockTitle(plan, household.unitSystem),
    dueOn: plan.targetOn,
    kind: 'restock',
    productId: product.id,
    batchPlan: plan,
  });
}
