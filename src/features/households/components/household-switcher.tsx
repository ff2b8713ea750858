import { useLocation, useNavigate } from 'react-router-dom';
import { ROLE_LABELS } from '@shared/roles';
import type { MembershipSummary } from '@shared/schemas/auth';
import { paths } from '@shared/paths';

/** Moves to the same screen in another household; a plain label when there is only one. */
export function HouseholdSwitcher({
  memberships,
  current,
}: {
  memberships: MembershipSummary[];
  current: MembershipSummary;
}) {
  const navigate = useNavigate();
  const location = useLocation();
  const screen = location.pathname.split('/').slice(3).join('/');

  if (memberships.length < 2) {
    return (
      <div className="min-w-0">
        <p className="truncate font-bold">{current.householdName}</p>
        <p className="text-sm text-ink-muted">You are a {ROLE_LABELS[current.role].toLowerCase()}</p>
      </div>
    );
  }
  return (
    <label className="flex min-w-0 flex-col">
      <span className="sr-only">Household</span>
      <select
        className="min-h-11 max-w-[14rem] truncate rounded-lg border border-line bg-surface px-2 font-bold"
        value={current.householdId}
        onChange={(event) => navigate(paths.screen(event.target.value, screen))}
      >
        {memberships.map((m) => (
          <option key={m.householdId} value={m.householdId}>
            {m.householdName} ({ROLE_LABELS[m.role].toLowerCase()})
          </option>
        ))}
      </select>
    </label>
  );
}
