import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { MeResponse, SignupBody } from '@shared/schemas/auth';
import { api } from '@/lib/api-client';
import { authKeys } from '@/lib/query-keys';

export const signup = (input: SignupBody) => api.post<MeResponse>('/auth/signup', input);

export function useSignup() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: signup,
    onSuccess: (me) => queryClient.setQueryData(authKeys.me, me),
  });
}
