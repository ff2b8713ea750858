import type { JarChange, JarView } from '@shared/schemas/batches';
import { dateWords } from '@shared/words';
import { Button } from '@/components/ui/button';
import { Notice } from '@/components/ui/notice';
import { usePutBackJar, whereJarIs } from '../api/undo-jar-change';

const WORDS: Record<string, string> = { finished: 'Finished', discarded: 'Discarded', given: 'Given away' };

/** A finished, discarded or given jar's way back: cooks and keepers put it back, and its history keeps both changes. */
export function PutBackJar({
  hid,
  jar,
  lastChange,
  canCook,
}: {
  hid: string;
  jar: JarView;
  lastChange: JarChange | null;
  canCook: boolean;
}) {
  const putBack = usePutBackJar(hid);
  if (putBack.isSuccess)
    return (
      <Notice tone="action" role="status" title={`Jar ${putBack.data.jar.code} is ${whereJarIs(putBack.data.jar)}.`} />
    );
  if (jar.state !== 'finished' && jar.state !== 'discarded' && jar.state !== 'given') return null;
  const undoable = lastChange && lastChange.kind === jar.state;
  const when = lastChange
    ? `${WORDS[lastChange.kind] ?? lastChange.kind} ${dateWords(lastChange.happenedOn)}${lastChange.who ? ` by ${lastChange.who}` : ''}.`
    : '';
  return (
    <div className="flex flex-col gap-2 rounded-card border border-line bg-sunken/50 p-3">
      <p>
        {when}{' '}
        {canCook
          ? 'Was that a mistake? Put it back; the jar’s history keeps both changes.'
          : 'If that was a mistake, a cook or keeper can put it back from this page.'}
      </p>
      {canCook && undoable && (
        <Button
          variant="secondary"
          className="self-start"
          disabled={putBack.isPending}
          onClick={() => putBack.mutate({ jarId: jar.id, eventId: lastChange.eventId })}
        >
          Put jar {jar.code} back
        </Button>
      )}
      {putBack.error && (
        <Notice tone="past" role="alert">
          {putBack.error.message}
        </Notice>
      )}
    </div>
  );
}
