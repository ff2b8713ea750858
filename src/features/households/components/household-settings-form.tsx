import { useState, type FormEvent } from 'react';
import { PROCESSING_METHODS, type Method } from '@shared/domain';
import type { HouseholdView } from '@shared/schemas/households';
import { altitudeInputValue, altitudeUnitWords, METHOD_NAMES, parseAltitude, WEEKDAY_NAMES } from '@shared/words';
import { FormFooter } from '@/components/ui/form-footer';
import { CheckboxField, SelectField, TextField } from '@/components/ui/field';
import { ApiError } from '@/lib/api-client';
import { useFocusFirstError } from '@/lib/focus-first-error';
import { useUpdateHousehold } from '../api/update-household';
import { TimeZoneField } from './time-zone-field';

type CannerDrafts = Record<Method, { owned: boolean; capacityJars: string }>;

function cannerDrafts(household: HouseholdView): CannerDrafts {
  return Object.fromEntries(
    PROCESSING_METHODS.map((method) => {
      const canner = household.canners.find((c) => c.method === method);
      return [method, { owned: Boolean(canner), capacityJars: canner ? String(canner.capacityJars) : '' }];
    }),
  ) as CannerDrafts;
}

export function HouseholdSettingsForm({ household, canEdit }: { household: HouseholdView; canEdit: boolean }) {
  const update = useUpdateHousehold(household.id);
  const [form, setForm] = useState({
    name: household.name,
    altitude: altitudeInputValue(household.altitudeFt, household.unitSystem),
    unitSystem: household.unitSystem,
    timeZone: household.timeZone,
    bestQualityMonths: String(household.bestQualityMonths),
    weekStartsOn: String(household.weekStartsOn),
    defaultMethod: household.defaultMethod,
  });
  const [canners, setCanners] = useState(() => cannerDrafts(household));
  const [altitudeProblem, setAltitudeProblem] = useState<string | null>(null);
  const error = update.error instanceof ApiError ? update.error : null;
  const formRef = useFocusFirstError(error);
  const owned = PROCESSING_METHODS.filter((method) => canners[method].owned);

  // The altitude is typed in the units the form was opened with; switching units converts what is there.
  const [altitudeSystem, setAltitudeSystem] = useState(household.unitSystem);
  function chooseUnits(unitSystem: HouseholdView['unitSystem']) {
    const feet = parseAltitude(form.altitude, altitudeSystem);
    setForm({ ...form, unitSystem, altitude: feet === null ? form.altitude : altitudeInputValue(feet, unitSystem) });
    setAltitudeSystem(unitSystem);
  }

  function submit(event: FormEvent) {
    event.preventDefault();
    const months = form.bestQualityMonths.trim() === '' ? Number.NaN : Number(form.bestQualityMonths);
    const altitudeFt = parseAltitude(form.altitude, altitudeSystem);
    // The server checks feet; a number typed in meters is checked here, in the words of the field.
    if (altitudeFt === null && altitudeSystem === 'metric') {
      setAltitudeProblem('Enter the altitude in whole meters as a number, such as 716.');
      return;
    }
    setAltitudeProblem(null);
    update.mutate({
      name: form.name,
      altitudeFt: altitudeFt ?? Number.NaN,
      unitSystem: form.unitSystem,
      timeZone: form.timeZone,
      bestQualityMonths: months,
      weekStartsOn: Number(form.weekStartsOn),
      defaultMethod: form.defaultMethod,
      canners: owned.map((method) => ({
        method,
        capacityJars: canners[method].capacityJars.trim() === '' ? Number.NaN : Number(canners[method].capacityJars),
      })),
    });
  }

  const cannerError = (method: Method) => {
    const index = owned.indexOf(method);
    return index < 0
      ? undefined
      : (error?.fields[`canners.${index}.capacityJars`] ?? error?.fields[`canners.${index}`]);
  };

  return (
    <form ref={formRef} onSubmit={submit} className="grid gap-4 sm:grid-cols-2" noValidate>
      <fieldset disabled={!canEdit} className="contents">
        <TextField
          label="Household name"
          value={form.name}
          onChange={(e) => setForm({ ...form, name: e.target.value })}
          error={error?.fields.name}
        />
        <SelectField
          label="Units"
          value={form.unitSystem}
          onChange={(e) => chooseUnits(e.target.value as HouseholdView['unitSystem'])}
          hint="Recipes, plans, shopping lists and e-mails use them. Pressure stays in pounds, as gauges read."
        >
          <option value="us">US customary (cups, pounds, feet)</option>
          <option value="metric">Metric (milliliters, grams, meters)</option>
        </SelectField>
        <TextField
          label={`Altitude (${altitudeUnitWords(altitudeSystem)} above sea level)`}
          inputMode="numeric"
          value={form.altitude}
          onChange={(e) => setForm({ ...form, altitude: e.target.value })}
          error={altitudeProblem ?? error?.fields.altitudeFt}
          hint="Processing times and pressures depend on it. Your local extension service can tell you yours."
        />
        <TimeZoneField
          value={form.timeZone}
          onChange={(e) => setForm({ ...form, timeZone: e.target.value })}
          error={error?.fields.timeZone}
        />
        <TextField
          label="Best quality by: months after canning"
          inputMode="numeric"
          value={form.bestQualityMonths}
          onChange={(e) => setForm({ ...form, bestQualityMonths: e.target.value })}
          error={error?.fields.bestQualityMonths}
          hint="Sealed jars past it get a badge on the shelf. The National Center for Home Food Preservation (NCHFP) advises one year (12 months)."
        />
        <SelectField
          label="First day of your week"
          value={form.weekStartsOn}
          onChange={(e) => setForm({ ...form, weekStartsOn: e.target.value })}
          error={error?.fields.weekStartsOn}
          hint="The week board starts on it, and the weekly digest comes that morning."
        >
          {WEEKDAY_NAMES.map((name, day) => (
            <option key={name} value={day}>
              {name}
            </option>
          ))}
        </SelectField>

        <fieldset className="flex min-w-0 flex-col gap-3 sm:col-span-2" aria-describedby="canners-hint">
          <legend className="font-bold">Your canners</legend>
          <p id="canners-hint" className="text-sm text-ink-muted">
            Tick each canner you own and say how many jars its rack holds: batch plans split the jars into loads of the
            canner the recipe uses. Many boiling-water canners hold 7 quart jars (common practice).
          </p>
          {error?.fields.canners && (
            <p role="alert" className="text-sm font-bold text-past">
              {error.fields.canners}
            </p>
          )}
          {PROCESSING_METHODS.map((method) => (
            <div key={method} className="grid grid-cols-[1fr_8rem] items-end gap-3">
              <CheckboxField
                label={METHOD_NAMES[method]}
                checked={canners[method].owned}
                onChange={(e) => setCanners({ ...canners, [method]: { ...canners[method], owned: e.target.checked } })}
              />
              {canners[method].owned && (
                <TextField
                  label="Jars a load"
                  inputMode="numeric"
                  value={canners[method].capacityJars}
                  onChange={(e) =>
                    setCanners({ ...canners, [method]: { ...canners[method], capacityJars: e.target.value } })
                  }
                  error={cannerError(method)}
                />
              )}
            </div>
          ))}
        </fieldset>
        <SelectField
          label="Default canner"
          value={form.defaultMethod}
          onChange={(e) => setForm({ ...form, defaultMethod: e.target.value as Method })}
          error={error?.fields.defaultMethod}
          hint="The new-batch form starts with it when a recipe does not say."
        >
          {PROCESSING_METHODS.map((method) => (
            <option key={method} value={method}>
              {METHOD_NAMES[method]}
              {canners[method].owned ? '' : ' (not ticked above)'}
            </option>
          ))}
        </SelectField>
      </fieldset>
      {canEdit && (
        <FormFooter
          className="sm:col-span-2"
          error={error}
          pending={update.isPending}
          submitLabel="Save settings"
          pendingLabel="Saving…"
          secondary={
            <span role="status" className="text-ink-muted">
              {update.isSuccess && !update.isPending ? 'Saved.' : ''}
            </span>
          }
        />
      )}
    </form>
  );
}
