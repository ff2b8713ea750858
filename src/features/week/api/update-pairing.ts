import { useMutation } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { changePairing } from '../week-edits';
import { useOptimisticWeek } from './optimistic';

export const updatePairing = (hid: string, id: string, tbspPerServing: number) =>
  api.patch(`/households/${hid}/pairings/${id}`, { tbspPerServing });

export function useUpdatePairing(hid: string, start: string, onRefused: (message: string) => void) {
  const optimistic = useOptimisticWeek<{ id: string; tbspPerServing: number }>(
    hid,
    start,
    (week, { id, tbspPerServing }) => changePairing(week, id, { tbspPerServing }),
    onRefused,
  );
  return useMutation({
    mutationFn: ({ id, tbspPerServing }: { id: string; tbspPerServing: number }) =>
      updatePairing(hid, id, tbspPerServing),
    ...optimistic,
  });
}
