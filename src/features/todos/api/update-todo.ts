import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { TodayView } from '@shared/schemas/today';
import type { TodoPatch, TodoView } from '@shared/schemas/todos';
import { useUndoToast } from '@/components/ui/undo-toast';
import { api, type RequestOptions } from '@/lib/api-client';
import { useOptimisticCache } from '@/lib/optimistic';
import { changeKeys, householdKeys, todayKeys, todoKeys } from '@/lib/query-keys';
import { newChangeKey, queuedChangeDefaults, type QueuedChange } from '@/lib/queued-changes';
import { refreshPlanning } from './refresh-planning';

export const updateTodo = (hid: string, id: string, patch: TodoPatch, options?: RequestOptions) =>
  api.patch<{ todo: TodoView }>(`/households/${hid}/todos/${id}`, patch, options).then((r) => r.todo);

/** Any change but a move; Today uses it to tick, so it stays free of the drag-and-drop code. */
export function useUpdateTodo(hid: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: ({ id, patch }: { id: string; patch: TodoPatch }) => updateTodo(hid, id, patch),
    onSettled: () => refreshPlanning(queryClient, hid),
  });
}

/** A tick (done or not done): made at once, sent when the network allows. */
export interface TodoTick extends QueuedChange {
  id: string;
  title: string;
  done: boolean;
}

export const todoTickDefaults = queuedChangeDefaults((tick: TodoTick) =>
  updateTodo(tick.hid, tick.id, { done: tick.done }, { idempotencyKey: tick.key }),
);

/** Ticking a to-do done (or not done) in one tap, with a few seconds to take it back; offline it waits its turn. */
export function useTickTodo(hid: string) {
  const queryClient = useQueryClient();
  const offer = useUndoToast();
  const today = useOptimisticCache<TodayView, TodoTick>({
    key: todayKeys.view(hid),
    hold: householdKeys.all(hid),
    edit: (view, { id, done }) =>
      done && view.myTodos.some((todo) => todo.id === id)
        ? {
            ...view,
            myTodos: view.myTodos.filter((todo) => todo.id !== id),
            openTodoCount: Math.max(0, view.openTodoCount - 1),
          }
        : view,
  });
  // Refetching afterwards, also after a refusal (the to-do was deleted meanwhile), is the queue's.
  const mutation = useMutation<TodoView, Error, TodoTick, { previous?: TodayView }>({
    mutationKey: changeKeys.todoTick,
    ...todoTickDefaults,
    ...today,
    onMutate: (tick) => {
      const shown = today.onMutate(tick);
      // The list's checkbox shows the tick too; the refetch once the queue drains puts it right if refused.
      queryClient.setQueriesData<TodoView[]>({ queryKey: todoKeys.all(hid) }, (list) =>
        list?.map((todo) => (todo.id === tick.id ? { ...todo, done: tick.done } : todo)),
      );
      return shown;
    },
    onSuccess: (todo, { done }) =>
      offer({
        message: done ? `Ticked “${todo.title}” done; it is under Done now.` : `“${todo.title}” is open again.`,
        undo: async () => {
          try {
            await updateTodo(hid, todo.id, { done: !done });
          } finally {
            await refreshPlanning(queryClient, hid);
          }
          return done ? `“${todo.title}” is open again.` : `“${todo.title}” is done again.`;
        },
      }),
  });
  return {
    ...mutation,
    isSending: mutation.isPending && !mutation.isPaused,
    tick: (todo: Pick<TodoView, 'id' | 'title'>, done: boolean) =>
      mutation.mutate({
        hid,
        key: newChangeKey(),
        id: todo.id,
        title: todo.title,
        done,
        what: `${done ? 'Ticking' : 'Unticking'} “${todo.title}”`,
      }),
  };
}
