import type { AllocationWarning } from '@shared/domain';
import { jarCode, productName, useBoard } from '../board-context';
import { useState } from 'react';
import { ErrorWithAction } from '@/components/ui/error-with-action';
import { weekday } from '../drag';
import { nextMealFor } from '../next-meal';
import { useUnits, type Units } from '@/lib/units';

function warningText(warning: AllocationWarning, board: ReturnType<typeof useBoard>, units: Units) {
  const name = productName(board.week, String(warning.productId));
  if (warning.kind === 'short')
    return `Not enough ${name} on the shelf: the plan needs ${units.tbsp(warning.tbsp)} more than it holds.`;
  return `Jar ${jarCode(board.week, warning.jarId)} of ${name} passes its use-by with ${units.tbsp(warning.tbsp)} left.`;
}

/** A day's jar news from the allocation: jars to open (by product), and what to act on. */
export function DayNotes({ date }: { date: string }) {
  const board = useBoard();
  const units = useUnits();
  const { allocation, jars } = board.week;
  const opened = new Map<string, string[]>();
  for (const opening of allocation.openings.filter((o) => o.date === date)) {
    const productId = jars[String(opening.jarId)]?.productId ?? '';
    opened.set(productId, [...(opened.get(productId) ?? []), jarCode(board.week, opening.jarId)]);
  }
  const warnings = allocation.warnings.filter((w) => w.date === date);
  if (opened.size === 0 && warnings.length === 0) return null;
  return (
    <div className="flex flex-col gap-1 text-xs leading-snug">
      {[...opened].map(([productId, codes]) => (
        <p key={productId} className="rounded-md border border-info/40 bg-info-soft px-1.5 py-1">
          {codes.length === 1 ? 'Open a new jar of ' : `Open ${codes.length} new jars of `}
          <strong>{productName(board.week, productId)}</strong>{' '}
          <span className="tabular text-ink-muted">({codes.join(', ')})</span>
        </p>
      ))}
      {warnings.map((warning, i) => (
        <div
          key={`${warning.kind}-${String(warning.productId)}-${i}`}
          role="note"
          className="rounded-md border border-soon-fill bg-soon-soft px-1.5 py-1"
        >
          <p>{warningText(warning, board, units)}</p>
          {warning.kind === 'will-expire' ? (
            <PlanItOnAMeal productId={String(warning.productId)} jarId={String(warning.jarId)} useBy={warning.date} />
          ) : (
            <RestockButton productId={String(warning.productId)} />
          )}
        </div>
      ))}
    </div>
  );
}

const LINK_BUTTON =
  'mt-0.5 min-h-8 rounded px-0.5 text-left font-bold text-action underline underline-offset-2 pointer-coarse:min-h-11';

function RestockButton({ productId }: { productId: string }) {
  const { canEdit, restock, week } = useBoard();
  if (!canEdit) return null;
  if (restock.added.has(productId)) return <p className="font-bold text-action">On the to-do list</p>;
  const refusal = restock.refused.get(productId);
  return (
    <>
      <button
        type="button"
        aria-label={`Add a restock to-do for ${productName(week, productId)}`}
        className={LINK_BUTTON}
        disabled={restock.todo.isPending}
        onClick={() => restock.add(productId)}
      >
        Add a restock to-do
      </button>
      {refusal && <ErrorWithAction error={refusal} />}
    </>
  );
}

/** A jar that would turn with food left goes on the next planned meal before its use-by that does not have it yet. */
function PlanItOnAMeal({ productId, jarId, useBy }: { productId: string; jarId: string; useBy: string }) {
  const { canEdit, week, meals, addPairing } = useBoard();
  const [placed, setPlaced] = useState<string | null>(null);
  const [refusal, setRefusal] = useState<Error | null>(null);
  if (!canEdit) return null;
  const name = productName(week, productId);
  if (placed)
    return (
      <p role="status" className="font-bold text-action">
        {placed}
      </p>
    );
  const entry = nextMealFor(week, meals, productId, useBy);
  if (!entry)
    return (
      <p className="text-ink-muted">
        No meal planned by {weekday(useBy)} usually takes {name}: drag it from the shelf onto one, or plan one it suits.
      </p>
    );
  const where = `${weekday(entry.date)} ${entry.slot}, ${entry.title}`;
  return (
    <>
      <button
        type="button"
        aria-label={`Plan it on a meal: jar ${jarCode(week, jarId)} of ${name}, on ${where}`}
        className={LINK_BUTTON}
        disabled={addPairing.isPending}
        onClick={() => {
          setRefusal(null);
          addPairing.mutate(
            { entryId: entry.id, productId },
            { onSuccess: () => setPlaced(`Paired with ${where}`), onError: setRefusal },
          );
        }}
      >
        Plan it on a meal
      </button>
      <span className="block text-ink-muted">Adds it to {where}.</span>
      {refusal && <ErrorWithAction error={refusal} />}
    </>
  );
}
