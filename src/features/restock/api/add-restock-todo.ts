import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { RestockTodoCreate, TodoView } from '@shared/schemas/todos';
import { api } from '@/lib/api-client';
import { refreshPlanning } from '@/features/todos';

export const addRestockTodo = (hid: string, productId: string, input: RestockTodoCreate) =>
  api.post<{ todo: TodoView }>(`/households/${hid}/restock/${productId}/todo`, input).then((r) => r.todo);

export function useAddRestockTodo(hid: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: ({ productId, input }: { productId: string; input: RestockTodoCreate }) =>
      addRestockTodo(hid, productId, input),
    onSuccess: () => refreshPlanning(queryClient, hid),
  });
}
