import { useMutation } from '@tanstack/react-query';
import type { PlanEntryPatch, Slot } from '@shared/schemas/week';
import { api } from '@/lib/api-client';
import { changeEntry, findEntry, placeEntry } from '../week-edits';
import { useOptimisticWeek } from './optimistic';

export const updatePlanEntry = (hid: string, id: string, patch: PlanEntryPatch) =>
  api.patch<{ id: string }>(`/households/${hid}/plan-entries/${id}`, patch);

export function useUpdatePlanEntry(hid: string, start: string, onRefused: (message: string) => void) {
  const optimistic = useOptimisticWeek<{ id: string; patch: PlanEntryPatch }>(
    hid,
    start,
    (week, { id, patch }) => {
      const entry = findEntry(week, id);
      if (!entry) return week;
      const { date, slot, position, ...fields } = patch;
      const moved =
        date !== undefined || slot !== undefined || position !== undefined
          ? placeEntry(week, entry, date ?? entry.date, (slot ?? entry.slot) as Slot, position)
          : week;
      return changeEntry(moved, id, fields);
    },
    onRefused,
  );
  return useMutation({
    mutationFn: ({ id, patch }: { id: string; patch: PlanEntryPatch }) => updatePlanEntry(hid, id, patch),
    ...optimistic,
  });
}
