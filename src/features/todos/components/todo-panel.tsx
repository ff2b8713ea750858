import { useEffect, useRef } from 'react';
import type { MemberView } from '@shared/schemas/households';
import type { TodoView } from '@shared/schemas/todos';
import { AltitudeGate } from '@/features/households';
import { BatchPlanView } from './batch-plan-view';
import { TodoEditor } from './todo-editor';

interface Props {
  hid: string;
  todo: TodoView;
  members: MemberView[];
  canEdit: boolean;
  onClose: () => void;
}

/** One to-do opened: a restock item's batch plan, or the editor of a plain one; a modal dialog on every screen size. */
export function TodoPanel({ hid, todo, members, canEdit, onClose }: Props) {
  const dialog = useRef<HTMLDialogElement>(null);
  useEffect(() => {
    const element = dialog.current;
    if (element && !element.open) element.showModal();
  }, []);

  return (
    <dialog
      ref={dialog}
      onClose={onClose}
      aria-labelledby="todo-panel-title"
      className="m-0 mt-auto max-h-[92dvh] w-full max-w-none overflow-y-auto rounded-t-card bg-paper p-0 text-ink backdrop:bg-ink/40 sm:m-auto sm:max-w-2xl sm:rounded-card"
    >
      <div className="sticky top-0 z-10 flex items-start justify-between gap-3 border-b border-line bg-paper px-5 py-3">
        <h2 id="todo-panel-title" className="text-xl">
          {todo.title}
        </h2>
        <button
          type="button"
          onClick={() => dialog.current?.close()}
          className="min-h-11 shrink-0 rounded-lg px-3 font-bold text-action hover:bg-action-soft"
        >
          Close
        </button>
      </div>
      <div className="flex flex-col gap-6 px-5 py-4">
        {todo.batchPlan && (
          <AltitudeGate hid={hid}>
            <BatchPlanView hid={hid} todoId={todo.id} plan={todo.batchPlan} canRecord={canEdit && !todo.done} />
          </AltitudeGate>
        )}
        {canEdit ? (
          <details open={!todo.batchPlan} className="rounded-card border border-line bg-surface p-4">
            <summary className="min-h-11 cursor-pointer content-center font-bold">
              {todo.batchPlan ? 'Edit the to-do' : 'Details'}
            </summary>
            <div className="mt-3">
              <TodoEditor hid={hid} todo={todo} members={members} onDone={() => dialog.current?.close()} />
            </div>
          </details>
        ) : (
          todo.notes && <p>{todo.notes}</p>
        )}
      </div>
    </dialog>
  );
}
