import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { FridgeView } from '@shared/schemas/fridge';
import { actOnJar, useOfferJarUndo } from '@/features/shelf';
import { useOptimisticCache } from '@/lib/optimistic';
import { fridgeKeys, householdKeys } from '@/lib/query-keys';

export type ClosingAction = 'finish' | 'discard';

/** The shelf's own jar actions; the fridge only offers finishing and discarding. */
export function useCloseJar(hid: string) {
  const queryClient = useQueryClient();
  const offerUndo = useOfferJarUndo(hid);
  const optimistic = useOptimisticCache<FridgeView, { jarId: string }>({
    key: fridgeKeys.fridge(hid),
    edit: (fridge, { jarId }) => ({ ...fridge, jars: fridge.jars.filter((j) => j.jarId !== jarId) }),
    // The shelf, Today and the week all count this jar, so every household query refreshes.
    refresh: () => queryClient.invalidateQueries({ queryKey: householdKeys.all(hid) }),
  });
  return useMutation({
    mutationFn: ({ jarId, action }: { jarId: string; action: ClosingAction }) => actOnJar(hid, jarId, action),
    ...optimistic,
    onSuccess: (acted, { action }) => offerUndo(action, acted),
  });
}
