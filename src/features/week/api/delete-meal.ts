import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { MealView } from '@shared/schemas/week';
import { api } from '@/lib/api-client';
import { weekKeys } from './keys';

export const deleteMeal = (hid: string, mealId: string) => api.delete(`/households/${hid}/meals/${mealId}`);

export function useDeleteMeal(hid: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (mealId: string) => deleteMeal(hid, mealId),
    onSuccess: (_, mealId) => queryClient.setQueryData<MealView[]>(weekKeys.meals(hid), (meals) => meals?.filter((m) => m.id !== mealId)),
  });
}
