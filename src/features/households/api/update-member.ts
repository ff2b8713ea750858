import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { MemberView } from '@shared/schemas/households';
import type { Role } from '@shared/roles';
import { api } from '@/lib/api-client';
import { householdKeys } from './get-household';

export const updateMemberRole = (hid: string, userId: string, role: Role) =>
  api.patch<{ members: MemberView[] }>(`/households/${hid}/members/${userId}`, { role }).then((r) => r.members);

export function useUpdateMemberRole(hid: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: ({ userId, role }: { userId: string; role: Role }) => updateMemberRole(hid, userId, role),
    onSuccess: (members) => queryClient.setQueryData(householdKeys.members(hid), members),
  });
}
