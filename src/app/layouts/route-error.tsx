import { isRouteErrorResponse, Link, useLocation, useParams, useRouteError } from 'react-router-dom';
import { paths } from '@shared/paths';

/** What went wrong, in one line a person can pass on. */
function describe(error: unknown): string {
  if (isRouteErrorResponse(error)) return `${error.status} ${error.statusText}`.trim();
  if (error instanceof Error) return error.message;
  return String(error);
}

/**
 * One screen's error boundary: a screen whose data cannot be drawn shows this in its place, while the navigation
 * around it keeps working, so bad data on one screen never takes down the whole app.
 */
export function RouteError() {
  const error = useRouteError();
  const { hid } = useParams();
  const { pathname, search } = useLocation();
  const home = hid ? paths.today(hid) : paths.home();
  return (
    <section className="mx-auto w-full max-w-lg p-4 sm:p-6" role="alert" aria-labelledby="route-error-title">
      <div className="flex flex-col gap-3 rounded-card border border-past/50 bg-past-soft px-4 py-4 text-ink">
        <h1 id="route-error-title" className="text-xl font-bold">
          This screen could not be shown
        </h1>
        <p>
          Something on it could not be read, so Larderly stopped this screen. Your data is unchanged, and the rest of
          the app still works.
        </p>
        <p className="text-[0.95rem]">
          What happened: <code className="break-all rounded bg-surface px-1">{describe(error)}</code>
        </p>
        <div className="flex flex-wrap gap-3">
          <a
            href={`${pathname}${search}`}
            className="inline-flex min-h-11 items-center rounded-lg border border-line bg-surface px-4 font-bold hover:bg-sunken"
          >
            Try again
          </a>
          {pathname !== home && (
            <Link
              to={home}
              className="inline-flex min-h-11 items-center font-bold text-action underline underline-offset-4"
            >
              Go to Today
            </Link>
          )}
        </div>
      </div>
    </section>
  );
}
