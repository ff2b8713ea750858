import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { PreferencesPatch } from '@shared/schemas/week';
import { api } from '@/lib/api-client';
import { weekKeys } from '@/lib/query-keys';

export const updatePreferences = (hid: string, userId: string, patch: PreferencesPatch) =>
  api.patch(`/households/${hid}/members/${userId}/preferences`, patch);

export function useUpdatePreferences(hid: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: ({ userId, patch }: { userId: string; patch: PreferencesPatch }) =>
      updatePreferences(hid, userId, patch),
    // Flags on every pairing depend on who eats what.
    onSettled: () => queryClient.invalidateQueries({ queryKey: weekKeys.all(hid) }),
  });
}
