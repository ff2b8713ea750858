import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { BatchCreate, BatchCreated } from '@shared/schemas/batches';
import { api } from '@/lib/api-client';
import { householdKeys } from '@/lib/query-keys';

export const createBatch = (hid: string, batch: BatchCreate) =>
  api.post<BatchCreated>(`/households/${hid}/batches`, batch);

export function useCreateBatch(hid: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (batch: BatchCreate) => createBatch(hid, batch),
    // New jars change the shelf, the fridge, restock and Today, which all read under the household.
    onSuccess: () => queryClient.invalidateQueries({ queryKey: householdKeys.all(hid) }),
  });
}
