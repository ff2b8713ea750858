import { onlineManager, useMutation } from '@tanstack/react-query';
import { useState } from 'react';
import type { JarActed, JarAction, JarView } from '@shared/schemas/batches';
import { useOptimisticCache } from '@/lib/optimistic';
import { changeKeys, householdKeys, shelfKeys } from '@/lib/query-keys';
import { jarChange, jarChangeDefaults, type ActedJar, type JarChange } from './jar-change';
import { useOfferJarUndo } from './undo-jar-change';

export { actOnJar, jarChange, jarChangeDefaults, type ActedJar, type JarChange } from './jar-change';

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
