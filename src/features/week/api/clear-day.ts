import { useMutation } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { clearDate } from '../week-edits';
import { useOptimisticWeek } from './optimistic';

export const clearDay = (hid: string, date: string) =>
  api.delete<{ removed: number }>(`/households/${hid}/week/days/${date}`);

export function useClearDay(hid: string, start: string, onRefused: (message: string) => void) {
  const optimistic = useOptimisticWeek<string>(hid, start, clearDate, onRefused);
  return useMutation({ mutationFn: (date: string) => clearDay(hid, date), ...optimistic });
}
