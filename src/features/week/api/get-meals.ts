import { queryOptions, useQuery } from '@tanstack/react-query';
import type { MealView } from '@shared/schemas/week';
import { api } from '@/lib/api-client';
import { weekKeys } from '@/lib/query-keys';

export const getMeals = (hid: string) =>
  api.get<{ meals: MealView[] }>(`/households/${hid}/meals`).then((r) => r.meals);

export const mealsQueryOptions = (hid: string) =>
  queryOptions({ queryKey: weekKeys.meals(hid), queryFn: () => getMeals(hid) });

export const useMeals = (hid: string) => useQuery(mealsQueryOptions(hid));
