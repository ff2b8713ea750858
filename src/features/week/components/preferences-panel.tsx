import { DIET_LABELS, DIET_TAGS, type DietTag } from '@shared/choices';
import type { WeekMember } from '@shared/schemas/week';
import { HEAT_LEVELS, heatWords } from '@shared/words';
import { Notice } from '@/components/ui/notice';
import { useUpdatePreferences } from '../api/update-preferences';

/** Who eats at this table: heat tolerance and diets, which the board checks each pairing against. */
export function PreferencesPanel({
  hid,
  members,
  myId,
  isKeeper,
}: {
  hid: string;
  members: WeekMember[];
  myId: string;
  isKeeper: boolean;
}) {
  const update = useUpdatePreferences(hid);
  return (
    <section aria-labelledby="who-eats" className="rounded-card border border-line bg-surface p-4">
      <h2 id="who-eats" className="text-lg">
        Who eats
      </h2>
      <p className="mb-3 text-sm text-ink-muted">
        A pairing hotter than someone keeps to, or against their diet, is flagged on the meal. Each member sets their
        own; a keeper can set anyone’s.
      </p>
      {update.error && (
        <Notice tone="past" role="alert">
          {update.error.message}
        </Notice>
      )}
      <ul className="grid gap-3 sm:grid-cols-2 lg:grid-cols-3">
        {members.map((member) => {
          const editable = isKeeper || member.userId === myId;
          const toggleDiet = (tag: DietTag, on: boolean) =>
            update.mutate({
              userId: member.userId,
              patch: { dietTags: on ? [...member.dietTags, tag] : member.dietTags.filter((t) => t !== tag) },
            });
          return (
            <li key={member.userId} className="flex flex-col gap-1 rounded-lg bg-sunken/60 p-3">
              <p className="font-bold">
                {member.name}
                {member.userId === myId && <span className="font-normal text-ink-muted"> (you)</span>}
              </p>
              <label className="flex items-center justify-between gap-2 text-sm">
                Heat tolerance
                <select
                  className="min-h-11 rounded-lg border border-line bg-surface px-2"
                  value={member.heatTolerance}
                  disabled={!editable || update.isPending}
                  onChange={(e) =>
                    update.mutate({ userId: member.userId, patch: { heatTolerance: Number(e.target.value) } })
                  }
                >
                  {HEAT_LEVELS.map((heat) => (
                    <option key={heat} value={heat}>
                      {heatWords(heat, true)}
                    </option>
                  ))}
                </select>
              </label>
              {DIET_TAGS.map((tag) => (
                <label key={tag} className="flex min-h-11 items-center gap-2 text-sm">
                  <input
                    type="checkbox"
                    className="h-5 w-5 accent-action"
                    checked={member.dietTags.includes(tag)}
                    disabled={!editable || update.isPending}
                    onChange={(e) => toggleDiet(tag, e.target.checked)}
                  />
                  {DIET_LABELS[tag]}
                </label>
              ))}
            </li>
          );
        })}
      </ul>
    </section>
  );
}
