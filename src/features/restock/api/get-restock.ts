import { queryOptions, useQuery } from '@tanstack/react-query';
import type { RestockView } from '@shared/schemas/restock';
import { api } from '@/lib/api-client';
import { restockKeys } from '@/lib/query-keys';

export const getRestock = (hid: string) => api.get<RestockView>(`/households/${hid}/restock`);

export const restockQueryOptions = (hid: string) =>
  queryOptions({ queryKey: restockKeys.list(hid), queryFn: () => getRestock(hid) });

export const useRestock = (hid: string) => useQuery(restockQueryOptions(hid));
