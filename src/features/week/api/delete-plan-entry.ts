import { useMutation } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { removeEntry } from '../week-edits';
import { useOptimisticWeek } from './optimistic';

export const deletePlanEntry = (hid: string, id: string) => api.delete(`/households/${hid}/plan-entries/${id}`);

export function useDeletePlanEntry(hid: string, start: string, onRefused: (message: string) => void) {
  const optimistic = useOptimisticWeek<string>(hid, start, removeEntry, onRefused);
  return useMutation({ mutationFn: (id: string) => deletePlanEntry(hid, id), ...optimistic });
}
