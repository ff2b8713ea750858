import type { ReactNode } from 'react';
import { Link } from 'react-router-dom';

/** One block of the Today screen: a heading, its content, and where to see all of it. */
export function TodaySection({
  title,
  id,
  more,
  children,
}: {
  title: string;
  id: string;
  more?: { to: string; label: string };
  children: ReactNode;
}) {
  return (
    <section aria-labelledby={id} className="rounded-card border border-line bg-surface p-4">
      <div className="mb-2 flex items-baseline justify-between gap-3">
        <h2 id={id} className="text-xl">
          {title}
        </h2>
        {more && (
          <Link
            to={more.to}
            className="inline-flex min-h-11 items-center font-bold text-action underline-offset-4 hover:underline"
          >
            {more.label}
          </Link>
        )}
      </div>
      {children}
    </section>
  );
}
