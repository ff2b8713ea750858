import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { ProductPatch, ProductView } from '@shared/schemas/products';
import { shelfKeys } from '@/lib/query-keys';
import { refreshPlanning } from '@/features/todos';
import { api } from '@/lib/api-client';

type RestockSettings = Pick<ProductPatch, 'favourite' | 'minJars'>;

/** Favourite and minimum jars go through the shelf's own product PATCH. */
export const updateRestockSettings = (hid: string, productId: string, patch: RestockSettings) =>
  api.patch<{ product: ProductView }>(`/households/${hid}/products/${productId}`, patch).then((r) => r.product);

export function useUpdateRestockSettings(hid: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: ({ productId, patch }: { productId: string; patch: RestockSettings }) =>
      updateRestockSettings(hid, productId, patch),
    onSettled: () =>
      Promise.all([
        refreshPlanning(queryClient, hid),
        queryClient.invalidateQueries({ queryKey: shelfKeys.products(hid) }),
      ]),
  });
}
