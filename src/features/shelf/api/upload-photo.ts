import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { BatchDetail } from '@shared/schemas/batches';
import { api } from '@/lib/api-client';
import { shelfKeys } from '@/lib/query-keys';

export function uploadBatchPhoto(hid: string, batchId: string, photo: File) {
  const form = new FormData();
  form.append('photo', photo);
  return api.post<{ batch: BatchDetail }>(`/households/${hid}/batches/${batchId}/photo`, form).then((r) => r.batch);
}

export function useUploadBatchPhoto(hid: string, batchId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (photo: File) => uploadBatchPhoto(hid, batchId, photo),
    onSuccess: (batch) => {
      queryClient.setQueryData(shelfKeys.batch(hid, batchId), batch);
      void queryClient.invalidateQueries({ queryKey: shelfKeys.batches(hid) });
    },
  });
}

export const batchPhotoUrl = (hid: string, batchId: string, version: string) =>
  `/api/households/${hid}/batches/${batchId}/photo?v=${encodeURIComponent(version)}`;
