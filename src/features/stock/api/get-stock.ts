import { queryOptions, useQuery } from '@tanstack/react-query';
import type { JarStockView } from '@shared/schemas/stock';
import { api } from '@/lib/api-client';
import { stockKeys } from '@/lib/query-keys';

export const getStock = (hid: string) =>
  api.get<{ stock: JarStockView }>(`/households/${hid}/stock`).then((r) => r.stock);
export const stockQueryOptions = (hid: string) =>
  queryOptions({ queryKey: stockKeys.view(hid), queryFn: () => getStock(hid) });
export const useStock = (hid: string) => useQuery(stockQueryOptions(hid));
