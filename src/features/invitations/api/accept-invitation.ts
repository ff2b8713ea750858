import { queryOptions, useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import type { AcceptedInvitation, InvitationPreview } from '@shared/schemas/invitations';
import { authKeys, invitationKeys } from '@/lib/query-keys';
import { api } from '@/lib/api-client';

/** Who invited whom, to which household, and whether the link still works. */
export const getInvitationPreview = (token: string) =>
  api.get<{ invitation: InvitationPreview }>(`/invitations/${encodeURIComponent(token)}`).then((r) => r.invitation);

export const invitationPreviewQueryOptions = (token: string) =>
  queryOptions({ queryKey: invitationKeys.preview(token), queryFn: () => getInvitationPreview(token), retry: false });

export const useInvitationPreview = (token: string) => useQuery(invitationPreviewQueryOptions(token));

export type AcceptInput = { name: string; password: string } | { confirmOtherAddress: true } | undefined;

/** Signed in: nothing, or a confirmation when the account's address is not the invited one. Signed out: a name and password for the new account. */
export const acceptInvitation = (token: string, input: AcceptInput) =>
  api
    .post<{ invitation: AcceptedInvitation }>(`/invitations/${encodeURIComponent(token)}/accept`, input ?? {})
    .then((r) => r.invitation);

export function useAcceptInvitation(token: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (input: AcceptInput) => acceptInvitation(token, input),
    onSuccess: () =>
      Promise.all([
        queryClient.invalidateQueries({ queryKey: authKeys.me }),
        queryClient.invalidateQueries({ queryKey: invitationKeys.preview(token) }),
      ]),
  });
}
