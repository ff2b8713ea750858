import { queryOptions, useQuery } from '@tanstack/react-query';
import type { RecipeView } from '@shared/schemas/recipes';
import { api } from '@/lib/api-client';
import { shelfKeys } from '@/lib/query-keys';

export const getRecipes = (hid: string) =>
  api.get<{ recipes: RecipeView[] }>(`/households/${hid}/recipes`).then((r) => r.recipes);
export const recipesQueryOptions = (hid: string) =>
  queryOptions({ queryKey: shelfKeys.recipes(hid), queryFn: () => getRecipes(hid) });
export const useRecipes = (hid: string) => useQuery(recipesQueryOptions(hid));

export const getRecipe = (hid: string, recipeId: string) =>
  api.get<{ recipe: RecipeView }>(`/households/${hid}/recipes/${recipeId}`).then((r) => r.recipe);
export const recipeQueryOptions = (hid: string, recipeId: string) =>
  queryOptions({ queryKey: shelfKeys.recipe(hid, recipeId), queryFn: () => getRecipe(hid, recipeId) });
export const useRecipe = (hid: string, recipeId: string) => useQuery(recipeQueryOptions(hid, recipeId));
