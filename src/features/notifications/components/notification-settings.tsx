import { useState } from 'react';
import type { NotificationPatch } from '@shared/schemas/notifications';
import { SelectField } from '@/components/ui/field';
import { Notice } from '@/components/ui/notice';
import { useNotificationSettings, useUpdateNotificationSettings } from '../api/notification-settings';
import { PushDevicePanel } from './push-device-panel';

const HOURS = Array.from({ length: 24 }, (_, hour) => hour);
const DAYS = Array.from({ length: 14 }, (_, i) => i + 1);

function hourLabel(hour: number) {
  const suffix = hour < 12 ? 'am' : 'pm';
  return `${hour % 12 === 0 ? 12 : hour % 12}:00 ${suffix}`;
}

/** A checkbox that shows the new choice in the same frame as the tap; the saved setting follows when it arrives. */
function Toggle({
  label,
  hint,
  checked,
  onChange,
}: {
  label: string;
  hint: string;
  checked: boolean;
  onChange: (on: boolean) => void;
}) {
  const [shown, setShown] = useState(checked);
  const [saved, setSaved] = useState(checked);
  if (checked !== saved) {
    setSaved(checked);
    setShown(checked);
  }
  return (
    <label className="flex min-h-11 cursor-pointer items-start gap-3">
      <input
        type="checkbox"
        className="mt-1 h-5 w-5 shrink-0 accent-action"
        checked={shown}
        onChange={(e) => {
          setShown(e.target.checked);
          onChange(e.target.checked);
        }}
      />
      <span>
        <span className="font-bold">{label}</span>
        <span className="block text-sm text-ink-muted">{hint}</span>
      </span>
    </label>
  );
}

/** One person's reminders: push on this device, e-mail, the hour and how many days before the use-by. */
export function NotificationSettingsPanel() {
  const settings = useNotificationSettings();
  const update = useUpdateNotificationSettings();
  if (!settings.data) return <p className="text-ink-muted">{settings.error ? settings.error.message : 'Loading…'}</p>;
  const s = settings.data;
  const change = (patch: NotificationPatch) => update.mutate(patch);

  return (
    <div className="flex flex-col gap-5">
      <section aria-labelledby="push-heading" className="flex flex-col gap-2">
        <h3 id="push-heading" className="font-bold">
          Push on this device
        </h3>
        <PushDevicePanel otherDevices={s.pushDevices} />
      </section>
      <section aria-labelledby="reminders-heading" className="flex flex-col gap-3">
        <h3 id="reminders-heading" className="font-bold">
          Use-by reminders
        </h3>
        <div className="grid gap-3 sm:grid-cols-2">
          <SelectField
            label="Remind me"
            value={s.daysBefore}
            onChange={(e) => change({ daysBefore: Number(e.target.value) })}
          >
            {DAYS.map((d) => (
              <option key={d} value={d}>
                {d === 1 ? '1 day' : `${d} days`} before the use-by
              </option>
            ))}
          </SelectField>
          <SelectField
            label="Reminder time"
            hint="In the household's time zone. A reminder missed at that hour is sent up to 3 hours late, never later in the day."
            value={s.reminderHour}
            onChange={(e) => change({ reminderHour: Number(e.target.value) })}
          >
            {HOURS.map((h) => (
              <option key={h} value={h}>
                {hourLabel(h)}
              </option>
            ))}
          </SelectField>
        </div>
        <Toggle
          label="E-mail reminders"
          hint="The same reminders by e-mail, for when push is off."
          checked={s.emailReminders}
          onChange={(on) => change({ emailReminders: on })}
        />
        <Toggle
          label="Weekly digest by e-mail"
          hint="On the first day of the week: the plan, jars to open and the opened jars that reach their use-by."
          checked={s.weeklyDigest}
          onChange={(on) => change({ weeklyDigest: on })}
        />
        {update.error && (
          <Notice tone="past" role="alert">
            {update.error.message}
          </Notice>
        )}
        {update.isSuccess && (
          <p role="status" className="text-sm text-action">
            Saved.
          </p>
        )}
      </section>
    </div>
  );
}
