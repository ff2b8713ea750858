import { onlineManager, useMutation } from '@tanstack/react-query';
import { useState } from 'react';
import type { JarActed } from '@shared/schemas/batches';
import type { FridgeView } from '@shared/schemas/fridge';
import { jarChange, jarChangeDefaults, useOfferJarUndo, type ActedJar, type JarChange } from '@/features/shelf';
import { useOptimisticCache } from '@/lib/optimistic';
import { changeKeys, fridgeKeys, householdKeys } from '@/lib/query-keys';

export type ClosingAction = 'finish' | 'discard';

/** The shelf's own jar actions; the fridge only offers finishing and discarding. Offline they wait their turn. */
export function useCloseJar(hid: string) {
  const offerUndo = useOfferJarUndo(hid);
  const optimistic = useOptimisticCache<FridgeView, JarChange>({
    key: fridgeKeys.fridge(hid),
    hold: householdKeys.all(hid),
    edit: (fridge, { jarId }) => ({ ...fridge, jars: fridge.jars.filter((j) => j.jarId !== jarId) }),
  });
  // The shelf, Today and the week all count this jar: the queue refetches every household query once it is sent.
  const mutation = useMutation<JarActed, Error, JarChange, { previous?: FridgeView }>({
    mutationKey: changeKeys.jarAction,
    ...jarChangeDefaults,
    ...optimistic,
    onSuccess: (acted, { action }) => offerUndo(action, acted),
  });
  // A refusal of a change made offline is told by the offline banner alone.
  const [madeOffline, setMadeOffline] = useState(false);
  return {
    ...mutation,
    error: madeOffline ? null : mutation.error,
    isSending: mutation.isPending && !mutation.isPaused,
    close: (jar: ActedJar, action: ClosingAction, kept?: boolean) => {
      setMadeOffline(!onlineManager.isOnline());
      mutation.mutate(jarChange(hid, jar, action, kept));
    },
  };
}
