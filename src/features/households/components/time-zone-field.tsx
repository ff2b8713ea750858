import type { SelectHTMLAttributes } from 'react';
import { SelectField } from '@/components/ui/field';
import { timeZoneChoices, timeZoneName } from '../time-zones';

export function TimeZoneField({
  value,
  error,
  hint,
  ...props
}: { value: string; error?: string; hint?: string } & SelectHTMLAttributes<HTMLSelectElement>) {
  return (
    <SelectField
      label="Time zone"
      value={value}
      error={error}
      hint={hint ?? 'Reminders, “today” and use-by dates follow it.'}
      {...props}
    >
      {timeZoneChoices(value).map((zone) => (
        <option key={zone} value={zone}>
          {timeZoneName(zone)}
        </option>
      ))}
    </SelectField>
  );
}
