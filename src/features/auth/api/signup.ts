import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { MeResponse, SignupBody, SignUpSent } from '@shared/schemas/auth';
import { api } from '@/lib/api-client';
import { authKeys } from '@/lib/query-keys';

/** Asks for the sign-up link; the answer is the same whether or not the address has an account. */
export const signup = (input: SignupBody) => api.post<SignUpSent>('/auth/signup', input);

export function useSignup() {
  return useMutation({ mutationFn: signup });
}

/** Uses the mailed link: the account and household are made, and the person is signed in. */
export const confirmSignUp = (token: string) =>
  api.post<MeResponse>(`/auth/signup/confirm/${encodeURIComponent(token)}`, {});

export function useConfirmSignUp() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: confirmSignUp,
    onSuccess: (me) => queryClient.setQueryData(authKeys.me, me),
  });
}
