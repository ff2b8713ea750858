import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { ProductCreate, ProductView } from '@shared/schemas/products';
import { api } from '@/lib/api-client';
import { shelfKeys } from '@/lib/query-keys';

export const saveProduct = (hid: string, productId: string | undefined, product: ProductCreate) =>
  (productId
    ? api.patch<{ product: ProductView }>(`/households/${hid}/products/${productId}`, product)
    : api.post<{ product: ProductView }>(`/households/${hid}/products`, product)
  ).then((r) => r.product);

export function useSaveProduct(hid: string, productId?: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (product: ProductCreate) => saveProduct(hid, productId, product),
    // A product's name and opened days show on jars, batches and recipes too.
    onSuccess: () => queryClient.invalidateQueries({ queryKey: shelfKeys.all(hid) }),
  });
}
