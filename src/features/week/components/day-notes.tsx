import type { AllocationWarning } from '@shared/domain';
import { jarCode, productName, useBoard } from '../board-context';
import { formatTbsp } from './pairing-line';

function warningText(warning: AllocationWarning, board: ReturnType<typeof useBoard>) {
  const name = productName(board.week, String(warning.productId));
  if (warning.kind === 'short') return `The shelf runs short of ${name}: ${formatTbsp(warning.tbsp)} not covered.`;
  return `Jar ${jarCode(board.week, warning.jarId)} of ${name} passes its use-by with ${formatTbsp(warning.tbsp)} left.`;
}

/** A day's jar news from the allocation: jars to open, and what to act on. */
export function DayNotes({ date }: { date: string }) {
  const board = useBoard();
  const { allocation } = board.week;
  const openings = allocation.openings.filter((o) => o.date === date);
  const warnings = allocation.warnings.filter((w) => w.date === date);
  if (openings.length === 0 && warnings.length === 0) return null;
  return (
    <div className="flex flex-col gap-1 text-sm">
      {openings.map((opening) => {
        const jar = board.week.jars[String(opening.jarId)];
        return (
          <p key={String(opening.jarId)} className="rounded-md border border-info/40 bg-info-soft px-2 py-1">
            Open a new jar of {productName(board.week, jar?.productId ?? '')} <span className="tabular text-ink-muted">({jarCode(board.week, opening.jarId)})</span>
          </p>
        );
      })}
      {warnings.map((warning, i) => (
        <div key={`${warning.kind}-${String(warning.productId)}-${i}`} role="note" className="rounded-md border border-soon-fill bg-soon-soft px-2 py-1">
          <p>{warningText(warning, board)}</p>
          <RestockButton productId={String(warning.productId)} />
        </div>
      ))}
    </div>
  );
}

function RestockButton({ productId }: { productId: string }) {
  const { canEdit, restock, week } = useBoard();
  if (!canEdit || !restock.available) return null;
  if (restock.added.has(productId)) return <p className="font-bold text-action">On the to-do list</p>;
  return (
    <button
      type="button"
      className="mt-1 min-h-9 rounded-md px-1 text-left font-bold text-action underline-offset-2 hover:underline pointer-coarse:min-h-11"
      disabled={restock.todo.isPending}
      onClick={() => restock.add(productId)}
    >
      Add a restock to-do for {productName(week, productId)}
    </button>
  );
}
