import type { ReactNode } from 'react';
import { Link, useLocation } from 'react-router-dom';
import { can } from '@shared/roles';
import { Notice } from '@/components/ui/notice';
import { useHousehold } from '../api/get-household';
import { useCurrentHousehold } from '../use-current-household';
import { paths } from '@shared/paths';

export function setupHref(hid: string, back: string) {
  return paths.setup(hid, back);
}

/** Shows what it wraps (a processing plan) only once a keeper has confirmed the household's altitude; until then, the question. */
export function AltitudeGate({ hid, children }: { hid: string; children: ReactNode }) {
  const household = useHousehold(hid);
  const { role } = useCurrentHousehold();
  const location = useLocation();
  if (!household.data) return null;
  if (household.data.altitudeConfirmed) return <>{children}</>;
  return (
    <Notice tone="soon" title="First, your altitude" role="status">
      <p>
        Processing times and pressures depend on how high you live, so Larderly shows no processing plan until the
        household’s altitude is confirmed.
      </p>
      {can(role, 'manage') ? (
        <Link
          to={setupHref(hid, location.pathname + location.search)}
          className="mt-2 inline-flex min-h-11 items-center rounded-lg bg-action px-4 font-bold text-white hover:bg-action-strong"
        >
          Confirm the altitude
        </Link>
      ) : (
        <p className="mt-1 font-bold">Ask a keeper of the household to confirm it under Household.</p>
      )}
    </Notice>
  );
}
