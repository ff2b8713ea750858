import { useDroppable } from '@dnd-kit/core';
import { SortableContext, verticalListSortingStrategy } from '@dnd-kit/sortable';
import type { PlanEntryView, Slot } from '@shared/schemas/week';
import { useBoard } from '../board-context';
import { SLOT_LABELS, slotId, weekday, type DragSource } from '../drag';
import { EntryCard } from './entry-card';

/** One slot of a day: its planned meals in order, and a place to drop more. */
export function SlotList({ date, slot, entries }: { date: string; slot: Slot; entries: PlanEntryView[] }) {
  const board = useBoard();
  const { setNodeRef, isOver, active } = useDroppable({
    id: slotId(date, slot),
    data: { type: 'slot', date, slot },
    disabled: !board.canEdit,
  });
  const dragging = active?.data.current as DragSource | undefined;
  const welcoming = isOver && dragging !== undefined && dragging.type !== 'product';
  return (
    <section
      ref={setNodeRef}
      aria-label={SLOT_LABELS[slot]}
      className={`rounded-lg p-0.5 transition-colors ${welcoming ? 'bg-action-soft ring-2 ring-action' : 'bg-sunken/50'}`}
    >
      <h3 className="px-1 text-xs font-bold uppercase tracking-wide text-ink-muted">{SLOT_LABELS[slot]}</h3>
      <SortableContext id={slotId(date, slot)} items={entries.map((e) => e.id)} strategy={verticalListSortingStrategy}>
        <div className="mt-0.5 flex min-h-11 flex-col gap-1">
          {entries.map((entry) => (
            <EntryCard key={entry.id} entry={entry} />
          ))}
          {board.held?.type === 'meal' ? (
            <button
              type="button"
              onClick={() => board.held && board.put(board.held, { type: 'slot', date, slot })}
              aria-label={`Put ${board.held.meal.name} on ${weekday(date)} ${slot}`}
              className="min-h-11 rounded-md border-2 border-dashed border-action bg-surface px-1 text-xs font-bold text-action hover:bg-action-soft"
            >
              Put here
            </button>
          ) : (
            entries.length === 0 && (
              <p className="px-1 py-2 text-xs text-ink-muted">
                {board.canEdit ? 'Drop a meal here' : 'Nothing planned'}
              </p>
            )
          )}
        </div>
      </SortableContext>
    </section>
  );
}
