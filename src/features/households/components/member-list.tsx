import { ROLE_LABELS, ROLES, type Role } from '@shared/roles';
import type { MemberView } from '@shared/schemas/households';
import { Notice } from '@/components/ui/notice';
import { useUpdateMemberRole } from '../api/update-member';

export function MemberList({ hid, members, canManage, myId }: { hid: string; members: MemberView[]; canManage: boolean; myId: string }) {
  const update = useUpdateMemberRole(hid);
  return (
    <div className="flex flex-col gap-3">
      {update.error && (
        <Notice tone="past" role="alert">
          {update.error.message}
        </Notice>
      )}
      <ul className="divide-y divide-line">
        {members.map((member) => (
          <li key={member.userId} className="flex flex-wrap items-center justify-between gap-2 py-3">
            <div className="min-w-0">
              <p className="font-bold">
                {member.name}
                {member.userId === myId && <span className="font-normal text-ink-muted"> (you)</span>}
              </p>
              <p className="truncate text-sm text-ink-muted">{member.email}</p>
            </div>
            {canManage ? (
              <label className="flex items-center gap-2">
                <span className="sr-only">Role of {member.name}</span>
                <select
                  className="min-h-11 rounded-lg border border-line bg-surface px-2"
                  value={member.role}
                  disabled={update.isPending}
                  onChange={(e) => update.mutate({ userId: member.userId, role: e.target.value as Role })}
                >
                  {ROLES.map((role) => (
                    <option key={role} value={role}>
                      {ROLE_LABELS[role]}
                    </option>
                  ))}
                </select>
              </label>
            ) : (
              <span className="rounded-full bg-sunken px-3 py-1 text-sm font-bold">{ROLE_LABELS[member.role]}</span>
            )}
          </li>
        ))}
      </ul>
    </div>
  );
}
