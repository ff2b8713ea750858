import { randomBytes } from 'node:crypto';
import { addMonths, jarCapacityTbsp, type JarSize, type ProductKind } from '../../shared/domain';
import { Batch, Jar, Product, Recipe } from '../../server/db/models';

/** A product of our own with one batch of sealed jars, made straight through the models. */
export async function productWithJars(
  householdId: string,
  {
    name,
    kind = 'relish',
    heat = 0,
    jars = 1,
    jarSize = 'half-pint',
    cannedOn = '2026-08-20',
  }: { name: string; kind?: ProductKind; heat?: number; jars?: number; jarSize?: JarSize; cannedOn?: string },
) {
  const product = await Product.create({ householdId, name, kind, heat });
  const batch = await Batch.create({
    householdId,
    productId: product.id,
    cannedOn,
    jarSize,
    jarsFilled: Math.max(jars, 1),
    jarsSealed: jars,
    method: 'boiling-water',
    altitudeFt: 2350,
    minutes: 15,
  });
  const capacity = jarCapacityTbsp(jarSize);
  const made = await Jar.bulkCreate(
    Array.from({ length: jars }, () => ({
      householdId,
      batchId: batch.id,
      productId: product.id,
      code: randomBytes(5).toString('hex').toUpperCase().slice(0, 8),
      state: 'sealed' as const,
      capacityTbsp: capacity,
      remainingTbsp: capacity,
      bestBy: addMonths(cannedOn, 12),
    })),
  );
  return { product, batch, jars: made };
}

/** A recipe card with the ingredient lines a diet check reads; no processing numbers are checked here. */
export function recipeFor(
  householdId: string,
  productId: string,
  name: string,
  ingredients: { name: string; role: 'produce' | 'acid' | 'sweetener' | 'spice' | 'other' }[],
) {
  return Recipe.create({
    householdId,
    productId,
    name,
    yieldJars: 4,
    yieldJarSize: 'half-pint',
    ingredients: ingredients.map((i) => ({ ...i, amount: 1, unit: 'cup' as const })),
    method: 'boiling-water',
    baseMinutes: {},
    headspaceInches: 0.5,
  });
}
