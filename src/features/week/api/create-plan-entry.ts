import { useMutation } from '@tanstack/react-query';
import type { PlanEntryCreate, PlanEntryView, Slot } from '@shared/schemas/week';
import { api } from '@/lib/api-client';
import { pendingId, placeEntry } from '../week-edits';
import { useOptimisticWeek } from './optimistic';

export const createPlanEntry = (hid: string, entry: PlanEntryCreate) =>
  api.post<{ id: string }>(`/households/${hid}/plan-entries`, entry);

export interface NewEntry extends PlanEntryCreate {
  slot: Slot;
  /** what the card shows until the server answers */
  preview: Pick<PlanEntryView, 'title' | 'servings' | 'pairings'>;
}

export function useCreatePlanEntry(hid: string, start: string, onRefused: (message: string) => void) {
  const optimistic = useOptimisticWeek<NewEntry>(
    hid,
    start,
    (week, { date, slot, position, mealId, preview }) =>
      placeEntry(
        week,
        { id: pendingId(), date, slot, position: 0, mealId: mealId ?? null, eaters: null, ...preview },
        date,
        slot,
        position,
      ),
    onRefused,
  );
  return useMutation({
    mutationFn: ({ preview: _preview, ...entry }: NewEntry) => createPlanEntry(hid, entry),
    ...optimistic,
  });
}
