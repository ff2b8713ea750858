import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { FridgeView } from '@shared/schemas/fridge';
import { api } from '@/lib/api-client';
import { fridgeKeys } from './get-fridge';

export type ClosingAction = 'finish' | 'discard';

/** The shelf's own jar actions; the fridge only offers finishing and discarding. */
export const closeJar = (hid: string, jarId: string, action: ClosingAction) => api.post(`/households/${hid}/jars/${jarId}/${action}`);

export function useCloseJar(hid: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: ({ jarId, action }: { jarId: string; action: ClosingAction }) => closeJar(hid, jarId, action),
    onMutate: async ({ jarId }) => {
      await queryClient.cancelQueries({ queryKey: fridgeKeys.fridge(hid) });
      const before = queryClient.getQueryData<FridgeView>(fridgeKeys.fridge(hid));
      if (before) queryClient.setQueryData(fridgeKeys.fridge(hid), { ...before, jars: before.jars.filter((j) => j.jarId !== jarId) });
      return { before };
    },
    onError: (_error, _input, context) => {
      if (context?.before) queryClient.setQueryData(fridgeKeys.fridge(hid), context.before);
    },
    // The shelf, Today and the week all count this jar, so every household query refreshes.
    onSettled: () => queryClient.invalidateQueries({ queryKey: ['households', hid] }),
  });
}
