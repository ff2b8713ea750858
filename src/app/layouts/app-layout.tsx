import { lazy, Suspense, useEffect, useState } from 'react';
import { Navigate, NavLink, Outlet, useLocation, useNavigate } from 'react-router-dom';
import { SCREENS } from '@/app/screens';
import { Brand } from '@/components/ui/brand';
import { ScreenIcon } from './screen-icon';
import { useLogout } from '@/features/auth/api/logout';
import { SetupBanner } from '@/features/households/components/setup-banner';
import { HouseholdSwitcher } from '@/features/households/components/household-switcher';
import { rememberHousehold, useCurrentHousehold } from '@/features/households/use-current-household';
import { paths } from '@shared/paths';
import { useHousehold } from '@/features/households/api/get-household';
import { UnitSystemProvider } from '@/lib/units';

// Not needed to draw the first screen, so it loads just after it.
const OfflineBanner = lazy(() => import('./offline-banner').then((module) => ({ default: module.OfflineBanner })));

const linkClass = ({ isActive }: { isActive: boolean }) =>
  `flex min-h-11 items-center gap-3 rounded-lg px-3 font-bold ${isActive ? 'bg-action text-white' : 'text-ink hover:bg-sunken'}`;

export function AppLayout() {
  const { hid, membership, me } = useCurrentHousehold();
  const logout = useLogout();
  const household = useHousehold(hid);
  const navigate = useNavigate();
  const location = useLocation();
  // The "more" menu belongs to the page it was opened on, so it closes by itself on navigation.
  const [moreOpenOn, setMoreOpenOn] = useState<string | null>(null);
  const moreOpen = moreOpenOn === location.pathname;
  // In a task of its own: a page's first localStorage write opens the store, which took a few ms of the first render.
  useEffect(() => {
    if (!membership) return;
    const later = setTimeout(() => rememberHousehold(hid), 0);
    return () => clearTimeout(later);
  }, [hid, membership]);

  if (!me) return null;
  if (!membership) return <Navigate to={paths.home()} replace />;

  const signOut = () => logout.mutate(undefined, { onSuccess: () => navigate(paths.signIn(), { replace: true }) });
  const href = (path: string) => paths.screen(hid, path);

  return (
    <div className="min-h-dvh lg:grid lg:grid-cols-[16rem_1fr]">
      <a
        href="#main"
        className="sr-only focus:not-sr-only focus:absolute focus:left-2 focus:top-2 focus:z-50 focus:rounded focus:bg-surface focus:p-2"
      >
        Skip to content
      </a>
      <aside className="hidden border-r border-line bg-surface/70 lg:sticky lg:top-0 lg:flex lg:h-dvh lg:flex-col lg:gap-6 lg:overflow-y-auto lg:p-4">
        <Brand />
        <nav aria-label="Screens" className="flex flex-col gap-1">
          {SCREENS.map((screen) => (
            <NavLink key={screen.path} to={href(screen.path)} end={screen.path === ''} className={linkClass}>
              <ScreenIcon name={screen.icon} />
              {screen.label}
            </NavLink>
          ))}
        </nav>
      </aside>

      <div className="flex min-h-dvh flex-col pb-20 lg:pb-0">
        <header className="sticky top-0 z-20 flex items-center justify-between gap-3 border-b border-line bg-paper/95 px-4 py-2 backdrop-blur">
          <div className="flex min-w-0 items-center gap-3">
            <span className="lg:hidden">
              <Brand compact />
            </span>
            <HouseholdSwitcher memberships={me.memberships} current={membership} />
          </div>
          <div className="flex items-center gap-2">
            <span className="hidden text-ink-muted sm:inline">{me.user.name}</span>
            <button
              type="button"
              onClick={signOut}
              className="min-h-11 rounded-lg px-3 font-bold text-action hover:bg-action-soft"
            >
              Sign out
            </button>
          </div>
        </header>
        <main id="main" className="mx-auto w-full max-w-6xl flex-1 px-4 py-5 sm:px-6">
          <Suspense fallback={null}>
            <OfflineBanner />
          </Suspense>
          <SetupBanner hid={hid} />
          <UnitSystemProvider system={household.data?.unitSystem ?? 'us'}>
            <Outlet />
          </UnitSystemProvider>
        </main>
      </div>

      <nav aria-label="Screens" className="fixed inset-x-0 bottom-0 z-30 border-t border-line bg-surface lg:hidden">
        {moreOpen && (
          <ul className="grid grid-cols-2 gap-1 border-b border-line p-2">
            {SCREENS.filter((s) => !s.primary).map((screen) => (
              <li key={screen.path}>
                <NavLink to={href(screen.path)} className={linkClass}>
                  <ScreenIcon name={screen.icon} />
                  {screen.label}
                </NavLink>
              </li>
            ))}
          </ul>
        )}
        <ul className="grid grid-cols-5">
          {SCREENS.filter((s) => s.primary).map((screen) => (
            <li key={screen.path}>
              <NavLink
                to={href(screen.path)}
                end={screen.path === ''}
                className={({ isActive }) =>
                  `flex min-h-14 flex-col items-center justify-center text-xs font-bold ${isActive ? 'text-action' : 'text-ink-muted'}`
                }
              >
                <ScreenIcon name={screen.icon} />
                {screen.label}
              </NavLink>
            </li>
          ))}
          <li>
            <button
              type="button"
              aria-expanded={moreOpen}
              onClick={() => setMoreOpenOn(moreOpen ? null : location.pathname)}
              className={`flex min-h-14 w-full flex-col items-center justify-center text-xs font-bold ${moreOpen ? 'text-action' : 'text-ink-muted'}`}
            >
              <ScreenIcon name="more" />
              More
            </button>
          </li>
        </ul>
      </nav>
    </div>
  );
}
