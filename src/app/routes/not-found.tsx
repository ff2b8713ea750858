import { Link } from 'react-router-dom';
import { EmptyState } from '@/components/ui/page';
import { paths } from '@shared/paths';

export function NotFoundRoute() {
  return (
    <main className="mx-auto max-w-lg p-6">
      <EmptyState
        title="Nothing on this shelf"
        action={
          <Link to={paths.home()} className="font-bold text-action underline underline-offset-4">
            Go to Today
          </Link>
        }
      >
        This page does not exist, or it belongs to a household you are not part of.
      </EmptyState>
    </main>
  );
}
