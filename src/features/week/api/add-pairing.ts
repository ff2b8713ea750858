import { useMutation } from '@tanstack/react-query';
import type { PairingCreate } from '@shared/schemas/week';
import { api } from '@/lib/api-client';
import { changeEntry, findEntry, pendingId } from '../week-edits';
import { useOptimisticWeek } from './optimistic';

export const addPairing = (hid: string, entryId: string, pairing: PairingCreate) =>
  api.post<{ pairing: { id: string } }>(`/households/${hid}/plan-entries/${entryId}/pairings`, pairing);

export function useAddPairing(hid: string, start: string, onRefused: (message: string) => void) {
  const optimistic = useOptimisticWeek<{ entryId: string; productId: string }>(
    hid,
    start,
    (week, { entryId, productId }) => {
      const entry = findEntry(week, entryId);
      if (!entry || entry.pairings.some((p) => p.productId === productId)) return week;
      return changeEntry(week, entryId, {
        pairings: [...entry.pairings, { id: pendingId(), productId, tbspPerServing: 1, flags: [] }],
      });
    },
    onRefused,
  );
  return useMutation({
    mutationFn: ({ entryId, productId }: { entryId: string; productId: string }) =>
      addPairing(hid, entryId, { productId }),
    ...optimistic,
  });
}
