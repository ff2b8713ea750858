import { useSearchParams } from 'react-router-dom';
import { can } from '@shared/roles';
import type { TodoFilter } from '@shared/schemas/todos';
import { TODO_FILTERS } from '@shared/choices';
import { calendarDateIn } from '@shared/time-zones';
import { Notice } from '@/components/ui/notice';
import { EmptyState, PageHeader } from '@/components/ui/page';
import { useHousehold, useMembers } from '@/features/households/api/get-household';
import { useCurrentHousehold } from '@/features/households/use-current-household';
import { useTodos } from '@/features/todos/api/get-todos';
import { NewTodoForm } from '@/features/todos/components/new-todo-form';
import { SortableTodoList } from '@/features/todos/components/sortable-todo-list';
import { TodoFilters } from '@/features/todos/components/todo-filters';
import { TodoPanel } from '@/features/todos/components/todo-panel';

const EMPTY_WORDS: Record<TodoFilter, { title: string; body: string }> = {
  open: {
    title: 'The list is clear',
    body: 'Restock batches from the Restock screen and everyday jobs land here for the whole household.',
  },
  mine: { title: 'Nothing is yours', body: 'Open a to-do and choose yourself under “Who” to see it here.' },
  done: { title: 'Nothing ticked yet', body: 'Ticked to-dos stay here so the household can see what got done.' },
  all: {
    title: 'The list is clear',
    body: 'Restock batches from the Restock screen and everyday jobs land here for the whole household.',
  },
};

export function TodoRoute() {
  const { hid, role } = useCurrentHousehold();
  const [params, setParams] = useSearchParams();
  const filter = (TODO_FILTERS as readonly string[]).includes(params.get('show') ?? '')
    ? (params.get('show') as TodoFilter)
    : 'open';
  const openId = params.get('open');
  const todos = useTodos(hid, filter);
  // The opened item is looked up in the whole list, so a done or someone else's item still opens.
  const everything = useTodos(hid, 'all');
  const members = useMembers(hid);
  const household = useHousehold(hid);
  const canCook = can(role, 'cook');
  const opened = openId ? everything.data?.find((t) => t.id === openId) : undefined;

  const change = (next: Record<string, string | null>) =>
    setParams((current) => {
      const merged = new URLSearchParams(current);
      for (const [key, value] of Object.entries(next)) {
        if (value === null) merged.delete(key);
        else merged.set(key, value);
      }
      return merged;
    });

  return (
    <>
      <PageHeader
        title="To-do"
        lead="The household list, with batch plans for the next canning day."
        actions={<TodoFilters filter={filter} onChange={(show) => change({ show })} />}
      />
      <div className="flex max-w-3xl flex-col gap-4">
        {canCook && <NewTodoForm hid={hid} />}
        {todos.isError && (
          <Notice tone="past" role="alert" title="The list could not be loaded">
            {todos.error.message}
          </Notice>
        )}
        {!todos.data && !todos.isError && <p className="text-ink-muted">Loading…</p>}
        {todos.data && todos.data.length === 0 && (
          <EmptyState title={EMPTY_WORDS[filter].title}>{EMPTY_WORDS[filter].body}</EmptyState>
        )}
        {todos.data && todos.data.length > 0 && (
          <SortableTodoList
            hid={hid}
            filter={filter}
            todos={todos.data}
            canMove={canCook}
            today={calendarDateIn(household.data?.timeZone ?? 'UTC')}
            onOpen={(open) => change({ open })}
          />
        )}
        {openId && everything.data && !opened && (
          <Notice tone="soon" title="That to-do is no longer on the list">
            It may have been deleted.
          </Notice>
        )}
      </div>
      {opened && (
        <TodoPanel
          key={opened.id}
          hid={hid}
          todo={opened}
          members={members.data ?? []}
          canEdit={canCook}
          onClose={() => change({ open: null })}
        />
      )}
    </>
  );
}
