import { queryOptions, useQuery } from '@tanstack/react-query';
import type { TodoFilter, TodoView } from '@shared/schemas/todos';
import { api } from '@/lib/api-client';
import { todoKeys } from '@/lib/query-keys';

export const getTodos = (hid: string, filter: TodoFilter) =>
  api.get<{ todos: TodoView[] }>(`/households/${hid}/todos?filter=${filter}`).then((r) => r.todos);

export const todosQueryOptions = (hid: string, filter: TodoFilter) =>
  queryOptions({ queryKey: todoKeys.list(hid, filter), queryFn: () => getTodos(hid, filter) });

export const useTodos = (hid: string, filter: TodoFilter) => useQuery(todosQueryOptions(hid, filter));
