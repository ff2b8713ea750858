import { useQueryClient } from '@tanstack/react-query';
import { Button } from '@/components/ui/button';
import { Notice } from '@/components/ui/notice';
import { useOnline, useRefusedChanges, useWaitingChangeCount } from '@/lib/offline-state';

const changes = (count: number) => (count === 1 ? '1 change' : `${count} changes`);

/** When the newest answer in the cache was read: what the screens show offline is as of then. */
function readAt(epochMs: number) {
  const read = new Date(epochMs);
  const time = read.toLocaleTimeString(undefined, { hour: 'numeric', minute: '2-digit' });
  return read.toDateString() === new Date().toDateString()
    ? time
    : `${read.toLocaleDateString(undefined, { weekday: 'short', day: 'numeric', month: 'short' })}, ${time}`;
}

/** Says when the app has no network and what it shows meanwhile, the changes still waiting, and any refused. */
export function OfflineBanner() {
  const online = useOnline();
  const waiting = useWaitingChangeCount();
  const { refused, dismiss } = useRefusedChanges();
  const queryClient = useQueryClient();
  const newest = online
    ? 0
    : Math.max(
        0,
        ...queryClient
          .getQueryCache()
          .getAll()
          .map((query) => query.state.dataUpdatedAt),
      );

  return (
    <div className="mb-4 flex flex-col gap-2 empty:hidden">
      {!online && (
        <Notice
          tone="soon"
          role="status"
          title={
            newest
              ? `No network: showing what Larderly had at ${readAt(newest)}.`
              : 'No network: Larderly shows what it had read before.'
          }
        >
          {waiting > 0
            ? `${changes(waiting)} waiting; they are sent in the order you made them once the network is back.`
            : 'Opening, finishing or discarding a jar and ticking a to-do still work; they are sent once the network is back.'}
        </Notice>
      )}
      {online && waiting > 0 && (
        <Notice tone="info" role="status">
          Sending {changes(waiting)} made without a network…
        </Notice>
      )}
      {refused.map((refusal) => (
        <Notice key={refusal.id} tone="past" role="alert" title="While you were offline, something changed">
          <p>{refusal.words}</p>
          <Button variant="quiet" className="-ml-4 mt-1" onClick={() => dismiss(refusal.id)}>
            Got it
          </Button>
        </Notice>
      ))}
    </div>
  );
}
