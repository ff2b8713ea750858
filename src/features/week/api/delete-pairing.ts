import { useMutation } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { changePairing } from '../week-edits';
import { useOptimisticWeek } from './optimistic';

export const deletePairing = (hid: string, id: string) => api.delete(`/households/${hid}/pairings/${id}`);

export function useDeletePairing(hid: string, start: string, onRefused: (message: string) => void) {
  const optimistic = useOptimisticWeek<string>(hid, start, (week, id) => changePairing(week, id, null), onRefused);
  return useMutation({ mutationFn: (id: string) => deletePairing(hid, id), ...optimistic });
}
