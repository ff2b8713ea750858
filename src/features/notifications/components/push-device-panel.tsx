import { Button } from '@/components/ui/button';
import { Notice } from '@/components/ui/notice';
import { usePushDevice } from '../api/use-push-device';
import { PUSH_BROWSERS } from '../push-errors';

/** Web Push on this browser: turn on, send a test, turn off. */
export function PushDevicePanel({ otherDevices }: { otherDevices: number }) {
  const device = usePushDevice();
  const error = device.subscribe.error ?? device.unsubscribe.error ?? device.test.error;
  const busy = device.subscribe.isPending || device.unsubscribe.isPending || device.test.isPending;

  if (!device.supported) {
    return (
      <Notice tone="info">
        This browser cannot receive push notifications. Use e-mail reminders, or open Larderly in a browser that can.{' '}
        {PUSH_BROWSERS}
      </Notice>
    );
  }
  return (
    <div className="flex flex-col gap-3">
      <p role="status" className="tabular">
        {device.checking
          ? 'Checking this device…'
          : device.subscribed
            ? 'Notifications are on for this device.'
            : 'Notifications are off for this device.'}
        {otherDevices > 0 && <span className="text-ink-muted"> Devices with notifications on: {otherDevices}.</span>}
      </p>
      {error && (
        <Notice tone="past" role="alert">
          {error.message}
        </Notice>
      )}
      {device.test.data && (
        <Notice tone="action" role="status">
          {`Test notification sent to ${device.test.data.devices === 1 ? 'your device' : `your ${device.test.data.devices} devices`}. It should appear in a moment; if it does not, turn notifications off and on again.`}
        </Notice>
      )}
      <div className="flex flex-wrap gap-2">
        {device.subscribed ? (
          <>
            <Button disabled={busy} onClick={() => device.test.mutate()}>
              Send a test notification
            </Button>
            <Button variant="secondary" disabled={busy} onClick={() => device.unsubscribe.mutate()}>
              Turn off on this device
            </Button>
          </>
        ) : (
          <Button disabled={busy || device.checking} onClick={() => device.subscribe.mutate()}>
            {device.subscribe.isPending ? 'Turning on…' : 'Turn on notifications'}
          </Button>
        )}
      </div>
    </div>
  );
}
