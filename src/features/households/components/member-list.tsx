import { useState } from 'react';
import { useNavigate } from 'react-router-dom';
import { ROLE_LABELS, ROLES, type Role } from '@shared/roles';
import type { MemberView } from '@shared/schemas/households';
import { Button } from '@/components/ui/button';
import { Notice } from '@/components/ui/notice';
import { useLeaveHousehold, useRemoveMember, useUpdateMemberRole } from '../api/update-member';
import { paths } from '@shared/paths';

export function MemberList({
  hid,
  members,
  canManage,
  myId,
}: {
  hid: string;
  members: MemberView[];
  canManage: boolean;
  myId: string;
}) {
  const update = useUpdateMemberRole(hid);
  const remove = useRemoveMember(hid);
  const [removing, setRemoving] = useState<MemberView | null>(null);
  const problem = update.error ?? remove.error;
  return (
    <div className="flex flex-col gap-3">
      {problem && (
        <Notice tone="past" role="alert">
          {problem.message}
        </Notice>
      )}
      <ul className="divide-y divide-line">
        {members.map((member) => (
          <li key={member.userId} className="flex flex-col gap-2 py-3">
            <div className="flex flex-wrap items-center justify-between gap-2">
              <div className="min-w-0">
                <p className="font-bold">
                  {member.name}
                  {member.userId === myId && <span className="font-normal text-ink-muted"> (you)</span>}
                </p>
                <p className="truncate text-sm text-ink-muted">{member.email}</p>
              </div>
              {canManage ? (
                <div className="flex items-center gap-2">
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
                  {member.userId !== myId && (
                    <Button
                      variant="secondary"
                      aria-label={`Remove ${member.name}`}
                      onClick={() => setRemoving(member)}
                    >
                      Remove
                    </Button>
                  )}
                </div>
              ) : (
                <span className="rounded-full bg-sunken px-3 py-1 text-sm font-bold">{ROLE_LABELS[member.role]}</span>
              )}
            </div>
            {removing?.userId === member.userId && (
              <div
                className="flex flex-wrap items-center gap-2 rounded-card border border-past/50 bg-past-soft px-3 py-2"
                role="group"
                aria-label={`Confirm removing ${member.name}`}
              >
                <p className="grow">
                  Remove {member.name}? They lose access at once, and their reminders for this household stop.
                </p>
                <Button
                  variant="danger"
                  disabled={remove.isPending}
                  onClick={() => remove.mutate(member.userId, { onSuccess: () => setRemoving(null) })}
                >
                  {remove.isPending ? 'Removing…' : `Yes, remove ${member.name}`}
                </Button>
                <Button variant="quiet" onClick={() => setRemoving(null)}>
                  Keep
                </Button>
              </div>
            )}
          </li>
        ))}
      </ul>
      <LeaveHousehold hid={hid} />
    </div>
  );
}

/** Anyone may leave; the last keeper is told by the server to hand over first. */
function LeaveHousehold({ hid }: { hid: string }) {
  const leave = useLeaveHousehold(hid);
  const navigate = useNavigate();
  const [asking, setAsking] = useState(false);
  if (!asking) {
    return (
      <Button variant="secondary" className="self-start" onClick={() => setAsking(true)}>
        Leave household
      </Button>
    );
  }
  return (
    <div className="flex flex-col gap-2 rounded-card border border-past/50 bg-past-soft px-3 py-2">
      {leave.error && (
        <p role="alert" className="font-bold">
          {leave.error.message}
        </p>
      )}
      <p>
        Leave this household? You will no longer see its shelf, fridge or week, and its reminders stop. A keeper can
        invite you again.
      </p>
      <div className="flex flex-wrap gap-2">
        <Button
          variant="danger"
          disabled={leave.isPending}
          onClick={() => leave.mutate(undefined, { onSuccess: () => navigate(paths.home(), { replace: true }) })}
        >
          {leave.isPending ? 'Leaving…' : 'Yes, leave'}
        </Button>
        <Button variant="quiet" onClick={() => setAsking(false)}>
          Stay
        </Button>
      </div>
    </div>
  );
}
