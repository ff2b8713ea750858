import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { ImportProblem, ImportRow } from '@shared/schemas/batches';
import { api } from '@/lib/api-client';
import { householdKeys } from '@/lib/query-keys';

export const previewImport = (hid: string, csv: string) =>
  api.post<{ rows: ImportRow[]; problems: ImportProblem[] }>(`/households/${hid}/shelf/import`, { csv, commit: false });
export const commitImport = (hid: string, csv: string) =>
  api.post<{ imported: number; jars: number }>(`/households/${hid}/shelf/import`, { csv, commit: true });

export const usePreviewImport = (hid: string) => useMutation({ mutationFn: (csv: string) => previewImport(hid, csv) });

export function useCommitImport(hid: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (csv: string) => commitImport(hid, csv),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: householdKeys.all(hid) }),
  });
}
