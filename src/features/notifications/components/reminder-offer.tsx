import { Button } from '@/components/ui/button';
import { usePushDevice } from '../api/use-push-device';

/** "Get a reminder before this use-by": shown only where this device could have push but has none yet. */
export function ReminderOffer({ about }: { about: string }) {
  const device = usePushDevice();
  if (!device.supported || device.checking) return null;
  if (device.subscribed) {
    return device.subscribe.isSuccess ? (
      <p role="status" className="rounded-lg border border-line bg-surface px-3 py-2 text-sm font-bold text-action">
        Reminders are on for this device: one comes before each use-by.
      </p>
    ) : null;
  }
  return (
    <section
      aria-label="Reminders on this device"
      className="flex flex-col gap-2 rounded-lg border border-info/40 bg-info-soft px-3 py-2 text-sm"
    >
      <div className="flex flex-wrap items-center justify-between gap-2">
        <p className="min-w-0 flex-1">Get a reminder on this device before {about}.</p>
        <Button variant="secondary" disabled={device.subscribe.isPending} onClick={() => device.subscribe.mutate()}>
          {device.subscribe.isPending ? 'Turning on…' : 'Get a reminder'}
        </Button>
      </div>
      {device.subscribe.error && (
        <p role="alert" className="font-bold text-past">
          {device.subscribe.error.message}
        </p>
      )}
    </section>
  );
}
