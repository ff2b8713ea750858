import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { TodoCreate, TodoView } from '@shared/schemas/todos';
import { api } from '@/lib/api-client';
import { refreshPlanning } from './refresh-planning';

export const createTodo = (hid: string, input: TodoCreate) =>
  api.post<{ todo: TodoView }>(`/households/${hid}/todos`, input).then((r) => r.todo);

export function useCreateTodo(hid: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (input: TodoCreate) => createTodo(hid, input),
    onSuccess: () => refreshPlanning(queryClient, hid),
  });
}
