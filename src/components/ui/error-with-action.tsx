import { Link } from 'react-router-dom';
import { ApiError } from '@/lib/api-client';

/** The way forward a refusal names (an ApiError's action), as a link after its message; nothing when there is none. */
export function RefusalAction({ action }: { action?: { href: string; label: string } }) {
  if (!action) return null;
  return (
    <>
      {' '}
      <Link to={action.href} className="text-action underline underline-offset-2">
        {action.label}
      </Link>
    </>
  );
}

/** A refusal shown beside the button that was pressed, with the way forward the server named (e.g. "Add a recipe"). */
export function ErrorWithAction({ error }: { error: Error }) {
  const action = error instanceof ApiError ? error.action : undefined;
  return (
    <p role="alert" className="mt-1 text-sm font-bold text-past">
      {error.message}
      <RefusalAction action={action} />
    </p>
  );
}
