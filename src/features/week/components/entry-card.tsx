import { useSortable } from '@dnd-kit/sortable';
import { CSS } from '@dnd-kit/utilities';
import type { PlanEntryView } from '@shared/schemas/week';
import { useBoard } from '../board-context';
import { accepts, type DragSource, type DropTarget } from '../drag';
import { isPending } from '../week-edits';
import { EatersPicker } from './eaters-picker';
import { NumberCommit } from './number-commit';
import { PairingLine } from './pairing-line';

/** One planned meal: its servings, who eats, and the jars it draws from. Products dropped on it pair with it. */
export function EntryCard({ entry }: { entry: PlanEntryView }) {
  const board = useBoard();
  const target: DropTarget = { type: 'entry', entry };
  const { attributes, listeners, setNodeRef, setActivatorNodeRef, transform, transition, isDragging, isOver, active } = useSortable({
    id: entry.id,
    data: { type: 'entry', entry },
    disabled: !board.canEdit || isPending(entry.id),
  });
  const welcoming = isOver && accepts(active?.data.current as DragSource | undefined, target) && (active?.data.current as DragSource).type === 'product';
  return (
    <article
      ref={setNodeRef}
      style={{ transform: CSS.Translate.toString(transform), transition }}
      aria-label={`${entry.title}, ${entry.servings} servings`}
      data-entry={entry.title}
      className={`rounded-lg border bg-surface p-1.5 shadow-sm ${isDragging ? 'opacity-40' : ''} ${welcoming ? 'border-action ring-2 ring-action' : 'border-line'}`}
    >
      <header className="flex items-center gap-1">
        {board.canEdit && (
          <button
            type="button"
            ref={setActivatorNodeRef}
            {...attributes}
            {...listeners}
            aria-label={`Move ${entry.title}`}
            className="-ml-0.5 grid min-h-8 min-w-6 shrink-0 cursor-grab touch-none place-items-center rounded text-ink-muted hover:bg-sunken pointer-coarse:min-h-11 pointer-coarse:min-w-9"
          >
            <svg width="10" height="16" viewBox="0 0 10 16" aria-hidden="true" className="fill-current">
              {[2, 8, 14].flatMap((y) => [<circle key={`a${y}`} cx="2" cy={y} r="1.5" />, <circle key={`b${y}`} cx="8" cy={y} r="1.5" />])}
            </svg>
          </button>
        )}
        <div className="flex min-w-0 flex-1 items-center gap-1 text-xs text-ink-muted">
          {board.canEdit && !isPending(entry.id) ? (
            <NumberCommit label={`Servings of ${entry.title}`} value={entry.servings} min={1} max={100} onCommit={(servings) => board.updateEntry.mutate({ id: entry.id, patch: { servings } })} />
          ) : (
            <span className="tabular">{entry.servings}</span>
          )}
          <span>servings</span>
        </div>
      </header>
      <div className="mt-0.5 flex items-start gap-1">
        <h4 className="min-w-0 flex-1 text-sm font-bold leading-snug">{entry.title}</h4>
        {board.canEdit && !isPending(entry.id) && (
          <button
            type="button"
            aria-label={`Remove ${entry.title} from the plan`}
            className="-mr-0.5 grid min-h-8 min-w-6 shrink-0 place-items-center rounded text-ink-muted hover:bg-past-soft hover:text-past pointer-coarse:min-h-11 pointer-coarse:min-w-11"
            onClick={() => board.deleteEntry.mutate(entry.id)}
          >
            ×
          </button>
        )}
      </div>
      {entry.pairings.length > 0 && (
        <ul className="mt-1.5 flex flex-col gap-1" aria-label={`Jars for ${entry.title}`}>
          {entry.pairings.map((pairing) => (
            <PairingLine key={pairing.id} pairing={pairing} entry={entry} />
          ))}
        </ul>
      )}
      {!isPending(entry.id) && <EatersPicker entry={entry} />}
    </article>
  );
}
