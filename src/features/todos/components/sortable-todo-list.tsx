import {
  closestCenter,
  DndContext,
  KeyboardSensor,
  PointerSensor,
  useSensor,
  useSensors,
  type DragEndEvent,
} from '@dnd-kit/core';
import {
  arrayMove,
  SortableContext,
  sortableKeyboardCoordinates,
  verticalListSortingStrategy,
} from '@dnd-kit/sortable';
import type { TodoFilter, TodoView } from '@shared/schemas/todos';
import { useMoveTodo } from '../api/move-todo';
import { useTickTodo } from '../api/update-todo';
import { TodoRow } from './todo-row';

interface Props {
  hid: string;
  filter: TodoFilter;
  todos: TodoView[];
  canMove: boolean;
  today: string;
  onOpen: (id: string) => void;
}

const titleOf = (todos: TodoView[], id: unknown) => todos.find((t) => t.id === id)?.title ?? 'the to-do';

export function SortableTodoList({ hid, filter, todos, canMove, today, onOpen }: Props) {
  const move = useMoveTodo(hid, filter);
  const tick = useTickTodo(hid);
  // A short drag distance keeps a tap on the handle from starting a drag on a phone.
  const sensors = useSensors(
    useSensor(PointerSensor, { activationConstraint: { distance: 6 } }),
    useSensor(KeyboardSensor, { coordinateGetter: sortableKeyboardCoordinates }),
  );

  const onDragEnd = ({ active, over }: DragEndEvent) => {
    if (!over || active.id === over.id) return;
    const from = todos.findIndex((t) => t.id === active.id);
    const to = todos.findIndex((t) => t.id === over.id);
    move.mutate({ id: String(active.id), position: todos[to].position, reordered: arrayMove(todos, from, to) });
  };

  return (
    <DndContext
      sensors={sensors}
      collisionDetection={closestCenter}
      onDragEnd={onDragEnd}
      accessibility={{
        screenReaderInstructions: {
          draggable:
            'To move a to-do, press space or enter on its handle, use the up and down arrows, then space or enter to drop it, or escape to cancel.',
        },
        announcements: {
          onDragStart: ({ active }) => `Picked up ${titleOf(todos, active.id)}.`,
          onDragOver: ({ active, over }) =>
            over
              ? `${titleOf(todos, active.id)} is over ${titleOf(todos, over.id)}.`
              : `${titleOf(todos, active.id)} is not over a place.`,
          onDragEnd: ({ active, over }) =>
            over
              ? `${titleOf(todos, active.id)} dropped at ${titleOf(todos, over.id)}.`
              : `${titleOf(todos, active.id)} dropped.`,
          onDragCancel: ({ active }) => `Moving ${titleOf(todos, active.id)} was canceled.`,
        },
      }}
    >
      <SortableContext items={todos.map((t) => t.id)} strategy={verticalListSortingStrategy}>
        <ul className="flex flex-col gap-2" aria-label="To-dos">
          {todos.map((todo) => (
            <TodoRow
              key={todo.id}
              todo={todo}
              canMove={canMove}
              today={today}
              onTick={(done) => tick.tick(todo, done)}
              onOpen={() => onOpen(todo.id)}
            />
          ))}
        </ul>
      </SortableContext>
      {move.isError && (
        <p role="alert" className="mt-2 font-bold text-past">
          {move.error.message}
        </p>
      )}
    </DndContext>
  );
}
