import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { TodoFilter, TodoView } from '@shared/schemas/todos';
import { todoKeys } from './get-todos';
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
  const key = todoKeys.list(hid, filter);
  return useMutation({
    mutationFn: ({ id, position }: Move) => updateTodo(hid, id, { position }),
    onMutate: async ({ reordered }: Move) => {
      await queryClient.cancelQueries({ queryKey: key });
      const before = queryClient.getQueryData<TodoView[]>(key);
      queryClient.setQueryData(key, reordered);
      return { before };
    },
    onError: (_error, _move, context) => {
      if (context?.before) queryClient.setQueryData(key, context.before);
    },
    onSettled: () => refreshPlanning(queryClient, hid),
  });
}
