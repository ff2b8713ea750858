import { useMutation } from '@tanstack/react-query';
import { api, ApiError } from '@/lib/api-client';

export const addRestockTodo = (hid: string, productId: string) => api.post(`/households/${hid}/restock/${productId}/todo`, {});

/** The address exists only where the restock feature is installed; a bare 404 says it is not. */
export const restockMissing = (error: unknown) => error instanceof ApiError && error.status === 404 && /^There is no /.test(error.message);

export function useAddRestockTodo(hid: string) {
  return useMutation({ mutationFn: (productId: string) => addRestockTodo(hid, productId) });
}
