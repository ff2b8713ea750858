import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { MemberView } from '@shared/schemas/households';
import type { Role } from '@shared/roles';
import { api } from '@/lib/api-client';
import { authKeys } from '@/lib/query-keys';
import { householdKeys } from '@/lib/query-keys';

export const updateMemberRole = (hid: string, userId: string, role: Role) =>
  api.patch<{ members: MemberView[] }>(`/households/${hid}/members/${userId}`, { role }).then((r) => r.members);

export function useUpdateMemberRole(hid: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: ({ userId, role }: { userId: string; role: Role }) => updateMemberRole(hid, userId, role),
    onSuccess: (members) => queryClient.setQueryData(householdKeys.members(hid), members),
  });
}

/** A keeper takes someone out of the household; their access ends on their next request. */
export const removeMember = (hid: string, userId: string) =>
  api.delete<{ members: MemberView[] }>(`/households/${hid}/members/${userId}`).then((r) => r.members);

export function useRemoveMember(hid: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (userId: string) => removeMember(hid, userId),
    onSuccess: (members) => queryClient.setQueryData(householdKeys.members(hid), members),
  });
}

export const leaveHousehold = (hid: string) => api.post<void>(`/households/${hid}/leave`);

export function useLeaveHousehold(hid: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: () => leaveHousehold(hid),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: authKeys.me }),
  });
}
