import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { PlaceView } from '@shared/schemas/places';
import { api } from '@/lib/api-client';
import { householdKeys, shelfKeys } from '@/lib/query-keys';

/** Adds a place, or renames one. */
export const savePlace = (hid: string, placeId: string | undefined, name: string) =>
  (placeId
    ? api.patch<{ place: PlaceView }>(`/households/${hid}/places/${placeId}`, { name })
    : api.post<{ place: PlaceView }>(`/households/${hid}/places`, { name })
  ).then((r) => r.place);

export function useSavePlace(hid: string, placeId?: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (name: string) => savePlace(hid, placeId, name),
    // A place's name shows on jars, Today and the jar pages.
    onSuccess: () => {
      void queryClient.invalidateQueries({ queryKey: householdKeys.all(hid) });
      void queryClient.invalidateQueries({ queryKey: shelfKeys.jarsByCode() });
    },
  });
}
