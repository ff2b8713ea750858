import type { JarAction, JarActed, JarView } from '@shared/schemas/batches';
import { api } from '@/lib/api-client';
import { newChangeKey, queuedChangeDefaults, type QueuedChange } from '@/lib/queued-changes';

// A jar change as the offline queue keeps it, apart from the button's hook (./act-on-jar): the offline restore
// registers these defaults before every first render, sign-in's too, and stays free of the undo toast and its words.

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
