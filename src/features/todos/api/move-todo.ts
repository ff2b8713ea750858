import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { TodoFilter, TodoView } from '@shared/schemas/todos';
import { useOptimisticCache } from '@/lib/optimistic';
import { todoKeys } from '@/lib/query-keys';
import { refreshPlanning } from './refresh-planning';
import { updateTodo } from './update-todo';

interface Move {
  id: string;
  /** The position, in the whole list, of the to-do it was dropped on. */
  position: number;
  /** The visible list in its new order. */
  reordered: TodoView[];
}

/** Drag and drop: the list shows the new order at once and goes back if the server refuses. */
export function useMoveTodo(hid: string, filter: TodoFilter) {
  const queryClient = useQueryClient();
  const optimistic = useOptimisticCache<TodoView[], Move>({
    key: todoKeys.list(hid, filter),
    edit: (_list, { reordered }) => reordered,
    refresh: () => refreshPlanning(queryClient, hid),
  });
  return useMutation({ mutationFn: ({ id, position }: Move) => updateTodo(hid, id, { position }), ...optimistic });
}
