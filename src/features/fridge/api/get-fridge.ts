import { queryOptions, useQuery } from '@tanstack/react-query';
import type { FridgeView } from '@shared/schemas/fridge';
import { api } from '@/lib/api-client';
import { fridgeKeys } from '@/lib/query-keys';

export const getFridge = (hid: string) => api.get<FridgeView>(`/households/${hid}/fridge`);

export const fridgeQueryOptions = (hid: string) =>
  queryOptions({ queryKey: fridgeKeys.fridge(hid), queryFn: () => getFridge(hid) });

export const useFridge = (hid: string) => useQuery(fridgeQueryOptions(hid));
