import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { SealCheckDone, SealCheckInput } from '@shared/schemas/batches';
import { api } from '@/lib/api-client';
import { householdKeys, shelfKeys } from '@/lib/query-keys';

export const checkSeals = (hid: string, batchId: string, input: SealCheckInput) =>
  api.post<SealCheckDone>(`/households/${hid}/batches/${batchId}/seal-check`, input);

export function useCheckSeals(hid: string, batchId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (input: SealCheckInput) => checkSeals(hid, batchId, input),
    onSuccess: (done) => queryClient.setQueryData(shelfKeys.batch(hid, batchId), done.batch),
    // Jars move to the fridge or back to cooling: Today, the shelf and the fridge all read under the household.
    onSettled: () => queryClient.invalidateQueries({ queryKey: householdKeys.all(hid) }),
  });
}
