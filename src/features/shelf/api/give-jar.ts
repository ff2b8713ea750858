import { queryOptions, useMutation, useQuery } from '@tanstack/react-query';
import type { GiftsThisYear, JarActed, JarGive } from '@shared/schemas/batches';
import { api } from '@/lib/api-client';
import { newChangeKey } from '@/lib/queued-changes';
import { shelfKeys } from '@/lib/query-keys';
import { useOfferJarUndo, useRefreshJarViews } from './undo-jar-change';

export const giveJar = (hid: string, jarId: string, gift: JarGive, idempotencyKey: string) =>
  api.post<JarActed>(`/households/${hid}/jars/${jarId}/give`, gift, { idempotencyKey });

/** Giving a sealed jar away: sent at once (it takes words, so it does not wait offline), then offered for undo. */
export function useGiveJar(hid: string) {
  const offerUndo = useOfferJarUndo(hid);
  const refresh = useRefreshJarViews(hid);
  return useMutation<JarActed, Error, { jarId: string; to: string }>({
    mutationFn: ({ jarId, to }) => giveJar(hid, jarId, { to: to.trim() || null }, newChangeKey()),
    onSuccess: (acted) => offerUndo('give', acted),
    onSettled: refresh,
  });
}

export const getGifts = (hid: string) =>
  api.get<{ gifts: GiftsThisYear }>(`/households/${hid}/gifts`).then((r) => r.gifts);
export const giftsQueryOptions = (hid: string) =>
  queryOptions({ queryKey: shelfKeys.gifts(hid), queryFn: () => getGifts(hid) });
export const useGifts = (hid: string) => useQuery(giftsQueryOptions(hid));
