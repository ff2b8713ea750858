import { Link } from 'react-router-dom';
import type { RestockSuggestionView } from '@shared/schemas/restock';
import { dateWords } from '@shared/words';
import { AddToList } from './add-to-list';
import { paths } from '@shared/paths';
import { useUnits } from '@/lib/units';

const REASON_TITLES = { 'runs-out-soon': 'Runs out soon', 'below-minimum': 'Below your minimum' } as const;

/** A favourite that needs a batch: why, how many jars, and the step that puts it on the list. */
export function SuggestionCard({
  hid,
  suggestion,
  canCook,
  focused,
}: {
  hid: string;
  suggestion: RestockSuggestionView;
  canCook: boolean;
  focused: boolean;
}) {
  const units = useUnits();
  return (
    <article
      id={`restock-${suggestion.productId}`}
      aria-labelledby={`restock-${suggestion.productId}-name`}
      className={`flex flex-col gap-3 rounded-card border bg-surface p-4 ${focused ? 'border-action ring-2 ring-action/40' : 'border-line'}`}
    >
      <div>
        <p className="text-sm font-bold uppercase tracking-wide text-soon">{REASON_TITLES[suggestion.reason]}</p>
        <h3 id={`restock-${suggestion.productId}-name`} className="text-lg">
          {suggestion.productName}
        </h3>
        <p>{suggestion.why}</p>
        <p className="text-ink-muted">
          About {suggestion.suggestedJars} {units.jarSize(suggestion.jarSize)} jars last until{' '}
          {dateWords(suggestion.lastsUntil)}, the end of the next harvest month.
        </p>
      </div>
      {suggestion.openTodoId ? (
        <Link
          to={paths.todo(hid, suggestion.openTodoId)}
          className="inline-flex min-h-11 items-center font-bold text-action underline"
        >
          On the to-do list: open the batch plan
        </Link>
      ) : !suggestion.hasRecipe ? (
        <p>
          No recipe yet, so there is nothing to scale.{' '}
          <Link to={paths.newRecipe(hid, suggestion.productId)} className="font-bold text-action underline">
            Add a tested recipe
          </Link>
        </p>
      ) : canCook ? (
        <AddToList
          hid={hid}
          productId={suggestion.productId}
          productName={suggestion.productName}
          suggestedJars={suggestion.suggestedJars}
          jarSize={suggestion.jarSize}
        />
      ) : (
        <p className="text-ink-muted">A cook or keeper can put this batch on the to-do list.</p>
      )}
    </article>
  );
}
