import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { JarsMoved } from '@shared/schemas/places';
import { api } from '@/lib/api-client';
import { householdKeys, shelfKeys } from '@/lib/query-keys';

/** Moves jars on hand to a place, or to no place (null). */
export const moveJars = (hid: string, jarIds: string[], placeId: string | null) =>
  api.post<JarsMoved>(`/households/${hid}/jars/move`, { jarIds, placeId });

export function useMoveJars(hid: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: ({ jarIds, placeId }: { jarIds: string[]; placeId: string | null }) => moveJars(hid, jarIds, placeId),
    onSuccess: () => {
      void queryClient.invalidateQueries({ queryKey: householdKeys.all(hid) });
      void queryClient.invalidateQueries({ queryKey: shelfKeys.jarsByCode() });
    },
  });
}
