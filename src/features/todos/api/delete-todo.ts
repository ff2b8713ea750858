import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { refreshPlanning } from './refresh-planning';

export const deleteTodo = (hid: string, id: string) => api.delete(`/households/${hid}/todos/${id}`);

export function useDeleteTodo(hid: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (id: string) => deleteTodo(hid, id),
    onSuccess: () => refreshPlanning(queryClient, hid),
  });
}
