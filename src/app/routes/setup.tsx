import { Navigate, useNavigate, useSearchParams } from 'react-router-dom';
import { can } from '@shared/roles';
import { Card, PageHeader } from '@/components/ui/page';
import { Notice } from '@/components/ui/notice';
import { useHousehold } from '@/features/households/api/get-household';
import { FirstRunForm } from '@/features/households/components/first-run-form';
import { useCurrentHousehold } from '@/features/households/use-current-household';
import { paths } from '@shared/paths';

/** Only addresses inside this household are followed back, so the page cannot be used to send someone elsewhere. */
function safeBack(hid: string, back: string | null) {
  return back && back.startsWith(paths.today(hid)) ? back : paths.today(hid);
}

export function SetupRoute() {
  const { hid, role } = useCurrentHousehold();
  const household = useHousehold(hid);
  const [params] = useSearchParams();
  const navigate = useNavigate();
  if (role && !can(role, 'manage')) return <Navigate to={paths.today(hid)} replace />;
  return (
    <>
      <PageHeader
        title="Before the first plan"
        lead="Processing times and pressures, “today” and the week all depend on these. Answer once; change them later under Household."
      />
      <Card>
        {household.data ? (
          <FirstRunForm
            household={household.data}
            onConfirmed={() => navigate(safeBack(hid, params.get('back')), { replace: true })}
          />
        ) : household.error ? (
          <Notice tone="past" role="alert">
            {household.error.message}
          </Notice>
        ) : (
          <p className="text-ink-muted">Loading…</p>
        )}
      </Card>
    </>
  );
}
