import { onlineManager, useMutation } from '@tanstack/react-query';
import { useState } from 'react';
import type { JarAction, JarActed, JarView } from '@shared/schemas/batches';
import { api } from '@/lib/api-client';
import { useOptimisticCache } from '@/lib/optimistic';
import { changeKeys, householdKeys, shelfKeys } from '@/lib/query-keys';
import { newChangeKey, queuedChangeDefaults, type QueuedChange } from '@/lib/queued-changes';
import { useOfferJarUndo } from './undo-jar-change';

/** A discard says whether the empty jar was kept for canning again; the server keeps it when nothing is said. */
export const actOnJar = (hid: string, jarId: string, action: JarAction, idempotencyKey?: string, kept?: boolean) =>
  api.post<JarActed>(
    `/households/${hid}/jars/${jarId}/${action}`,
    action === 'discard' && kept !== undefined ? { kept } : {},
    { idempotencyKey },
  );

/** Opening, finishing or discarding one jar: made at once, sent when the network allows. */
export interface JarChange extends QueuedChange {
  jarId: string;
  action: JarAction;
  /** A discard: whether the empty jar goes back to the household's empty jars. */
  kept?: boolean;
}

export const jarChangeDefaults = queuedChangeDefaults((change: JarChange) =>
  actOnJar(change.hid, change.jarId, change.action, change.key, change.kept),
);

const DOING: Record<JarAction, string> = { open: 'Opening', finish: 'Finishing', discard: 'Discarding' };

/** The jar the person acts on, as the words of a refusal name it. */
export type ActedJar = Pick<JarView, 'id' | 'code' | 'productName'>;

export function jarChange(hid: string, jar: ActedJar, action: JarAction, kept?: boolean): JarChange {
  return {
    hid,
    key: newChangeKey(),
    jarId: jar.id,
    action,
    ...(action === 'discard' && kept !== undefined ? { kept } : {}),
    what: `${DOING[action]} jar ${jar.code} of ${jar.productName}`,
  };
}

/** One tap on a jar. The shelf shows it at once; offline it waits and is sent in order when the network returns. */
export function useActOnJar(hid: string) {
  const offerUndo = useOfferJarUndo(hid);
  const optimistic = useOptimisticCache<JarView[], JarChange>({
    key: shelfKeys.jars(hid, 'on-hand'),
    hold: householdKeys.all(hid),
    edit: (jars, { jarId, action }) =>
      action === 'open'
        ? jars.map((jar) => (jar.id === jarId ? { ...jar, state: 'opened' as const } : jar))
        : jars.filter((jar) => jar.id !== jarId),
  });
  // Sending, retrying and refetching afterwards (also after a 409: someone else moved the jar) are the queue's.
  const mutation = useMutation<JarActed, Error, JarChange, { previous?: JarView[] }>({
    mutationKey: changeKeys.jarAction,
    ...jarChangeDefaults,
    ...optimistic,
    onSuccess: (acted, { action }) => offerUndo(action, acted),
  });
  // A refusal of a change made offline is told by the offline banner, which stays when this button goes.
  const [madeOffline, setMadeOffline] = useState(false);
  return {
    ...mutation,
    error: madeOffline ? null : mutation.error,
    /** Busy only while a change is on its way; one waiting for the network leaves the buttons free. */
    isSending: mutation.isPending && !mutation.isPaused,
    act: (jar: ActedJar, action: JarAction, options?: { onSuccess?: () => void; kept?: boolean }) => {
      setMadeOffline(!onlineManager.isOnline());
      mutation.mutate(jarChange(hid, jar, action, options?.kept), { onSuccess: options?.onSuccess });
    },
  };
}
