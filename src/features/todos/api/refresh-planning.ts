import type { QueryClient } from '@tanstack/react-query';
import { restockKeys, todayKeys, todoKeys } from '@/lib/query-keys';

/** The reads a to-do or restock change shows up in: the list, Today, and the restock list's "on the list". */
export function refreshPlanning(queryClient: QueryClient, hid: string) {
  return Promise.all(
    [todoKeys.all(hid), todayKeys.view(hid), restockKeys.list(hid)].map((queryKey) =>
      queryClient.invalidateQueries({ queryKey }),
    ),
  );
}
