import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { HouseholdPatch, HouseholdView } from '@shared/schemas/households';
import { authKeys } from '@/lib/query-keys';
import { api } from '@/lib/api-client';
import { householdKeys } from '@/lib/query-keys';

export const updateHousehold = (hid: string, patch: HouseholdPatch) =>
  api.patch<{ household: HouseholdView }>(`/households/${hid}`, patch).then((r) => r.household);

export function useUpdateHousehold(hid: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (patch: HouseholdPatch) => updateHousehold(hid, patch),
    onSuccess: (household) => {
      queryClient.setQueryData(householdKeys.detail(hid), household);
      // Altitude and units change what every canning screen computes.
      void queryClient.invalidateQueries({ queryKey: householdKeys.all(hid) });
      void queryClient.invalidateQueries({ queryKey: authKeys.me });
    },
  });
}
