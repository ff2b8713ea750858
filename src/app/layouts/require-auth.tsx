import { Navigate, Outlet, useLocation } from 'react-router-dom';
import { useMe } from '@/features/auth/api/get-me';
import { Notice } from '@/components/ui/notice';
import { paths } from '@shared/paths';

/** Signed-in screens only: anyone else goes to sign-in and comes back here afterwards. */
export function RequireAuth() {
  const { data: me, isPending, error } = useMe();
  const location = useLocation();
  if (isPending) return <p className="p-6 text-ink-muted">Opening your larder…</p>;
  // A read again that failed leaves the person as last read: the screens show what they have, and say why.
  if (error && me === undefined) {
    return (
      <div className="p-6">
        <Notice tone="past" title="Larderly cannot load right now." role="alert">
          {error.message}
        </Notice>
      </div>
    );
  }
  if (!me) return <Navigate to={paths.signIn(location.pathname + location.search)} replace />;
  return <Outlet />;
}
