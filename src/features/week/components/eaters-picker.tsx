import type { PlanEntryView } from '@shared/schemas/week';
import { useBoard } from '../board-context';

/** Who eats a planned meal: everybody by default, or the members ticked here. */
export function EatersPicker({ entry }: { entry: PlanEntryView }) {
  const board = useBoard();
  const members = board.week.members;
  const eating = entry.eaters === null ? members.map((m) => m.userId) : entry.eaters;
  const summary = entry.eaters === null ? 'Everyone eats' : `${eating.length} of ${members.length} eat`;
  const toggle = (userId: string, on: boolean) => {
    const next = on ? [...eating, userId] : eating.filter((id) => id !== userId);
    board.updateEntry.mutate({ id: entry.id, patch: { eaters: next.length === members.length ? null : next } });
  };
  return (
    <details className="mt-1 text-xs">
      <summary className="flex min-h-8 cursor-pointer items-center text-ink-muted pointer-coarse:min-h-11">
        {summary}
      </summary>
      <fieldset className="flex flex-col">
        <legend className="sr-only">Who eats {entry.title}</legend>
        {members.map((member) => (
          <label key={member.userId} className="flex min-h-9 items-center gap-2 pointer-coarse:min-h-11">
            <input
              type="checkbox"
              className="h-4 w-4 accent-action"
              checked={eating.includes(member.userId)}
              onChange={(e) => toggle(member.userId, e.target.checked)}
            />
            {member.name}
          </label>
        ))}
      </fieldset>
    </details>
  );
}
