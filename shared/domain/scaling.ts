// Scaling a tested recipe to the jars wanted, rounded for the kitchen without ever weakening its acid.
import { roundKitchenAmount } from './kitchen-amounts';
import type { ProductKind } from './products';
import { INGREDIENT_UNITS, JAR_SIZES, jarFluidOunces, type IngredientUnit, type JarSize } from './units';
import {
  requireList,
  requireNonNegative,
  requireOneOf,
  requirePositive,
  requireRecord,
  requireWholeNumber,
} from './validate';

export const INGREDIENT_ROLES = ['produce', 'acid', 'sweetener', 'spice', 'other'] as const;
export type IngredientRole = (typeof INGREDIENT_ROLES)[number];

export interface RecipeIngredient {
  name: string;
  amount: number;
  unit: IngredientUnit;
  role: IngredientRole;
}

export interface JarYield {
  jars: number;
  jarSize: JarSize;
}

export interface Recipe {
  yield: JarYield;
  ingredients: RecipeIngredient[];
  kind?: ProductKind;
  /** Set where the recipe relies on added pectin under a name that does not say so. */
  usesPectin?: boolean;
}

export type ScaleTarget = JarYield | { factor: number };

export interface ScaledIngredient extends RecipeIngredient {
  /** The amount times the factor, before kitchen rounding. */
  exactAmount: number;
}

export interface ScaledRecipe {
  factor: number;
  /** What the acid was scaled by before rounding up: at least the factor, and at least what any produce received. */
  acidFactor: number;
  ingredients: ScaledIngredient[];
  cautions: string[];
}

// Common practice: pectin makers and the USDA Guide say to make jams and jellies one batch at a time.
export const PECTIN_BATCH_CAUTION =
  'Make pectin jams and jellies one batch at a time, as the tested recipe says: a bigger batch may not set.';
// Common practice: a much larger pot heats, boils down and fills differently from the tested batch.
export const LARGE_BATCH_CAUTION =
  'This is more than twice the tested batch: make it as separate batches of the tested size.';
const LARGE_BATCH_FACTOR = 2;

function readIngredient(ingredient: RecipeIngredient, index: number): RecipeIngredient {
  const label = `ingredients[${index}]`;
  requireRecord(ingredient, label);
  if (typeof ingredient.name !== 'string') throw new RangeError(`${label}.name must be text`);
  return {
    name: ingredient.name,
    amount: requireNonNegative(ingredient.amount, `amount of ${ingredient.name || label}`),
    unit: requireOneOf(ingredient.unit, INGREDIENT_UNITS, `unit of ${ingredient.name || label}`),
    role: requireOneOf(ingredient.role, INGREDIENT_ROLES, `role of ${ingredient.name || label}`),
  };
}

function readYield(value: JarYield, label: string): JarYield {
  requireRecord(value, label);
  return {
    jars: requireWholeNumber(value.jars, `${label}.jars`, 1),
    jarSize: requireOneOf(value.jarSize, JAR_SIZES, `${label}.jarSize`),
  };
}

function factorFor(base: JarYield, target: ScaleTarget): number {
  requireRecord(target, 'target');
  if ('factor' in target) return requirePositive(target.factor, 'factor');
  const wanted = readYield(target, 'target');
  return (wanted.jars * jarFluidOunces(wanted.jarSize)) / (base.jars * jarFluidOunces(base.jarSize));
}

export function scaleRecipe(recipe: Recipe, target: ScaleTarget): ScaledRecipe {
  requireRecord(recipe, 'recipe');
  const base = readYield(recipe.yield, 'recipe.yield');
  const ingredients = requireList<RecipeIngredient>(recipe.ingredients, 'recipe.ingredients').map(readIngredient);
  const factor = factorFor(base, target);

  const rounded = ingredients.map((ingredient) =>
    ingredient.role === 'acid' ? null : roundKitchenAmount(ingredient.amount * factor, ingredient.unit),
  );
  // Rounding up alone is not enough: produce rounded up would outgrow acid scaled by the plain factor.
  const produceFactors = ingredients.flatMap((ingredient, index) =>
    ingredient.role === 'produce' && ingredient.amount > 0 ? [rounded[index]! / ingredient.amount] : [],
  );
  const acidFactor = Math.max(factor, ...produceFactors);

  const cautions: string[] = [];
  const usesPectin = recipe.usesPectin === true || ingredients.some((ingredient) => /pectin/i.test(ingredient.name));
  if (usesPectin && factor > 1) cautions.push(PECTIN_BATCH_CAUTION);
  if (factor > LARGE_BATCH_FACTOR) cautions.push(LARGE_BATCH_CAUTION);

  return {
    factor,
    acidFactor,
    ingredients: ingredients.map((ingredient, index) => ({
      ...ingredient,
      exactAmount: ingredient.amount * factor,
      amount: rounded[index] ?? roundKitchenAmount(ingredient.amount * acidFactor, ingredient.unit, 'up'),
    })),
    cautions,
  };
}
