import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { TodoPatch, TodoView } from '@shared/schemas/todos';
import { useUndoToast } from '@/components/ui/undo-toast';
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

/** Ticking a to-do done (or not done) in one tap, with a few seconds to take it back. */
export function useTickTodo(hid: string) {
  const queryClient = useQueryClient();
  const offer = useUndoToast();
  return useMutation({
    mutationFn: ({ id, done }: { id: string; title: string; done: boolean }) => updateTodo(hid, id, { done }),
    onSuccess: (todo, { done }) =>
      offer({
        message: done ? `Ticked “${todo.title}” done; it is under Done now.` : `“${todo.title}” is open again.`,
        undo: async () => {
          try {
            await updateTodo(hid, todo.id, { done: !done });
          } finally {
            await refreshPlanning(queryClient, hid);
          }
          return done ? `“${todo.title}” is open again.` : `“${todo.title}” is done again.`;
        },
      }),
    onSettled: () => refreshPlanning(queryClient, hid),
  });
}
