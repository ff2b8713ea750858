import { useState, type FormEvent } from 'react';
import { useNavigate } from 'react-router-dom';
import { defaultUseWithinDays, JAR_SIZES, PRODUCT_KINDS, type JarSize, type ProductKind } from '@shared/domain';
import type { ProductView } from '@shared/schemas/products';
import {
  HEAT_LEVELS,
  heatWords,
  PRODUCT_COLOUR_NAMES,
  PRODUCT_COLOURS,
  PRODUCT_KIND_NAMES,
  type ProductColour,
  USE_WITHIN_DEFAULT_HINT,
} from '@shared/words';
import { PLACE_WORDS } from '@shared/words/shelf-places';
import { FormFooter } from '@/components/ui/form-footer';
import { CheckboxField, SelectField, TextAreaField, TextField } from '@/components/ui/field';
import { ApiError } from '@/lib/api-client';
import { useFocusFirstError } from '@/lib/focus-first-error';
import { usePlaces } from '../api/get-places';
import { useSaveProduct } from '../api/save-product';
import { numberFrom } from '../number-from';
import { ColourDot } from './colour-dot';
import { paths } from '@shared/paths';
import { useUnits } from '@/lib/units';

const MONTHS = ['Jan', 'Feb', 'Mar', 'Apr', 'May', 'Jun', 'Jul', 'Aug', 'Sep', 'Oct', 'Nov', 'Dec'];

export function ProductForm({ hid, product }: { hid: string; product?: ProductView }) {
  const units = useUnits();
  const save = useSaveProduct(hid, product?.id);
  const navigate = useNavigate();
  const places = usePlaces(hid);
  const [form, setForm] = useState({
    name: product?.name ?? '',
    kind: (product?.kind ?? 'relish') as ProductKind,
    heat: String(product?.heat ?? 0),
    favourite: product?.favourite ?? false,
    minJars: String(product?.minJars ?? 0),
    useWithinDays: product?.useWithinDays === null || product === undefined ? '' : String(product.useWithinDays),
    harvestMonths: product?.harvestMonths ?? [],
    jarSize: (product?.jarSize ?? 'half-pint') as JarSize,
    colour: (product?.colour ?? 'honey') as ProductColour,
    notes: product?.notes ?? '',
    defaultPlaceId: product?.defaultPlaceId ?? '',
  });
  const error = save.error instanceof ApiError ? save.error : null;
  const formRef = useFocusFirstError(error);

  function submit(event: FormEvent) {
    event.preventDefault();
    save.mutate(
      {
        name: form.name,
        kind: form.kind,
        heat: Number(form.heat),
        favourite: form.favourite,
        minJars: numberFrom(form.minJars),
        useWithinDays: form.useWithinDays.trim() === '' ? null : numberFrom(form.useWithinDays),
        harvestMonths: form.harvestMonths,
        jarSize: form.jarSize,
        colour: form.colour,
        notes: form.notes,
        defaultPlaceId: form.defaultPlaceId || null,
      },
      { onSuccess: () => navigate(paths.shelf(hid)) },
    );
  }

  const toggleMonth = (month: number) =>
    setForm({
      ...form,
      harvestMonths: form.harvestMonths.includes(month)
        ? form.harvestMonths.filter((m) => m !== month)
        : [...form.harvestMonths, month].sort((a, b) => a - b),
    });

  return (
    <form ref={formRef} onSubmit={submit} noValidate className="grid gap-4 sm:grid-cols-2">
      <TextField
        label="Name"
        value={form.name}
        onChange={(e) => setForm({ ...form, name: e.target.value })}
        error={error?.fields.name}
      />
      <SelectField
        label="Kind"
        value={form.kind}
        onChange={(e) => setForm({ ...form, kind: e.target.value as ProductKind })}
        error={error?.fields.kind}
      >
        {PRODUCT_KINDS.map((kind) => (
          <option key={kind} value={kind}>
            {PRODUCT_KIND_NAMES[kind]}
          </option>
        ))}
      </SelectField>
      <SelectField
        label="Heat"
        value={form.heat}
        onChange={(e) => setForm({ ...form, heat: e.target.value })}
        error={error?.fields.heat}
      >
        {HEAT_LEVELS.map((heat) => (
          <option key={heat} value={heat}>
            {heatWords(heat, true)}
          </option>
        ))}
      </SelectField>
      <TextField
        label="Keep at least (jars)"
        inputMode="numeric"
        value={form.minJars}
        onChange={(e) => setForm({ ...form, minJars: e.target.value })}
        error={error?.fields.minJars}
        hint="Restock suggests a batch below this."
      />
      <TextField
        label="Once opened, use within (days)"
        inputMode="numeric"
        value={form.useWithinDays}
        placeholder={`${defaultUseWithinDays(form.kind)} (default)`}
        onChange={(e) => setForm({ ...form, useWithinDays: e.target.value })}
        error={error?.fields.useWithinDays}
        hint={`Leave empty for the default for ${PRODUCT_KIND_NAMES[form.kind].toLowerCase()}: ${defaultUseWithinDays(form.kind)} days. ${USE_WITHIN_DEFAULT_HINT}`}
      />
      <SelectField
        label="Usual jar size"
        value={form.jarSize}
        onChange={(e) => setForm({ ...form, jarSize: e.target.value as JarSize })}
      >
        {JAR_SIZES.map((size) => (
          <option key={size} value={size}>
            {units.jarSize(size)}
          </option>
        ))}
      </SelectField>
      <SelectField
        label={PLACE_WORDS.defaultPlace}
        value={form.defaultPlaceId}
        onChange={(e) => setForm({ ...form, defaultPlaceId: e.target.value })}
        error={error?.fields.defaultPlaceId}
        hint={PLACE_WORDS.defaultPlaceHint}
      >
        <option value="">{PLACE_WORDS.none}</option>
        {(places.data ?? []).map((place) => (
          <option key={place.id} value={place.id}>
            {place.name}
          </option>
        ))}
      </SelectField>
      <fieldset className="sm:col-span-2">
        <legend className="font-bold">Harvest months</legend>
        <div className="mt-1 grid grid-cols-4 gap-2 sm:grid-cols-6 lg:grid-cols-12">
          {MONTHS.map((name, index) => (
            <label
              key={name}
              className="flex min-h-11 items-center gap-2 rounded-lg border border-line bg-surface px-2"
            >
              <input
                type="checkbox"
                className="h-5 w-5 accent-action"
                checked={form.harvestMonths.includes(index + 1)}
                onChange={() => toggleMonth(index + 1)}
              />
              {name}
            </label>
          ))}
        </div>
      </fieldset>
      <fieldset className="sm:col-span-2">
        <legend className="font-bold">Color on the shelf</legend>
        <div className="mt-1 flex flex-wrap gap-2">
          {PRODUCT_COLOURS.map((colour) => (
            <label
              key={colour}
              className="flex min-h-11 items-center gap-2 rounded-lg border border-line bg-surface px-3"
            >
              <input
                type="radio"
                name="colour"
                className="h-5 w-5 accent-action"
                checked={form.colour === colour}
                onChange={() => setForm({ ...form, colour })}
              />
              <ColourDot colour={colour} />
              {PRODUCT_COLOUR_NAMES[colour]}
            </label>
          ))}
        </div>
      </fieldset>
      <CheckboxField
        label="A household favorite"
        hint="Favorites get restock suggestions before they run out."
        checked={form.favourite}
        onChange={(e) => setForm({ ...form, favourite: e.target.checked })}
      />
      <div className="sm:col-span-2">
        <TextAreaField
          label="Notes"
          value={form.notes}
          onChange={(e) => setForm({ ...form, notes: e.target.value })}
          error={error?.fields.notes}
        />
      </div>
      <FormFooter
        className="sm:col-span-2"
        error={error}
        pending={save.isPending}
        submitLabel={product ? 'Save the product' : 'Add the product'}
        pendingLabel="Saving…"
      />
    </form>
  );
}
