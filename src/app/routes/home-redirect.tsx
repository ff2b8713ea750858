import { Navigate } from 'react-router-dom';
import { EmptyState } from '@/components/ui/page';
import { useMe } from '@/features/auth/api/get-me';
import { lastHousehold } from '@/features/households/use-current-household';
import { paths } from '@shared/paths';

/** Opens the household used last, or the first one. */
export function HomeRedirect() {
  const { data: me } = useMe();
  if (!me) return null;
  const remembered = lastHousehold();
  const target = me.memberships.find((m) => m.householdId === remembered) ?? me.memberships[0];
  if (!target) {
    return (
      <main className="mx-auto max-w-lg p-6">
        <EmptyState title="You are not in a household yet">
          Ask a keeper to invite you, then open the link from the e-mail.
        </EmptyState>
      </main>
    );
  }
  return <Navigate to={paths.today(target.householdId)} replace />;
}
