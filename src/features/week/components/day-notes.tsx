import type { AllocationWarning } from '@shared/domain';
import { jarCode, productName, useBoard } from '../board-context';
import { tbspWords } from '@shared/words';

function warningText(warning: AllocationWarning, board: ReturnType<typeof useBoard>) {
  const name = productName(board.week, String(warning.productId));
  if (warning.kind === 'short') return `Not enough ${name} on the shelf: the plan needs ${tbspWords(warning.tbsp)} more than it holds.`;
  return `Jar ${jarCode(board.week, warning.jarId)} of ${name} passes its use-by with ${tbspWords(warning.tbsp)} left.`;
}

/** A day's jar news from the allocation: jars to open (by product), and what to act on. */
export function DayNotes({ date }: { date: string }) {
  const board = useBoard();
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
          <strong>{productName(board.week, productId)}</strong> <span className="tabular text-ink-muted">({codes.join(', ')})</span>
        </p>
      ))}
      {warnings.map((warning, i) => (
        <div key={`${warning.kind}-${String(warning.productId)}-${i}`} role="note" className="rounded-md border border-soon-fill bg-soon-soft px-1.5 py-1">
          <p>{warningText(warning, board)}</p>
          <RestockButton productId={String(warning.productId)} />
        </div>
      ))}
    </div>
  );
}

function RestockButton({ productId }: { productId: string }) {
  const { canEdit, restock, week } = useBoard();
  if (!canEdit) return null;
  if (restock.added.has(productId)) return <p className="font-bold text-action">On the to-do list</p>;
  return (
    <button
      type="button"
      aria-label={`Add a restock to-do for ${productName(week, productId)}`}
      className="mt-0.5 min-h-8 rounded px-0.5 text-left font-bold text-action underline underline-offset-2 pointer-coarse:min-h-11"
      disabled={restock.todo.isPending}
      onClick={() => restock.add(productId)}
    >
      Add a restock to-do
    </button>
  );
}
