// Demo week: Calloway Hollow's own meals and two planned weeks (this one and the next) around today.
import { addDays } from '../../shared/domain';
import { weekStartOf, type Slot } from '../../shared/schemas/week';
import { Jar, Meal, MealProduct, Membership, Pairing, PlanEntry, Product } from '../db/models';
import type { DemoSeedContext } from './features';

interface DemoMeal {
  name: string;
  tags: string[];
  usualServings: number;
  /** demo product name -> tablespoons per serving (our own portions, not a published figure) */
  products: Record<string, number>;
}

const MEALS: DemoMeal[] = [
  {
    name: 'Oatmeal with pear butter',
    tags: ['breakfast', 'quick'],
    usualServings: 3,
    products: { 'Spiced Pear Butter': 1.5 },
  },
  { name: 'Yogurt and jam', tags: ['breakfast', 'snack'], usualServings: 2, products: { 'Rhubarb-Ginger Jam': 1 } },
  {
    name: 'Cheddar and chutney toasties',
    tags: ['lunch', 'quick'],
    usualServings: 3,
    products: { 'Green Tomato Chutney': 1 },
  },
  {
    name: 'Grain bowls with pickles',
    tags: ['lunch'],
    usualServings: 3,
    products: { 'Dilly Carrots': 2, 'Pickled Beets': 2 },
  },
  {
    name: 'Grilled cheese and tomato jam',
    tags: ['lunch', 'quick'],
    usualServings: 2,
    products: { 'Smoky Tomato Jam': 1 },
  },
  {
    name: 'Garden burgers',
    tags: ['dinner', 'weekend'],
    usualServings: 4,
    products: { 'Sweet Corn Relish': 1.5, 'Bread-and-Butter Zucchini Pickles': 2 },
  },
  { name: 'Black bean tacos', tags: ['dinner', 'spicy'], usualServings: 3, products: { 'Roasted Salsa Verde': 2 } },
  {
    name: 'Roast chicken and greens',
    tags: ['dinner', 'sunday'],
    usualServings: 4,
    products: { 'Apple-Cranberry Sauce': 2 },
  },
  { name: 'Chili with cornbread', tags: ['dinner', 'spicy'], usualServings: 4, products: { 'Hot Pepper Jelly': 1 } },
  { name: 'Pork meatballs', tags: ['dinner'], usualServings: 3, products: { 'Plum Ketchup': 1.5 } },
  { name: 'Baked potatoes with chutney', tags: ['lunch'], usualServings: 2, products: { 'Green Tomato Chutney': 1.5 } },
  { name: 'Lentil soup and bread', tags: ['lunch', 'quick'], usualServings: 3, products: {} },
  { name: 'Cheese and crackers', tags: ['snack'], usualServings: 2, products: { 'Green Tomato Chutney': 1 } },
];

/** Day offset from the week start -> the meals of each slot, for two weeks. */
const PLAN: [number, Slot, string][] = [
  [0, 'breakfast', 'Oatmeal with pear butter'],
  [0, 'lunch', 'Cheddar and chutney toasties'],
  [0, 'dinner', 'Pork meatballs'],
  [1, 'lunch', 'Grain bowls with pickles'],
  [1, 'dinner', 'Black bean tacos'],
  [2, 'breakfast', 'Yogurt and jam'],
  [2, 'lunch', 'Grilled cheese and tomato jam'],
  [2, 'dinner', 'Roast chicken and greens'],
  [3, 'lunch', 'Cheddar and chutney toasties'],
  [3, 'dinner', 'Chili with cornbread'],
  [3, 'snack', 'Cheese and crackers'],
  [4, 'breakfast', 'Oatmeal with pear butter'],
  [4, 'dinner', 'Garden burgers'],
  [5, 'lunch', 'Grain bowls with pickles'],
  [5, 'dinner', 'Pork meatballs'],
  [5, 'snack', 'Yogurt and jam'],
  [6, 'breakfast', 'Oatmeal with pear butter'],
  [6, 'dinner', 'Roast chicken and greens'],
  [7, 'breakfast', 'Yogurt and jam'],
  [7, 'lunch', 'Cheddar and chutney toasties'],
  [7, 'dinner', 'Black bean tacos'],
  [8, 'lunch', 'Grilled cheese and tomato jam'],
  [8, 'dinner', 'Garden burgers'],
  [9, 'breakfast', 'Oatmeal with pear butter'],
  [9, 'dinner', 'Pork meatballs'],
  [10, 'lunch', 'Grain bowls with pickles'],
  [10, 'dinner', 'Chili with cornbread'],
  [10, 'snack', 'Cheese and crackers'],
  [11, 'dinner', 'Roast chicken and greens'],
  [12, 'breakfast', 'Yogurt and jam'],
  [12, 'lunch', 'Cheddar and chutney toasties'],
  [12, 'dinner', 'Garden burgers'],
  [13, 'breakfast', 'Oatmeal with pear butter'],
  [13, 'dinner', 'Pork meatballs'],
];

/** Meals the spicy-shy member sits out: the keeper and the cook eat them. */
const GROWN_UPS_ONLY = new Set(['Black bean tacos']);

export async function seedWeek({ households, members, transaction, today }: DemoSeedContext) {
  const household = households['Calloway Hollow'];
  const hid = household.id;
  const t = { transaction };
  const products = new Map((await Product.findAll({ where: { householdId: hid }, ...t })).map((p) => [p.name, p]));

  // Juniper keeps to mild food; Wren eats low salt: the board shows their flags.
  await Membership.update(
    { heatTolerance: 1 },
    { where: { householdId: hid, userId: members['helper@larderly.test'].id }, ...t },
  );
  await Membership.update(
    { heatTolerance: 3, dietTags: ['low-salt'] },
    { where: { householdId: hid, userId: members['keeper@larderly.test'].id }, ...t },
  );

  const meals = new Map<string, { meal: Meal; products: { productId: string; tbspPerServing: number }[] }>();
  for (const demo of MEALS) {
    const meal = await Meal.create(
      { householdId: hid, name: demo.name, tags: demo.tags, usualServings: demo.usualServings },
      t,
    );
    // A product the shelf did not seed is simply left unpaired.
    const paired = Object.entries(demo.products).flatMap(([name, tbspPerServing]) => {
      const product = products.get(name);
      return product ? [{ productId: product.id, tbspPerServing }] : [];
    });
    await MealProduct.bulkCreate(
      paired.map((p) => ({ householdId: hid, mealId: meal.id, ...p })),
      t,
    );
    meals.set(demo.name, { meal, products: paired });
  }

  const start = weekStartOf(today, household.weekStartsOn);
  const grownUps = [members['keeper@larderly.test'].id, members['cook@larderly.test'].id];
  const positions = new Map<string, number>();
  for (const [offset, slot, name] of PLAN) {
    const { meal, products: paired } = meals.get(name)!;
    const date = addDays(start, offset);
    const position = positions.get(`${date}|${slot}`) ?? 0;
    positions.set(`${date}|${slot}`, position + 1);
    const entry = await PlanEntry.create(
      {
        householdId: hid,
        date,
        slot,
        position,
        title: meal.name,
        mealId: meal.id,
        servings: meal.usualServings,
        eaters: GROWN_UPS_ONLY.has(name) ? grownUps : null,
      },
      t,
    );
    await Pairing.bulkCreate(
      paired.map((p) => ({ householdId: hid, planEntryId: entry.id, ...p })),
      t,
    );
  }
  await makeSureOfAWarning(hid, products, start, today, transaction);
}

/** A supper for the neighbors this week asks more of the lowest-stocked preserve than the shelf holds: a `short` warning to act on. */
async function makeSureOfAWarning(
  hid: string,
  products: Map<string, Product>,
  start: string,
  today: string,
  transaction: DemoSeedContext['transaction'],
) {
  if (products.size === 0) return;
  const jars = await Jar.findAll({ where: { householdId: hid, state: ['sealed', 'opened'] }, transaction });
  const onHand = (productId: string) =>
    jars.filter((j) => j.productId === productId).reduce((sum, j) => sum + j.remainingTbsp, 0);
  const product = [...products.values()].sort((a, b) => onHand(a.id) - onHand(b.id) || a.name.localeCompare(b.name))[0];
  const servings = 12;
  const tbspPerServing = Math.min(64, Math.ceil((onHand(product.id) + 4) / servings));
  const weekEnd = addDays(start, 6);
  const date = addDays(today, 1) <= weekEnd ? addDays(today, 1) : today;
  const position = await PlanEntry.count({ where: { householdId: hid, date, slot: 'dinner' }, transaction });
  const entry = await PlanEntry.create(
    { householdId: hid, date, slot: 'dinner', position, title: 'Harvest supper for the neighbors', servings },
    { transaction },
  );
  await Pairing.create(
    { householdId: hid, planEntryId: entry.id, productId: product.id, tbspPerServing },
    { transaction },
  );
}
