import type { RecipeCreate, RecipePatch } from '../../../shared/schemas/recipes';
import { Product, Recipe } from '../../db/models';
import { notFound } from '../../http/errors';
import { findProduct } from './products';
import { recipeView } from './views';

export async function listRecipes(householdId: string) {
  const [recipes, products] = await Promise.all([
    Recipe.findAll({ where: { householdId }, order: [['name', 'ASC']] }),
    Product.findAll({ where: { householdId }, attributes: ['id', 'name'] }),
  ]);
  const names = new Map(products.map((p) => [p.id, p.name]));
  return recipes.map((recipe) => recipeView(recipe, names.get(recipe.productId) ?? ''));
}

export async function findRecipe(householdId: string, recipeId: string) {
  const recipe = await Recipe.findOne({ where: { householdId, id: recipeId } });
  if (!recipe) throw notFound('That recipe');
  return recipe;
}

export async function viewRecipe(householdId: string, recipeId: string) {
  const recipe = await findRecipe(householdId, recipeId);
  const product = await findProduct(householdId, recipe.productId);
  return recipeView(recipe, product.name);
}

export async function createRecipe(householdId: string, input: RecipeCreate) {
  const product = await findProduct(householdId, input.productId);
  const recipe = await Recipe.create({ householdId, ...input, acidified: input.acidified ?? false });
  return recipeView(recipe, product.name);
}

export async function updateRecipe(householdId: string, recipeId: string, patch: RecipePatch) {
  const recipe = await findRecipe(householdId, recipeId);
  const product = await findProduct(householdId, patch.productId ?? recipe.productId);
  await recipe.update(patch);
  return recipeView(recipe, product.name);
}
