import { randomBytes } from 'node:crypto';
import { addMonths, jarCapacityTbsp, type JarSize, type ProductKind, type RecipeIngredient } from '../../shared/domain';
import { Batch, Jar, Pairing, PlanEntry, Product, Recipe } from '../../server/db/models';

const code = () => randomBytes(6).toString('hex').toUpperCase().slice(0, 10);

export function addProduct(
  householdId: string,
  fields: {
    name: string;
    kind?: ProductKind;
    favourite?: boolean;
    minJars?: number;
    harvestMonths?: number[];
    jarSize?: JarSize;
    useWithinDays?: number;
  },
) {
  return Product.create({ householdId, kind: 'fruit-butter', ...fields });
}

interface JarsWanted {
  sealed?: number;
  /** Opened jars, each with the day it was opened and the tablespoons left. */
  opened?: { openedOn: string; useBy: string; remainingTbsp: number }[];
  /** Finished jars, each by the day it was finished. */
  finishedOn?: string[];
  cannedOn?: string;
}

/** One batch of the product's jar size holding every jar asked for, in its state. */
export async function addJars(
  product: Product,
  { sealed = 0, opened = [], finishedOn = [], cannedOn = '2026-09-01' }: JarsWanted,
) {
  const capacity = jarCapacityTbsp(product.jarSize);
  const total = sealed + opened.length + finishedOn.length;
  const batch = await Batch.create({
    householdId: product.householdId,
    productId: product.id,
    cannedOn,
    jarSize: product.jarSize,
    jarsFilled: total,
    jarsSealed: total,
    method: 'boiling-water',
    altitudeFt: 2350,
    minutes: 10,
  });
  const base = {
    householdId: product.householdId,
    batchId: batch.id,
    productId: product.id,
    capacityTbsp: capacity,
    bestBy: addMonths(cannedOn, 12),
  };
  return Jar.bulkCreate([
    ...Array.from({ length: sealed }, () => ({
      ...base,
      code: code(),
      state: 'sealed' as const,
      remainingTbsp: capacity,
    })),
    ...opened.map((jar) => ({ ...base, code: code(), state: 'opened' as const, ...jar })),
    ...finishedOn.map((day) => ({
      ...base,
      code: code(),
      state: 'finished' as const,
      remainingTbsp: 0,
      finishedOn: day,
    })),
  ]);
}

/** A planned meal on `date` paired with the product: tbspPerServing x servings tablespoons. */
export async function planPortion(
  product: Product,
  date: string,
  {
    tbspPerServing,
    servings,
    slot = 'dinner' as const,
    title = 'Supper',
  }: { tbspPerServing: number; servings: number; slot?: 'breakfast' | 'lunch' | 'dinner' | 'snack'; title?: string },
) {
  const position = await PlanEntry.count({ where: { householdId: product.householdId, date, slot } });
  const entry = await PlanEntry.create({ householdId: product.householdId, date, slot, position, title, servings });
  await Pairing.create({
    householdId: product.householdId,
    planEntryId: entry.id,
    productId: product.id,
    tbspPerServing,
  });
  return entry;
}

/**
 * Apple butter as in the USDA Complete Guide to Home Canning (2015), Guide 2, from memory:
 * 8 lb apples, 2 cups cider, 2 cups vinegar, 2 1/4 cups each white and brown sugar, 2 tbsp cinnamon,
 * 1 tbsp ground cloves; about 8 pints; half-pints or pints 5 minutes at 0-1,000 ft in a boiling-water canner.
 */
export const APPLE_BUTTER_INGREDIENTS: RecipeIngredient[] = [
  { name: 'apples', amount: 8, unit: 'lb', role: 'produce' },
  { name: 'apple cider', amount: 2, unit: 'cup', role: 'other' },
  { name: 'cider vinegar (5% acidity)', amount: 2, unit: 'cup', role: 'acid' },
  { name: 'white sugar', amount: 2.25, unit: 'cup', role: 'sweetener' },
  { name: 'brown sugar', amount: 2.25, unit: 'cup', role: 'sweetener' },
  { name: 'ground cinnamon', amount: 2, unit: 'tbsp', role: 'spice' },
  { name: 'ground cloves', amount: 1, unit: 'tbsp', role: 'spice' },
];

export function addAppleButterRecipe(product: Product) {
  return Recipe.create({
    householdId: product.householdId,
    productId: product.id,
    name: 'Apple butter (USDA Guide 2)',
    yieldJars: 8,
    yieldJarSize: 'pint',
    ingredients: APPLE_BUTTER_INGREDIENTS,
    acidified: true,
    method: 'boiling-water',
    baseMinutes: { 'half-pint': 5, pint: 5 },
    headspaceInches: 0.25,
    source: 'USDA Complete Guide to Home Canning (2015), Guide 2, from memory',
  });
}
