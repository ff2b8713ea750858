import { useQueryClient } from '@tanstack/react-query';
import type { WeekView } from '@shared/schemas/week';
import { useOptimisticCache } from '@/lib/optimistic';
import { weekKeys } from '@/lib/query-keys';

/** Every board mutation: the cached week changes at once, goes back if the server refuses, and every cached week of the household refetches. */
export function useOptimisticWeek<V>(
  hid: string,
  start: string,
  edit: (week: WeekView, vars: V) => WeekView,
  onRefused: (message: string) => void,
) {
  const queryClient = useQueryClient();
  return useOptimisticCache<WeekView, V>({
    key: weekKeys.week(hid, start),
    hold: weekKeys.all(hid),
    edit,
    onRefused,
    refresh: () => queryClient.invalidateQueries({ queryKey: weekKeys.all(hid) }),
  });
}
