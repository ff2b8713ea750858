import { queryOptions, useQuery } from '@tanstack/react-query';
import type { ProductView } from '@shared/schemas/products';
import { api } from '@/lib/api-client';
import { shelfKeys } from '@/lib/query-keys';

export const getProducts = (hid: string) =>
  api.get<{ products: ProductView[] }>(`/households/${hid}/products`).then((r) => r.products);

export const productsQueryOptions = (hid: string) =>
  queryOptions({ queryKey: shelfKeys.products(hid), queryFn: () => getProducts(hid) });

export const useProducts = (hid: string) => useQuery(productsQueryOptions(hid));
