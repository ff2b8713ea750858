import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { JarStockView, StockCorrection } from '@shared/schemas/stock';
import { api } from '@/lib/api-client';
import { householdKeys, stockKeys } from '@/lib/query-keys';

export const correctStock = (hid: string, correction: StockCorrection) =>
  api.post<{ stock: JarStockView }>(`/households/${hid}/stock/correction`, correction).then((r) => r.stock);

/** A count set by hand; the batch plans read the stock too, so every household view refreshes. */
export function useCorrectStock(hid: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (correction: StockCorrection) => correctStock(hid, correction),
    onSuccess: (stock) => {
      queryClient.setQueryData(stockKeys.view(hid), stock);
      void queryClient.invalidateQueries({ queryKey: householdKeys.all(hid) });
    },
  });
}
