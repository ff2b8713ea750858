import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { householdKeys, shelfKeys } from '@/lib/query-keys';

/** Removes a place; moveTo says where its jars on hand go (a place id, or 'none'). */
export const removePlace = (hid: string, placeId: string, moveTo?: string) =>
  api.delete<{ removed: string; moved: number }>(
    `/households/${hid}/places/${placeId}${moveTo ? `?moveTo=${encodeURIComponent(moveTo)}` : ''}`,
  );

export function useRemovePlace(hid: string, placeId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (moveTo?: string) => removePlace(hid, placeId, moveTo),
    onSuccess: () => {
      void queryClient.invalidateQueries({ queryKey: householdKeys.all(hid) });
      void queryClient.invalidateQueries({ queryKey: shelfKeys.jarsByCode() });
    },
  });
}
