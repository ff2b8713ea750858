import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { JarAction, JarView } from '@shared/schemas/batches';
import { api } from '@/lib/api-client';

export const actOnJar = (hid: string, jarId: string, action: JarAction) => api.post<{ jar: JarView }>(`/households/${hid}/jars/${jarId}/${action}`).then((r) => r.jar);

export function useActOnJar(hid: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: ({ jarId, action }: { jarId: string; action: JarAction }) => actOnJar(hid, jarId, action),
    // Also after a 409: someone else moved the jar, so every view of it should catch up.
    onSettled: () => {
      void queryClient.invalidateQueries({ queryKey: ['households', hid] });
      void queryClient.invalidateQueries({ queryKey: ['jar-by-code'] });
    },
  });
}
