import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { ImportResult } from '@shared/schemas/backup';
import { authKeys } from '@/lib/query-keys';
import { api } from '@/lib/api-client';

export const importHousehold = (backup: unknown) => api.post<ImportResult>('/households/import', backup);

export function useImportHousehold() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: importHousehold,
    // The new household joins this person's list of households.
    onSuccess: () => queryClient.invalidateQueries({ queryKey: authKeys.me }),
  });
}
