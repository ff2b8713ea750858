// Shelf places in the demo: Calloway Hollow keeps its jars in three places of its own; one jar was moved last week.
import { QueryTypes } from 'sequelize';
import { addDays } from '../../shared/domain';
import { Jar, JarEvent, Place, Product } from '../db/models';
import type { DemoSeedContext } from './features';

/** Each place, and the products whose usual place it is. */
export const DEMO_PLACES: Record<string, { place: string; products: string[] }[]> = {
  'Calloway Hollow': [
    {
      place: 'Stone cellar, low rack',
      products: ['Pickled Beets', 'Dilly Carrots', 'Bread-and-Butter Zucchini Pickles', 'Sweet Corn Relish'],
    },
    {
      place: 'Pantry shelf',
      products: ['Spiced Pear Butter', 'Smoky Tomato Jam', 'Hot Pepper Jelly', 'Rhubarb-Ginger Jam'],
    },
    {
      place: 'the cupboard under the porch steps',
      products: ['Green Tomato Chutney', 'Roasted Salsa Verde', 'Plum Ketchup', 'Apple-Cranberry Sauce'],
    },
  ],
  'Marsh End Cottage': [{ place: 'Back hall shelf', products: ['Marsh End Bread Pickles', 'Crabapple Jelly'] }],
};

/** The oldest batch of this product sits apart from the rest, so "open the oldest jar" has somewhere to point. */
export const DEMO_OLDEST_APART = { product: 'Pickled Beets', place: 'the cupboard under the porch steps' };

export async function seedPlaces({ households, members, transaction, today }: DemoSeedContext) {
  for (const [householdName, places] of Object.entries(DEMO_PLACES)) {
    const household = households[householdName];
    if (!household) continue;
    const made = new Map<string, Place>();
    for (const { place: name, products } of places) {
      const place = await Place.create({ householdId: household.id, name }, { transaction });
      made.set(name, place);
      const ids = (
        await Product.findAll({ where: { householdId: household.id, name: products }, attributes: ['id'], transaction })
      ).map((p) => p.id);
      await Product.update({ defaultPlaceId: place.id }, { where: { id: ids }, transaction });
      await Jar.update({ placeId: place.id }, { where: { productId: ids }, transaction });
    }
    if (householdName !== 'Calloway Hollow') continue;
    const apart = made.get(DEMO_OLDEST_APART.place)!;
    const [oldest] = await Jar.sequelize!.query<{ batch_id: string }>(
      `SELECT b.id AS batch_id FROM batches b JOIN products p ON p.id = b.product_id
       WHERE p.household_id = $1 AND p.name = $2 AND EXISTS (SELECT 1 FROM jars j WHERE j.batch_id = b.id AND j.state = 'sealed')
       ORDER BY b.canned_on LIMIT 1`,
      { bind: [household.id, DEMO_OLDEST_APART.product], type: QueryTypes.SELECT, transaction },
    );
    if (!oldest) continue;
    const jars = await Jar.findAll({ where: { batchId: oldest.batch_id, state: 'sealed' }, transaction });
    await Jar.update({ placeId: apart.id }, { where: { id: jars.map((j) => j.id) }, transaction });
    const from = made.get(DEMO_PLACES[householdName][0].place)!;
    await JarEvent.bulkCreate(
      jars.map((jar) => ({
        householdId: household.id,
        jarId: jar.id,
        batchId: jar.batchId,
        kind: 'moved' as const,
        userId: members['keeper@larderly.test'].id,
        happenedOn: addDays(today, -6),
        placeMove: { from: from.name, to: apart.name },
      })),
      { transaction },
    );
  }
}
