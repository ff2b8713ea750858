import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { RestockProductPatch } from '@shared/schemas/restock';
import { api } from '@/lib/api-client';
import { refreshPlanning } from '@/features/todos/api/refresh-planning';
import { restockKeys } from './get-restock';

export const updateRestockProduct = (hid: string, productId: string, patch: RestockProductPatch) =>
  api.patch<{ product: { id: string; favourite: boolean; minJars: number } }>(`/households/${hid}/restock/${productId}`, patch);

export function useUpdateRestockProduct(hid: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: ({ productId, patch }: { productId: string; patch: RestockProductPatch }) => updateRestockProduct(hid, productId, patch),
    onSettled: () => refreshPlanning(queryClient, hid),
  });
}
