import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { MealBody, MealView } from '@shared/schemas/week';
import { api } from '@/lib/api-client';
import { weekKeys } from '@/lib/query-keys';

export const createMeal = (hid: string, meal: MealBody) =>
  api.post<{ meal: MealView }>(`/households/${hid}/meals`, meal).then((r) => r.meal);

export function useCreateMeal(hid: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (meal: MealBody) => createMeal(hid, meal),
    onSuccess: (meal) =>
      queryClient.setQueryData<MealView[]>(weekKeys.meals(hid), (meals) =>
        [...(meals ?? []), meal].sort((a, b) => a.name.localeCompare(b.name)),
      ),
  });
}
