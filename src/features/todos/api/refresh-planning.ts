import type { QueryClient } from '@tanstack/react-query';

/** The reads a to-do or restock change shows up in: the list, Today, and the restock list's "on the list". */
export function refreshPlanning(queryClient: QueryClient, hid: string) {
  return Promise.all(['todos', 'today', 'restock'].map((part) => queryClient.invalidateQueries({ queryKey: ['households', hid, part] })));
}
