import { queryOptions, useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import type { InvitationBody, InvitationView } from '@shared/schemas/invitations';
import { api } from '@/lib/api-client';
import { invitationKeys } from '@/lib/query-keys';

export const getInvitations = (hid: string) =>
  api.get<{ invitations: InvitationView[] }>(`/households/${hid}/invitations`).then((r) => r.invitations);

export const invitationsQueryOptions = (hid: string) =>
  queryOptions({ queryKey: invitationKeys.pending(hid), queryFn: () => getInvitations(hid) });

export const useInvitations = (hid: string, enabled: boolean) => useQuery({ ...invitationsQueryOptions(hid), enabled });

export function useInvite(hid: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (input: InvitationBody) =>
      api.post<{ invitation: InvitationView }>(`/households/${hid}/invitations`, input),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: invitationKeys.pending(hid) }),
  });
}

export function useRevokeInvitation(hid: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (id: string) => api.delete(`/households/${hid}/invitations/${id}`),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: invitationKeys.pending(hid) }),
  });
}
