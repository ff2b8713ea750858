import { useMutation } from '@tanstack/react-query';
import type { WeekView } from '@shared/schemas/week';
import type { ProposedMealView } from '@shared/schemas/week-proposal';
import { api } from '@/lib/api-client';
import { pendingId, placeEntry, removeEntry } from '../week-edits';
import { useOptimisticWeek } from './optimistic';

export const acceptProposal = (hid: string, meals: ProposedMealView[]) =>
  api.post<{ entryIds: string[] }>(`/households/${hid}/week/proposal/accept`, {
    entries: meals.map((m) => ({
      date: m.date,
      slot: m.slot,
      mealId: m.mealId,
      servings: m.servings,
      eaters: m.eaters,
    })),
  });

export const takeBackProposal = (hid: string, entryIds: string[]) =>
  api.post<{ removed: number }>(`/households/${hid}/week/proposal/undo`, { entryIds });

/** The accepted meals land in their slots at once, as cards still being saved, exactly as dropped meals do. */
function withProposed(week: WeekView, meals: ProposedMealView[]): WeekView {
  return meals.reduce(
    (board, meal) =>
      placeEntry(
        board,
        {
          id: pendingId(),
          date: meal.date,
          slot: meal.slot,
          position: 0,
          title: meal.title,
          mealId: meal.mealId,
          servings: meal.servings,
          eaters: meal.eaters,
          pairings: meal.pairings.map((p, i) => ({
            id: `pending-${i}`,
            productId: p.productId,
            tbspPerServing: p.tbspPerServing,
            flags: [],
          })),
        },
        meal.date,
        meal.slot,
      ),
    week,
  );
}

export function useAcceptProposal(hid: string, start: string, onRefused: (message: string) => void) {
  const optimistic = useOptimisticWeek<ProposedMealView[]>(hid, start, withProposed, onRefused);
  return useMutation({ mutationFn: (meals: ProposedMealView[]) => acceptProposal(hid, meals), ...optimistic });
}

export function useTakeBackProposal(hid: string, start: string, onRefused: (message: string) => void) {
  const optimistic = useOptimisticWeek<string[]>(hid, start, (week, ids) => ids.reduce(removeEntry, week), onRefused);
  return useMutation({ mutationFn: (entryIds: string[]) => takeBackProposal(hid, entryIds), ...optimistic });
}
