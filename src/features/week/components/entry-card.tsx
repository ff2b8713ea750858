import { useSortable } from '@dnd-kit/sortable';
import { CSS } from '@dnd-kit/utilities';
import { useState } from 'react';
import type { PlanEntryView } from '@shared/schemas/week';
import { productName, useBoard } from '../board-context';
import { accepts, weekday, type DragSource, type DropTarget } from '../drag';
import { isPending } from '../week-edits';
import { EatersPicker } from './eaters-picker';
import { NumberCommit } from './number-commit';
import { PairingLine } from './pairing-line';

/** "4 srv · 1 jar": what the card shows until its servings and amounts are opened for editing. */
function summaryOf(entry: PlanEntryView, members: number) {
  const jars = entry.pairings.length;
  return [
    `${entry.servings} srv`,
    jars ? `${jars} jar${jars === 1 ? '' : 's'}` : '',
    entry.eaters === null ? '' : `${entry.eaters.length} of ${members} eat`,
  ]
    .filter(Boolean)
    .join(' · ');
}

/** One planned meal: its servings, who eats, and the jars it draws from. Products dropped on it pair with it. */
export function EntryCard({ entry }: { entry: PlanEntryView }) {
  const board = useBoard();
  const [editing, setEditing] = useState(false);
  const target: DropTarget = { type: 'entry', entry };
  const { attributes, listeners, setNodeRef, setActivatorNodeRef, transform, transition, isDragging, isOver, active } =
    useSortable({
      id: entry.id,
      data: { type: 'entry', entry },
      disabled: !board.canEdit || isPending(entry.id),
    });
  const welcoming =
    isOver &&
    accepts(active?.data.current as DragSource | undefined, target) &&
    (active?.data.current as DragSource).type === 'product';
  const editable = board.canEdit && !isPending(entry.id);
  const held = board.held?.type === 'product' ? board.held : null;
  const summary = summaryOf(entry, board.week.members.length);
  return (
    <article
      ref={setNodeRef}
      style={{ transform: CSS.Translate.toString(transform), transition }}
      aria-label={`${entry.title}, ${entry.servings} servings`}
      data-entry={entry.title}
      className={`rounded-md border bg-surface px-1 py-0.5 shadow-sm ${isDragging ? 'opacity-40' : ''} ${welcoming ? 'border-action ring-2 ring-action' : 'border-line'}`}
    >
      <header className="flex items-center gap-0.5">
        {board.canEdit && (
          <button
            type="button"
            ref={setActivatorNodeRef}
            {...attributes}
            {...listeners}
            aria-label={`Move ${entry.title}`}
            className="-ml-0.5 grid min-h-7 min-w-5 shrink-0 cursor-grab touch-none place-items-center rounded text-ink-muted hover:bg-sunken pointer-coarse:min-h-11 pointer-coarse:min-w-9"
          >
            <svg width="8" height="14" viewBox="0 0 10 16" aria-hidden="true" className="fill-current">
              {[2, 8, 14].flatMap((y) => [
                <circle key={`a${y}`} cx="2" cy={y} r="1.5" />,
                <circle key={`b${y}`} cx="8" cy={y} r="1.5" />,
              ])}
            </svg>
          </button>
        )}
        {editable ? (
          <button
            type="button"
            aria-expanded={editing}
            aria-label={`Servings and amounts of ${entry.title}: ${summary}`}
            onClick={() => setEditing(!editing)}
            className={`tabular min-h-7 min-w-0 flex-1 truncate rounded px-0.5 text-left text-xs pointer-coarse:min-h-11 ${editing ? 'bg-action-soft font-bold text-action' : 'text-ink-muted hover:bg-sunken'}`}
          >
            {summary}
          </button>
        ) : (
          <span className="tabular min-w-0 flex-1 truncate text-xs text-ink-muted">{summary}</span>
        )}
        {editable && (
          <button
            type="button"
            aria-label={`Remove ${entry.title} from the plan`}
            className="-mr-0.5 grid min-h-7 min-w-5 shrink-0 place-items-center rounded text-ink-muted hover:bg-past-soft hover:text-past pointer-coarse:min-h-11 pointer-coarse:min-w-11"
            onClick={() => board.deleteEntry.mutate(entry.id)}
          >
            ×
          </button>
        )}
      </header>
      <h4 className="break-words text-[0.8125rem] font-bold leading-tight" data-testid="entry-title">
        {entry.title}
      </h4>
      {editing && editable && (
        <label className="mt-1 flex items-center gap-1 text-xs text-ink-muted">
          <NumberCommit
            label={`Servings of ${entry.title}`}
            value={entry.servings}
            min={1}
            max={100}
            onCommit={(servings) => board.updateEntry.mutate({ id: entry.id, patch: { servings } })}
          />
          <span aria-hidden="true">servings</span>
        </label>
      )}
      {entry.pairings.length > 0 && (
        <ul className="mt-0.5 flex flex-col gap-0.5" aria-label={`Jars for ${entry.title}`}>
          {entry.pairings.map((pairing) => (
            <PairingLine key={pairing.id} pairing={pairing} entry={entry} editing={editing} />
          ))}
        </ul>
      )}
      {held &&
        (entry.pairings.some((p) => p.productId === held.product.id) ? (
          <p className="mt-0.5 text-xs text-ink-muted">Has {productName(board.week, held.product.id)}</p>
        ) : (
          <button
            type="button"
            disabled={!editable}
            onClick={() => board.put(held, target)}
            aria-label={`Pair ${held.product.name} with ${entry.title} on ${weekday(entry.date)} ${entry.slot}`}
            className="mt-0.5 min-h-11 w-full rounded-md border-2 border-dashed border-action px-1 text-xs font-bold text-action hover:bg-action-soft disabled:border-line disabled:text-ink-muted"
          >
            Pair here
          </button>
        ))}
      {editing && editable && <EatersPicker entry={entry} />}
    </article>
  );
}
