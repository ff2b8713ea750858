import { useQueryClient } from '@tanstack/react-query';
import type { WeekView } from '@shared/schemas/week';
import { weekKeys } from './keys';

/**
 * The optimistic part every board mutation shares: edit the cached week at once, put it back
 * and say why if the server refuses, then refetch every cached week of the household.
 */
export function useOptimisticWeek<V>(hid: string, start: string, edit: (week: WeekView, vars: V) => WeekView, onRefused: (message: string) => void) {
  const queryClient = useQueryClient();
  const key = weekKeys.week(hid, start);
  return {
    onMutate: async (vars: V) => {
      await queryClient.cancelQueries({ queryKey: weekKeys.all(hid) });
      const previous = queryClient.getQueryData<WeekView>(key);
      if (previous) queryClient.setQueryData<WeekView>(key, edit(previous, vars));
      return { previous };
    },
    onError: (error: Error, _vars: V, context: { previous?: WeekView } | undefined) => {
      if (context?.previous) queryClient.setQueryData(key, context.previous);
      onRefused(error.message);
    },
    onSettled: () => queryClient.invalidateQueries({ queryKey: weekKeys.all(hid) }),
  };
}
