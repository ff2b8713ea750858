import { useState, type FormEvent } from 'react';
import { PROCESSING_METHODS, type Method } from '@shared/domain';
import type { HouseholdView } from '@shared/schemas/households';
import { altitudeInputValue, altitudeUnitWords, METHOD_NAMES, parseAltitude, WEEKDAY_NAMES } from '@shared/words';
import { SelectField, TextField } from '@/components/ui/field';
import { FormFooter } from '@/components/ui/form-footer';
import { ApiError } from '@/lib/api-client';
import { useFocusFirstError } from '@/lib/focus-first-error';
import { useUpdateHousehold } from '../api/update-household';
import { browserTimeZone } from '../time-zones';
import { TimeZoneField } from './time-zone-field';

/** The questions every canning number depends on, asked before the first plan and confirmed by a keeper. */
export function FirstRunForm({ household, onConfirmed }: { household: HouseholdView; onConfirmed: () => void }) {
  const update = useUpdateHousehold(household.id);
  const fromBrowser = browserTimeZone();
  const [answers, setAnswers] = useState({
    // A household never confirmed may still read 0 ft only because nobody asked: start empty so nobody confirms it by accident.
    // Typed in the household's units (feet or meters); stored in feet.
    altitude:
      household.altitudeConfirmed || household.altitudeFt !== 0
        ? altitudeInputValue(household.altitudeFt, household.unitSystem)
        : '',
    timeZone: household.altitudeConfirmed ? household.timeZone : fromBrowser,
    defaultMethod: household.defaultMethod,
    cannerCapacityJars: String(household.cannerCapacityJars),
    weekStartsOn: String(household.weekStartsOn),
  });
  const error = update.error instanceof ApiError ? update.error : null;
  const form = useFocusFirstError(error);
  const set = (key: keyof typeof answers) => (event: { target: { value: string } }) =>
    setAnswers({ ...answers, [key]: event.target.value });

  function submit(event: FormEvent) {
    event.preventDefault();
    const altitude = parseAltitude(answers.altitude, household.unitSystem) ?? Number.NaN;
    const capacity = answers.cannerCapacityJars.trim() === '' ? Number.NaN : Number(answers.cannerCapacityJars);
    update.mutate(
      {
        altitudeFt: altitude,
        timeZone: answers.timeZone,
        defaultMethod: answers.defaultMethod,
        cannerCapacityJars: capacity,
        weekStartsOn: Number(answers.weekStartsOn),
      },
      { onSuccess: onConfirmed },
    );
  }

  return (
    <form ref={form} onSubmit={submit} noValidate className="flex max-w-2xl flex-col gap-5">
      <div className="flex flex-col gap-2">
        <TextField
          label={`Altitude of your kitchen, in ${altitudeUnitWords(household.unitSystem)} above sea level`}
          inputMode="numeric"
          value={answers.altitude}
          onChange={set('altitude')}
          error={error?.fields.altitudeFt}
          hint="Water boils at a lower temperature the higher you live, so jars need longer, or more pressure, to be safe."
        />
        <details className="rounded-card border border-line bg-surface px-4 py-2">
          <summary className="min-h-11 cursor-pointer content-center font-bold text-action">
            How do I find my altitude?
          </summary>
          <ul className="mb-2 list-disc pl-5 text-[0.95rem]">
            <li>Your local extension service or county office can tell you the altitude of your address.</li>
            <li>A topographic map, or a map app with a terrain or elevation layer, shows it for the spot you live.</li>
            <li>A phone’s GPS altitude can be off by a hundred feet or more; prefer a map.</li>
            <li>In meters? Multiply by 3.28 to get feet (1 m = 3.2808 ft).</li>
            <li>Near the edge of a range in the altitude tables, use the higher altitude (common practice).</li>
          </ul>
        </details>
      </div>

      <TimeZoneField
        value={answers.timeZone}
        onChange={set('timeZone')}
        error={error?.fields.timeZone}
        hint={`This browser says ${fromBrowser}. “Today”, use-by dates and reminders follow the zone you confirm.`}
      />

      <fieldset className="grid gap-4 sm:grid-cols-2">
        <legend className="mb-2 text-lg font-bold">Your canner</legend>
        <SelectField
          label="The canner you use most"
          value={answers.defaultMethod}
          onChange={(e) => setAnswers({ ...answers, defaultMethod: e.target.value as Method })}
          error={error?.fields.defaultMethod}
          hint="You can choose another canner for each batch."
        >
          {PROCESSING_METHODS.map((method) => (
            <option key={method} value={method}>
              {METHOD_NAMES[method]}
            </option>
          ))}
        </SelectField>
        <TextField
          label="Jars it holds in one load"
          inputMode="numeric"
          value={answers.cannerCapacityJars}
          onChange={set('cannerCapacityJars')}
          error={error?.fields.cannerCapacityJars}
          hint="Batch plans are split into canner loads. Many boiling-water canners hold 7 quart jars (common practice)."
        />
      </fieldset>

      <SelectField
        label="First day of your week"
        value={answers.weekStartsOn}
        onChange={set('weekStartsOn')}
        error={error?.fields.weekStartsOn}
        hint="The week board starts on it."
      >
        {WEEKDAY_NAMES.map((name, day) => (
          <option key={name} value={day}>
            {name}
          </option>
        ))}
      </SelectField>

      <FormFooter error={error} pending={update.isPending} submitLabel="Confirm and continue" pendingLabel="Saving…" />
    </form>
  );
}
