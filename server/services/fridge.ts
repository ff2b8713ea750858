import { daysBetween, UNSEALED_JAR_ADVICE } from '../../shared/domain';
import type { FridgeJar, FridgeView } from '../../shared/schemas/fridge';
import { Jar } from '../db/models';
import { allocatePlan, productsOf } from './plan-allocation';

/** The household's opened jars, soonest use-by first, with what the plan leaves in each on its use-by. */
export async function viewFridge(householdId: string, today: string): Promise<FridgeView> {
  const opened = await Jar.findAll({
    where: { householdId, state: 'opened' },
    order: [
      ['useBy', 'ASC'],
      ['code', 'ASC'],
    ],
  });
  const products = await productsOf(householdId);
  const lastUseBy = opened.reduce((last, jar) => (jar.useBy! > last ? jar.useBy! : last), today);
  const plan = opened.length ? await allocatePlan(householdId, today, lastUseBy, products) : null;
  const draws = new Map<string, number>();
  for (const { jarId, tbsp } of plan?.allocation.assignments ?? [])
    if (jarId !== null) draws.set(String(jarId), (draws.get(String(jarId)) ?? 0) + tbsp);

  const jars: FridgeJar[] = opened.map((jar) => {
    const product = products.get(jar.productId)!;
    const plannedTbsp = Math.min(draws.get(jar.id) ?? 0, jar.remainingTbsp);
    return {
      jarId: jar.id,
      code: jar.code,
      productId: jar.productId,
      productName: product.name,
      productColour: product.colour,
      openedOn: jar.openedOn!,
      useBy: jar.useBy!,
      daysOpen: daysBetween(jar.openedOn!, today),
      daysLeft: daysBetween(today, jar.useBy!),
      unsealed: jar.unsealed,
      capacityTbsp: jar.capacityTbsp,
      remainingTbsp: jar.remainingTbsp,
      plannedTbsp,
      estimateTbsp: jar.remainingTbsp - plannedTbsp,
      estimateFrom: plan?.plannedProducts.has(jar.productId) ? 'plan' : 'jar',
    };
  });
  return { today, jars, unsealedAdvice: UNSEALED_JAR_ADVICE };
}
