import { Link } from 'react-router-dom';
import type { TodayTodo } from '@shared/schemas/today';
import { dateWords } from '@shared/words';
import { useTickTodo } from '@/features/todos';
import { paths } from '@shared/paths';

/** The signed-in person's open to-dos, tickable right here. */
export function MyTodos({ hid, todos }: { hid: string; todos: TodayTodo[] }) {
  const tick = useTickTodo(hid);
  if (todos.length === 0) return <p className="text-ink-muted">Nothing on the list is assigned to you.</p>;
  return (
    <ul className="divide-y divide-line">
      {todos.map((todo) => (
        <li key={todo.id} className="flex items-center gap-3 py-1">
          <label className="flex h-11 w-11 shrink-0 cursor-pointer items-center justify-center">
            <input
              type="checkbox"
              className="h-6 w-6 accent-action"
              aria-label={`Done: ${todo.title}`}
              disabled={tick.isSending}
              onChange={() => tick.tick(todo, true)}
            />
          </label>
          <Link
            to={paths.todo(hid, todo.kind === 'restock' ? todo.id : null)}
            className="flex min-h-11 flex-1 flex-col justify-center hover:underline"
          >
            <span>{todo.title}</span>
            {todo.dueOn && <span className="text-sm text-ink-muted">by {dateWords(todo.dueOn)}</span>}
          </Link>
        </li>
      ))}
    </ul>
  );
}
