import type { PairingView, PlanEntryView } from '@shared/schemas/week';
import { jarCode, productName, useBoard } from '../board-context';
import { isPending } from '../week-edits';
import { NumberCommit } from './number-commit';
import { heatWords } from '@shared/words';
import { ReasonToggle } from '@/components/ui/reason-toggle';
import { useUnits, type Units } from '@/lib/units';

/** Which jar a pairing draws from, or how much the shelf lacks. */

function allocationLine(
  pairing: PairingView,
  entry: PlanEntryView,
  board: ReturnType<typeof useBoard>,
  units: Units,
): { text: string; lacking: boolean } {
  const { week } = board;
  if (entry.date < week.today) return { text: 'Day is over; its jars are not counted', lacking: false };
  const draws = isPending(pairing.id)
    ? []
    : week.allocation.assignments.filter((a) => String(a.portionId) === pairing.id);
  if (draws.length === 0) return { text: 'Finding a jar…', lacking: false };
  const text = draws
    .map((a) => {
      if (a.jarId === null) return `${units.tbsp(a.tbsp)} more than the shelf holds`;
      const opens = week.allocation.openings.some((o) => o.jarId === a.jarId && o.date === entry.date);
      return `${opens ? 'opens' : 'from'} jar ${jarCode(week, a.jarId)}`;
    })
    .join(', then ');
  return { text, lacking: draws.some((a) => a.jarId === null) };
}

export function PairingLine({
  pairing,
  entry,
  editing,
}: {
  pairing: PairingView;
  entry: PlanEntryView;
  editing: boolean;
}) {
  const units = useUnits();
  const board = useBoard();
  const name = productName(board.week, pairing.productId);
  const product = board.week.products.find((p) => p.id === pairing.productId);
  const line = allocationLine(pairing, entry, board, units);
  const editable = board.canEdit && !isPending(pairing.id);
  return (
    <li data-pairing={name} className="rounded bg-sunken/70 px-1 py-0.5 text-xs leading-tight">
      <div className="flex items-start justify-between gap-0.5">
        <span className="min-w-0 font-bold">
          {name}
          {editing && product && product.heat > 0 && (
            <span className="font-normal text-ink-muted"> · {heatWords(product.heat)}</span>
          )}
          {!editing && (
            <span className="tabular font-normal text-ink-muted"> · {units.tbsp(pairing.tbspPerServing)} each</span>
          )}
        </span>
        {editable && (
          <button
            type="button"
            className="-m-0.5 grid min-h-6 min-w-6 shrink-0 place-items-center rounded text-ink-muted hover:bg-past-soft hover:text-past pointer-coarse:min-h-11 pointer-coarse:min-w-11"
            aria-label={`Unpair ${name} from ${entry.title}`}
            onClick={() => board.deletePairing.mutate(pairing.id)}
          >
            ×
          </button>
        )}
      </div>
      <p className={`tabular ${line.lacking ? 'font-bold text-past' : 'text-info'}`} data-testid="allocation-line">
        {line.text}
      </p>
      {editing && editable && (
        <div className="flex items-center gap-1 text-ink-muted">
          <NumberCommit
            label={`Tablespoons of ${name} per serving of ${entry.title}`}
            value={pairing.tbspPerServing}
            min={0.25}
            max={64}
            step={0.25}
            onCommit={(tbspPerServing) => board.updatePairing.mutate({ id: pairing.id, tbspPerServing })}
          />
          <span>tbsp each</span>
        </div>
      )}
      {pairing.flags.length > 0 && (
        <ul className="mt-0.5 flex flex-col gap-0.5">
          {pairing.flags.map((flag) => (
            <li key={`${flag.kind}-${flag.userId}`} className="rounded bg-soon-soft px-1 font-bold text-soon">
              <ReasonToggle label={`⚑ ${flag.label}`} reason={flag.reason} />
            </li>
          ))}
        </ul>
      )}
    </li>
  );
}
