import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { JarAction, JarActed } from '@shared/schemas/batches';
import { api } from '@/lib/api-client';
import { householdKeys, shelfKeys } from '@/lib/query-keys';
import { useOfferJarUndo } from './undo-jar-change';

export const actOnJar = (hid: string, jarId: string, action: JarAction) => api.post<JarActed>(`/households/${hid}/jars/${jarId}/${action}`);

export function useActOnJar(hid: string) {
  const queryClient = useQueryClient();
  const offerUndo = useOfferJarUndo(hid);
  return useMutation({
    mutationFn: ({ jarId, action }: { jarId: string; action: JarAction }) => actOnJar(hid, jarId, action),
    onSuccess: (acted, { action }) => offerUndo(action, acted),
    // Also after a 409: someone else moved the jar, so every view of it should catch up.
    onSettled: () => {
      void queryClient.invalidateQueries({ queryKey: householdKeys.all(hid) });
      void queryClient.invalidateQueries({ queryKey: shelfKeys.jarsByCode() });
    },
  });
}
