import { Op } from 'sequelize';
import {
  allocateWeek,
  daysBetween,
  defaultUseWithinDays,
  type AllocationJar,
  type PlannedPortion,
  type WeekAllocation,
} from '../../shared/domain';
import { Jar, Pairing, PlanEntry, Product } from '../db/models';

export const useWithinOf = (product: Product) => product.useWithinDays ?? defaultUseWithinDays(product.kind);

/**
 * How many days an opened jar keeps in the allocation: from its own use-by (the date the fridge shows, set when it
 * was opened, shorter for an unsealed jar) rather than the product's rule now, which may have changed since.
 */
export function keepsDays(
  openedOn: string | null | undefined,
  useBy: string | null | undefined,
  productDays: number,
): number {
  return openedOn && useBy && useBy >= openedOn ? daysBetween(openedOn, useBy) : productDays;
}

/** Every paired portion planned from `from` to `until`, both included. */
async function plannedPortions(householdId: string, from: string, until: string): Promise<PlannedPortion[]> {
  const entries = await PlanEntry.findAll({
    where: { householdId, date: { [Op.between]: [from, until] } },
    include: [{ model: Pairing, as: 'pairings', required: true }],
  });
  return entries.flatMap((entry) =>
    (entry.pairings ?? []).map((pairing) => ({
      id: pairing.id,
      date: entry.date,
      productId: pairing.productId,
      tbsp: pairing.tbspPerServing * entry.servings,
    })),
  );
}

/**
 * The domain's week allocation over the plan tables, from today to `until`:
 * null when nothing with a product is planned, so callers fall back to what is in the jars.
 */
export async function allocatePlan(
  householdId: string,
  today: string,
  until: string,
  products: Map<string, Product>,
): Promise<{ allocation: WeekAllocation; plannedProducts: Set<string> } | null> {
  const portions = await plannedPortions(householdId, today, until);
  if (portions.length === 0) return null;
  const plannedProducts = new Set(portions.map((p) => String(p.productId)));
  const shelf = await Jar.findAll({
    where: { householdId, state: ['sealed', 'opened'], productId: [...plannedProducts] },
  });
  const jars: AllocationJar[] = shelf.flatMap((jar) => {
    const product = products.get(jar.productId);
    if (!product) return [];
    const state = jar.state as AllocationJar['state'];
    return [
      {
        id: jar.id,
        productId: jar.productId,
        state,
        capacityTbsp: jar.capacityTbsp,
        remainingTbsp: jar.remainingTbsp,
        bestBy: jar.bestBy,
        openedOn: jar.openedOn ?? undefined,
        useWithinDays: keepsDays(jar.openedOn, jar.useBy, useWithinOf(product)),
      },
    ];
  });
  return { allocation: allocateWeek({ today, jars, portions }), plannedProducts };
}

export async function productsOf(householdId: string) {
  return new Map((await Product.findAll({ where: { householdId } })).map((p) => [p.id, p]));
}
