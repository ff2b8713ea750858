import { Link } from 'react-router-dom';
import type { RestockSuggestionView } from '@shared/schemas/restock';
import { paths } from '@shared/paths';
import { useUnits } from '@/lib/units';

/** The favourites that need a batch; each opens its place on the Restock screen. */

export function RestockGlance({ hid, suggestions }: { hid: string; suggestions: RestockSuggestionView[] }) {
  const units = useUnits();
  if (suggestions.length === 0) return <p className="text-ink-muted">Every favorite is stocked past its minimum.</p>;
  return (
    <ul className="flex flex-col gap-2">
      {suggestions.map((suggestion) => (
        <li key={suggestion.productId}>
          <Link
            to={paths.restock(hid, suggestion.productId)}
            className="flex min-h-11 flex-col rounded-lg border border-line px-3 py-2 hover:border-action hover:bg-action-soft"
          >
            <span className="font-bold text-action">{suggestion.productName}</span>
            <span className="text-sm text-ink-muted">
              {suggestion.why}{' '}
              {suggestion.openTodoId
                ? 'A batch is on the list.'
                : `Make about ${suggestion.suggestedJars} ${units.jarSize(suggestion.jarSize)} jars.`}
            </span>
          </Link>
        </li>
      ))}
    </ul>
  );
}
