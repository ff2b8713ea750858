import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { AcceptedInvitation } from '@shared/schemas/invitations';
import { authKeys } from '@/features/auth/api/get-me';
import { api } from '@/lib/api-client';

/** Signed in: no account details. Signed out: a name and password for the new account. */
export const acceptInvitation = (token: string, account?: { name: string; password: string }) =>
  api.post<{ invitation: AcceptedInvitation }>(`/invitations/${encodeURIComponent(token)}/accept`, account ?? {}).then((r) => r.invitation);

export function useAcceptInvitation(token: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (account?: { name: string; password: string }) => acceptInvitation(token, account),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: authKeys.me }),
  });
}
