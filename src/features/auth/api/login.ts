import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { LoginBody } from '@shared/schemas/auth';
import { api } from '@/lib/api-client';
import { authKeys } from '@/lib/query-keys';

export const login = (credentials: LoginBody) => api.post<{ user: { id: string } }>('/auth/login', credentials);

export function useLogin() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: login,
    onSuccess: async () => {
      queryClient.removeQueries({ predicate: (q) => q.queryKey[0] !== 'auth' });
      await queryClient.invalidateQueries({ queryKey: authKeys.me });
    },
  });
}
