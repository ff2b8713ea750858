import { useSortable } from '@dnd-kit/sortable';
import { CSS } from '@dnd-kit/utilities';
import type { TodoView } from '@shared/schemas/todos';
import { dateWords } from '@shared/words';

interface TodoRowProps {
  todo: TodoView;
  canMove: boolean;
  today: string;
  onTick: (done: boolean) => void;
  onOpen: () => void;
}

/** One to-do: tick, title and what it needs, a handle to drag it (or move it with the keyboard). */
export function TodoRow({ todo, canMove, today, onTick, onOpen }: TodoRowProps) {
  const { attributes, listeners, setNodeRef, setActivatorNodeRef, transform, transition, isDragging } = useSortable({
    id: todo.id,
    disabled: !canMove,
  });
  const overdue = !todo.done && todo.dueOn !== null && todo.dueOn < today;
  return (
    <li
      ref={setNodeRef}
      style={{ transform: CSS.Transform.toString(transform), transition }}
      className={`flex items-center gap-1 rounded-card border border-line bg-surface pr-2 ${isDragging ? 'relative z-10 shadow-lg' : ''}`}
    >
      {canMove && (
        <button
          type="button"
          ref={setActivatorNodeRef}
          {...attributes}
          {...listeners}
          aria-label={`Move: ${todo.title}`}
          className="flex h-11 w-11 shrink-0 cursor-grab touch-none items-center justify-center text-ink-muted hover:text-ink"
        >
          <svg viewBox="0 0 24 24" className="h-5 w-5" aria-hidden="true">
            <path
              d="M9 6h.01M15 6h.01M9 12h.01M15 12h.01M9 18h.01M15 18h.01"
              stroke="currentColor"
              strokeWidth="3.5"
              strokeLinecap="round"
            />
          </svg>
        </button>
      )}
      <label className={`flex h-11 w-11 shrink-0 cursor-pointer items-center justify-center ${canMove ? '' : 'ml-1'}`}>
        <input
          type="checkbox"
          checked={todo.done}
          onChange={(event) => onTick(event.target.checked)}
          aria-label={`Done: ${todo.title}`}
          className="h-6 w-6 accent-action"
        />
      </label>
      <button
        type="button"
        onClick={onOpen}
        className="flex min-h-14 min-w-0 flex-1 flex-col justify-center py-2 text-left"
      >
        <span className={`font-bold ${todo.done ? 'text-ink-muted line-through' : ''}`}>{todo.title}</span>
        <span className="flex flex-wrap gap-x-3 text-sm text-ink-muted">
          {todo.kind === 'restock' && <span className="font-bold text-info">Batch plan</span>}
          {todo.dueOn && (
            <span className={overdue ? 'font-bold text-soon' : ''}>
              {overdue ? 'was due' : 'by'} {dateWords(todo.dueOn)}
            </span>
          )}
          {todo.assigneeName && <span>{todo.assigneeName}</span>}
          {todo.notes && <span className="truncate">{todo.notes}</span>}
        </span>
      </button>
    </li>
  );
}
