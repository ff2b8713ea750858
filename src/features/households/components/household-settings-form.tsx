import { useState, type FormEvent } from 'react';
import type { HouseholdView } from '@shared/schemas/households';
import { FormFooter } from '@/components/ui/form-footer';
import { SelectField, TextField } from '@/components/ui/field';
import { ApiError } from '@/lib/api-client';
import { useFocusFirstError } from '@/lib/focus-first-error';
import { useUpdateHousehold } from '../api/update-household';
import { TimeZoneField } from './time-zone-field';

export function HouseholdSettingsForm({ household, canEdit }: { household: HouseholdView; canEdit: boolean }) {
  const update = useUpdateHousehold(household.id);
  const [form, setForm] = useState({
    name: household.name,
    altitudeFt: String(household.altitudeFt),
    unitSystem: household.unitSystem,
    timeZone: household.timeZone,
    bestQualityMonths: String(household.bestQualityMonths),
  });
  const error = update.error instanceof ApiError ? update.error : null;
  const formRef = useFocusFirstError(error);

  function submit(event: FormEvent) {
    event.preventDefault();
    const altitude = form.altitudeFt.trim() === '' ? Number.NaN : Number(form.altitudeFt.replaceAll(',', ''));
    const months = form.bestQualityMonths.trim() === '' ? Number.NaN : Number(form.bestQualityMonths);
    update.mutate({
      name: form.name,
      altitudeFt: altitude,
      unitSystem: form.unitSystem,
      timeZone: form.timeZone,
      bestQualityMonths: months,
    });
  }

  return (
    <form ref={formRef} onSubmit={submit} className="grid gap-4 sm:grid-cols-2" noValidate>
      <fieldset disabled={!canEdit} className="contents">
        <TextField
          label="Household name"
          value={form.name}
          onChange={(e) => setForm({ ...form, name: e.target.value })}
          error={error?.fields.name}
        />
        <TextField
          label="Altitude (feet above sea level)"
          inputMode="numeric"
          value={form.altitudeFt}
          onChange={(e) => setForm({ ...form, altitudeFt: e.target.value })}
          error={error?.fields.altitudeFt}
          hint="Processing times and pressures depend on it. Your local extension service can tell you yours."
        />
        <SelectField
          label="Units"
          value={form.unitSystem}
          onChange={(e) => setForm({ ...form, unitSystem: e.target.value as HouseholdView['unitSystem'] })}
        >
          <option value="us">US customary (cups, pints, quarts)</option>
          <option value="metric">Metric (milliliters, liters)</option>
        </SelectField>
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
