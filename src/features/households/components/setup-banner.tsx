import { Link, useLocation } from 'react-router-dom';
import { can } from '@shared/roles';
import { Notice } from '@/components/ui/notice';
import { useHousehold } from '../api/get-household';
import { useCurrentHousehold } from '../use-current-household';
import { setupHref } from './altitude-gate';

/** Until the altitude is confirmed, every screen says so at the top: no plan is trusted before it. */
export function SetupBanner({ hid }: { hid: string }) {
  const household = useHousehold(hid);
  const { role } = useCurrentHousehold();
  const location = useLocation();
  if (!household.data || household.data.altitudeConfirmed || location.pathname.endsWith('/setup')) return null;
  return (
    <div className="mb-5">
      <Notice tone="soon" title="Your altitude is not confirmed yet">
        {can(role, 'manage') ? (
          <p>
            Tell Larderly how high you live, your time zone and your canner before the first processing plan.{' '}
            <Link
              to={setupHref(hid, location.pathname + location.search)}
              className="font-bold text-action underline underline-offset-4"
            >
              Answer four questions
            </Link>
          </p>
        ) : (
          <p>No processing plan is shown until a keeper of the household confirms the altitude under Household.</p>
        )}
      </Notice>
    </div>
  );
}
