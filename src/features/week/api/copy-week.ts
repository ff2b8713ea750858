import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { WeekCopy } from '@shared/schemas/week';
import { api } from '@/lib/api-client';
import { weekKeys } from '@/lib/query-keys';

export const copyWeek = (hid: string, copy: WeekCopy) =>
  api.post<{ copied: number }>(`/households/${hid}/week/copy`, copy);

export function useCopyWeek(hid: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (copy: WeekCopy) => copyWeek(hid, copy),
    onSettled: () => queryClient.invalidateQueries({ queryKey: weekKeys.all(hid) }),
  });
}
