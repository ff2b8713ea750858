// The meal library: meals the household makes, with the products they usually go with.
import type { Sequelize, Transaction } from 'sequelize';
import type { MealBody, MealPatch, MealView } from '../../../shared/schemas/week';
import { Meal, MealProduct, Product } from '../../db/models';
import { AppError, notFound } from '../../http/errors';

type MealWithProducts = Meal & { products?: MealProduct[] };

function view(meal: MealWithProducts): MealView {
  return {
    id: meal.id,
    name: meal.name,
    tags: meal.tags,
    usualServings: meal.usualServings,
    notes: meal.notes,
    products: (meal.products ?? []).map((p) => ({ productId: p.productId, tbspPerServing: p.tbspPerServing })),
  };
}

export async function listMeals(householdId: string) {
  const meals = await Meal.findAll({
    where: { householdId },
    include: [{ model: MealProduct, as: 'products' }],
    order: [
      ['name', 'ASC'],
      ['id', 'ASC'],
    ],
  });
  return meals.map(view);
}

async function findMeal(householdId: string, id: string, transaction?: Transaction) {
  const meal = await Meal.findOne({
    where: { id, householdId },
    include: [{ model: MealProduct, as: 'products' }],
    transaction,
  });
  if (!meal) throw notFound('That meal');
  return meal;
}

async function replaceProducts(
  householdId: string,
  mealId: string,
  products: NonNullable<MealBody['products']>,
  transaction: Transaction,
) {
  const ids = [...new Set(products.map((p) => p.productId))];
  if (ids.length !== products.length)
    throw new AppError(400, 'invalid_input', 'List each product once.', { products: 'List each product once.' });
  if (ids.length && (await Product.count({ where: { id: ids, householdId }, transaction })) !== ids.length) {
    throw new AppError(400, 'invalid_input', 'One of those products is not on this household’s list.', {
      products: 'Choose products of this household.',
    });
  }
  await MealProduct.destroy({ where: { mealId, householdId }, transaction });
  await MealProduct.bulkCreate(
    products.map((p) => ({ householdId, mealId, productId: p.productId, tbspPerServing: p.tbspPerServing })),
    { transaction },
  );
}

export async function createMeal(sequelize: Sequelize, householdId: string, body: MealBody) {
  const id = await sequelize.transaction(async (transaction) => {
    const meal = await Meal.create(
      { householdId, name: body.name, tags: body.tags, usualServings: body.usualServings, notes: body.notes },
      { transaction },
    );
    await replaceProducts(householdId, meal.id, body.products ?? [], transaction);
    return meal.id;
  });
  return view(await findMeal(householdId, id));
}

export async function updateMeal(sequelize: Sequelize, householdId: string, id: string, patch: MealPatch) {
  await sequelize.transaction(async (transaction) => {
    const meal = await findMeal(householdId, id, transaction);
    const { products, ...fields } = patch;
    await meal.update(fields, { transaction });
    if (products) await replaceProducts(householdId, id, products, transaction);
  });
  return view(await findMeal(householdId, id));
}

/** Planned entries keep their title and pairings; they only lose the link to the library. */
export async function deleteMeal(householdId: string, id: string) {
  const count = await Meal.destroy({ where: { id, householdId } });
  if (!count) throw notFound('That meal');
}
