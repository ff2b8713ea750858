import { useState, type FormEvent } from 'react';
import type { MemberView } from '@shared/schemas/households';
import type { TodoView } from '@shared/schemas/todos';
import { Button } from '@/components/ui/button';
import { SelectField, TextField } from '@/components/ui/field';
import { FormFooter } from '@/components/ui/form-footer';
import { ApiError } from '@/lib/api-client';
import { useDeleteTodo } from '../api/delete-todo';
import { useUpdateTodo } from '../api/update-todo';

/** Title, notes, due date and assignee of one to-do, and removing it. */
export function TodoEditor({
  hid,
  todo,
  members,
  onDone,
}: {
  hid: string;
  todo: TodoView;
  members: MemberView[];
  onDone: () => void;
}) {
  const update = useUpdateTodo(hid);
  const remove = useDeleteTodo(hid);
  const [form, setForm] = useState({
    title: todo.title,
    notes: todo.notes,
    dueOn: todo.dueOn ?? '',
    assigneeId: todo.assigneeId ?? '',
  });
  const fields = update.error instanceof ApiError ? update.error.fields : {};

  const submit = (event: FormEvent) => {
    event.preventDefault();
    update.mutate(
      {
        id: todo.id,
        patch: { title: form.title, notes: form.notes, dueOn: form.dueOn || null, assigneeId: form.assigneeId || null },
      },
      { onSuccess: onDone },
    );
  };

  return (
    <form onSubmit={submit} className="flex flex-col gap-4" noValidate>
      <TextField
        label="Title"
        value={form.title}
        maxLength={200}
        onChange={(e) => setForm({ ...form, title: e.target.value })}
        error={fields.title}
      />
      <div className="flex flex-col gap-1">
        <label htmlFor={`notes-${todo.id}`} className="font-bold">
          Notes
        </label>
        <textarea
          id={`notes-${todo.id}`}
          value={form.notes}
          rows={3}
          maxLength={4000}
          onChange={(e) => setForm({ ...form, notes: e.target.value })}
          className="rounded-lg border border-line bg-surface px-3 py-2"
        />
      </div>
      <div className="grid gap-4 sm:grid-cols-2">
        <TextField
          label="Due"
          type="date"
          value={form.dueOn}
          onChange={(e) => setForm({ ...form, dueOn: e.target.value })}
          error={fields.dueOn}
        />
        <SelectField
          label="Who"
          value={form.assigneeId}
          onChange={(e) => setForm({ ...form, assigneeId: e.target.value })}
          error={fields.assigneeId}
        >
          <option value="">Anyone</option>
          {members.map((member) => (
            <option key={member.userId} value={member.userId}>
              {member.name}
            </option>
          ))}
        </SelectField>
      </div>
      <FormFooter
        error={update.error}
        pending={update.isPending}
        submitLabel="Save"
        pendingLabel="Saving…"
        secondary={
          <Button
            variant="danger"
            className="ms-auto"
            disabled={remove.isPending}
            onClick={() => remove.mutate(todo.id, { onSuccess: onDone })}
          >
            Delete
          </Button>
        }
      />
    </form>
  );
}
