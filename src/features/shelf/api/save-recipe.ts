import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { RecipeCreate, RecipeView } from '@shared/schemas/recipes';
import { api } from '@/lib/api-client';
import { shelfKeys } from '@/lib/query-keys';

export const saveRecipe = (hid: string, recipeId: string | undefined, recipe: RecipeCreate) =>
  (recipeId
    ? api.patch<{ recipe: RecipeView }>(`/households/${hid}/recipes/${recipeId}`, recipe)
    : api.post<{ recipe: RecipeView }>(`/households/${hid}/recipes`, recipe)
  ).then((r) => r.recipe);

export function useSaveRecipe(hid: string, recipeId?: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (recipe: RecipeCreate) => saveRecipe(hid, recipeId, recipe),
    onSuccess: (recipe) => {
      queryClient.setQueryData(shelfKeys.recipe(hid, recipe.id), recipe);
      void queryClient.invalidateQueries({ queryKey: shelfKeys.recipes(hid) });
    },
  });
}
