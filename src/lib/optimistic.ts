import { useQueryClient, type QueryKey } from '@tanstack/react-query';

interface OptimisticOptions<T, V> {
  /** The cached answer the change shows in at once. */
  key: QueryKey;
  /** The reads to hold back while the change is in flight, so none lands over it (default: `key`). */
  hold?: QueryKey;
  /** The cached answer as it will be once the server agrees. */
  edit: (current: T, vars: V) => T;
  /** Told why the server refused, after the cached answer has been put back. */
  onRefused?: (message: string) => void;
  /** What to refetch once the server has answered, either way. */
  refresh?: () => Promise<unknown>;
}

/**
 * The optimistic part a mutation shares with every other: edit the cached answer at once, put it back and say why
 * if the server refuses, then refetch. Spread the result into `useMutation({ mutationFn, ...optimistic })`.
 */
export function useOptimisticCache<T, V>({ key, hold = key, edit, onRefused, refresh }: OptimisticOptions<T, V>) {
  const queryClient = useQueryClient();
  return {
    onMutate: async (vars: V) => {
      // Cancel the reads in flight, then show the change before waiting for them: a control (a checkbox) shows its
      // new state at once. A cancelled read puts back the last state set by hand, which is this change.
      const cancelled = queryClient.cancelQueries({ queryKey: hold });
      const previous = queryClient.getQueryData<T>(key);
      if (previous !== undefined) queryClient.setQueryData<T>(key, edit(previous, vars));
      await cancelled;
      return { previous };
    },
    onError: (error: Error, _vars: V, context: { previous?: T } | undefined) => {
      if (context?.previous !== undefined) queryClient.setQueryData<T>(key, context.previous);
      onRefused?.(error.message);
    },
    onSettled: () => refresh?.(),
  };
}
