import { useState, type FormEvent } from 'react';
import { Button } from '@/components/ui/button';
import { ApiError } from '@/lib/api-client';
import { useCreateTodo } from '../api/create-todo';

/** A quick add: the title is enough; date and assignee can follow in the item itself. */
export function NewTodoForm({ hid }: { hid: string }) {
  const create = useCreateTodo(hid);
  const [title, setTitle] = useState('');
  const submit = (event: FormEvent) => {
    event.preventDefault();
    create.mutate({ title }, { onSuccess: () => setTitle('') });
  };
  const error = create.error instanceof ApiError ? (create.error.fields.title ?? create.error.message) : null;
  return (
    <form onSubmit={submit} className="flex flex-col gap-1" noValidate>
      <label htmlFor="new-todo" className="font-bold">
        Add to the list
      </label>
      <div className="flex gap-2">
        <input
          id="new-todo"
          value={title}
          onChange={(event) => setTitle(event.target.value)}
          placeholder="Buy half-pint lids"
          maxLength={200}
          aria-invalid={error ? true : undefined}
          aria-describedby={error ? 'new-todo-error' : undefined}
          className="min-h-11 min-w-0 flex-1 rounded-lg border border-line bg-surface px-3 placeholder:text-ink-muted/70 aria-[invalid=true]:border-past"
        />
        <Button type="submit" disabled={create.isPending}>
          Add
        </Button>
      </div>
      {error && (
        <p id="new-todo-error" role="alert" className="text-sm font-bold text-past">
          {error}
        </p>
      )}
    </form>
  );
}
