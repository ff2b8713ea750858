import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { FridgeView } from '@shared/schemas/fridge';
import { actOnJar, useOfferJarUndo } from '@/features/shelf';
import { fridgeKeys } from './get-fridge';

export type ClosingAction = 'finish' | 'discard';

/** The shelf's own jar actions; the fridge only offers finishing and discarding. */
export function useCloseJar(hid: string) {
  const queryClient = useQueryClient();
  const offerUndo = useOfferJarUndo(hid);
  return useMutation({
    mutationFn: ({ jarId, action }: { jarId: string; action: ClosingAction }) => actOnJar(hid, jarId, action),
    onMutate: async ({ jarId }) => {
      await queryClient.cancelQueries({ queryKey: fridgeKeys.fridge(hid) });
      const before = queryClient.getQueryData<FridgeView>(fridgeKeys.fridge(hid));
      if (before) queryClient.setQueryData(fridgeKeys.fridge(hid), { ...before, jars: before.jars.filter((j) => j.jarId !== jarId) });
      return { before };
    },
    onError: (_error, _input, context) => {
      if (context?.before) queryClient.setQueryData(fridgeKeys.fridge(hid), context.before);
    },
    onSuccess: (acted, { action }) => offerUndo(action, acted),
    // The shelf, Today and the week all count this jar, so every household query refreshes.
    onSettled: () => queryClient.invalidateQueries({ queryKey: ['households', hid] }),
  });
}
