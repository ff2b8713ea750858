// The seal check in the demo: a batch of salsa verde that came out of the canner last night, its seals ready to check.
import { recipeProcessingPlan } from '../../shared/processing-plan';
import { SEAL_CHECK_AFTER_HOURS } from '../../shared/domain';
import { Product, Recipe } from '../db/models';
import { clock, todayIn } from '../services/clock';
import { writeBatch } from '../services/shelf/write-batch';
import type { DemoSeedContext } from './features';

/** Processed an hour more than the cooling time before the demo is seeded, so its check is due when the demo opens. */
export const DEMO_SEAL_CHECK = { product: 'Roasted Salsa Verde', jars: 4, hoursAgo: SEAL_CHECK_AFTER_HOURS + 1 };

export async function seedSealCheck({ households, members, transaction }: DemoSeedContext) {
  const calloway = households['Calloway Hollow'];
  const product = await Product.findOne({
    where: { householdId: calloway.id, name: DEMO_SEAL_CHECK.product },
    transaction,
  });
  const recipe = product
    ? await Recipe.findOne({ where: { householdId: calloway.id, productId: product.id }, transaction })
    : null;
  if (!product || !recipe) return;
  const processedAt = new Date(clock.now().getTime() - DEMO_SEAL_CHECK.hoursAgo * 3_600_000);
  const plan = recipeProcessingPlan(recipe, {
    jarSize: 'pint',
    method: 'boiling-water',
    altitudeFt: calloway.altitudeFt,
  });
  await writeBatch(
    calloway,
    product,
    {
      productId: product.id,
      recipeId: recipe.id,
      cannedOn: todayIn(calloway.timeZone, processedAt),
      jarSize: 'pint',
      jarsFilled: DEMO_SEAL_CHECK.jars,
      jarsSealed: DEMO_SEAL_CHECK.jars,
      method: 'boiling-water',
      minutes: plan.minutes,
      pressurePsi: plan.pressurePsi,
      headspaceInches: recipe.headspaceInches,
      notes: 'The last tomatillos of the year; processed after supper.',
    },
    members['cook@larderly.test'].id,
    transaction,
    processedAt,
  );
}
