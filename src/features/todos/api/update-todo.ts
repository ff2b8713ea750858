import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { TodoPatch, TodoView } from '@shared/schemas/todos';
import { api } from '@/lib/api-client';
import { refreshPlanning } from './refresh-planning';

export const updateTodo = (hid: string, id: string, patch: TodoPatch) => api.patch<{ todo: TodoView }>(`/households/${hid}/todos/${id}`, patch).then((r) => r.todo);

/** Any change but a move; Today uses it to tick, so it stays free of the drag-and-drop code. */
export function useUpdateTodo(hid: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: ({ id, patch }: { id: string; patch: TodoPatch }) => updateTodo(hid, id, patch),
    onSettled: () => refreshPlanning(queryClient, hid),
  });
}
