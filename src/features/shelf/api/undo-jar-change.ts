import { useMutation, useQueryClient } from '@tanstack/react-query';
import { useCallback } from 'react';
import { dateWords } from '@shared/words/dates';
import { GIFT_WORDS } from '@shared/words/gifts';
import type { JarAction, JarActed, JarView } from '@shared/schemas/batches';
import { useUndoToast } from '@/components/ui/undo-toast';
import { api } from '@/lib/api-client';
import { householdKeys, shelfKeys } from '@/lib/query-keys';

/** Reverses one open, finish, discard or gift on the server; the jar's history keeps both. */
export const undoJarChange = (hid: string, jarId: string, eventId: string) =>
  api.post<JarActed>(`/households/${hid}/jars/${jarId}/undo`, { eventId });

/** Every view of a jar sits under the household, and a label's page under its code. */
export function useRefreshJarViews(hid: string) {
  const queryClient = useQueryClient();
  return useCallback(
    () =>
      Promise.all([
        queryClient.invalidateQueries({ queryKey: householdKeys.all(hid) }),
        queryClient.invalidateQueries({ queryKey: shelfKeys.jarsByCode() }),
      ]),
    [hid, queryClient],
  );
}

/** A jar page's "Put back": a cook reverses a finish, discard or gift, however long ago. */
export function usePutBackJar(hid: string) {
  const refresh = useRefreshJarViews(hid);
  return useMutation({
    mutationFn: ({ jarId, eventId }: { jarId: string; eventId: string }) => undoJarChange(hid, jarId, eventId),
    onSettled: refresh,
  });
}

export const whereJarIs = (jar: Pick<JarView, 'state'>) =>
  jar.state === 'opened' ? 'back in the fridge' : 'back on the shelf, sealed';

/** What the toast says: which jar, and where it went. */
export function jarActionWords(
  action: JarAction | 'give',
  jar: Pick<JarView, 'code' | 'productName' | 'useBy'> & { givenTo?: string | null },
): string {
  const which = `jar ${jar.code} of ${jar.productName}`;
  if (action === 'give')
    return `${GIFT_WORDS.ended}: ${which}${jar.givenTo ? ` to ${jar.givenTo}` : ''}. It has left the shelf.`;
  if (action === 'open')
    return `Opened ${which}. It is in the fridge now${jar.useBy ? `; use by ${dateWords(jar.useBy)}` : ''}.`;
  if (action === 'finish') return `Finished ${which}. It has left the fridge.`;
  return `Discarded ${which}. It is off the shelf and out of the plan.`;
}

/** After a one-tap jar action: say what happened and offer to undo it for a few seconds. */
export function useOfferJarUndo(hid: string) {
  const offer = useUndoToast();
  const refresh = useRefreshJarViews(hid);
  return useCallback(
    (action: JarAction | 'give', acted: JarActed) =>
      offer({
        message: jarActionWords(action, acted.jar),
        undo: async () => {
          try {
            const back = await undoJarChange(hid, acted.jar.id, acted.eventId);
            return `Jar ${back.jar.code} is ${whereJarIs(back.jar)}.`;
          } finally {
            await refresh();
          }
        },
      }),
    [hid, offer, refresh],
  );
}
