// Pairing a planned meal with a product from the shelf, and the portion per serving.
import type { Sequelize } from 'sequelize';
import { MealProduct, Pairing, PlanEntry, Product } from '../../db/models';
import { conflict, notFound } from '../../http/errors';

/** Common practice in our own kitchen, not a published figure: a tablespoon of relish or jam per serving. */
export const USUAL_TBSP_PER_SERVING = 1;

export async function addPairing(
  sequelize: Sequelize,
  householdId: string,
  planEntryId: string,
  productId: string,
  tbspPerServing?: number,
) {
  return sequelize.transaction(async (transaction) => {
    const entry = await PlanEntry.findOne({
      where: { id: planEntryId, householdId },
      transaction,
      lock: transaction.LOCK.UPDATE,
    });
    if (!entry) throw notFound('That planned meal');
    const product = await Product.findOne({
      where: { id: productId, householdId },
      attributes: ['id', 'name'],
      transaction,
    });
    if (!product) throw notFound('That product');
    if (await Pairing.count({ where: { planEntryId, productId }, transaction })) {
      throw conflict(`${entry.title} is already paired with ${product.name}. Change its portion instead.`);
    }
    // The meal's usual portion of this product, where the library knows one.
    const usual = entry.mealId
      ? await MealProduct.findOne({ where: { mealId: entry.mealId, productId }, transaction })
      : null;
    return Pairing.create(
      {
        householdId,
        planEntryId,
        productId,
        tbspPerServing: tbspPerServing ?? usual?.tbspPerServing ?? USUAL_TBSP_PER_SERVING,
      },
      { transaction },
    );
  });
}

export async function updatePairing(householdId: string, id: string, tbspPerServing: number) {
  const [count] = await Pairing.update({ tbspPerServing }, { where: { id, householdId } });
  if (!count) throw notFound('That pairing');
}

export async function deletePairing(householdId: string, id: string) {
  const count = await Pairing.destroy({ where: { id, householdId } });
  if (!count) throw notFound('That pairing');
}
