import { useState, type FormEvent } from 'react';
import { Link, useNavigate, useSearchParams } from 'react-router-dom';
import { recipeProcessingPlan } from '@shared/processing-plan';
import {
  JAR_SIZES,
  MOUTHS,
  mouthFor,
  PROCESSING_METHODS,
  UNSEALED_JAR_ADVICE,
  type JarSize,
  type Method,
  type Mouth,
} from '@shared/domain';
import type { HouseholdView } from '@shared/schemas/households';
import type { ProductView } from '@shared/schemas/products';
import type { RecipeView } from '@shared/schemas/recipes';
import { calendarDateIn } from '@shared/time-zones';
import { jarSizeWords, METHOD_NAMES, SEALS_CHOICE } from '@shared/words';
import { PLACE_WORDS } from '@shared/words/shelf-places';
import { MOUTH_LABELS } from '@shared/words/stock';
import { FormFooter } from '@/components/ui/form-footer';
import { ChoiceCard, SelectField, TextAreaField, TextField } from '@/components/ui/field';
import { Notice } from '@/components/ui/notice';
import { ApiError } from '@/lib/api-client';
import { useFocusFirstError } from '@/lib/focus-first-error';
import { useCreateBatch } from '../api/create-batch';
import { usePlaces } from '../api/get-places';
import { numberFrom } from '../number-from';
import { PlanPanel } from './plan-panel';
import { paths } from '@shared/paths';
import { useUnits } from '@/lib/units';

/** The household's today, as YYYY-MM-DD: the canning day the server checks against. */

/**
 * The day's work in order: what, which tested recipe, when, which jars, how many sealed, which canner.
 * The draft lives in the address (the pre-fill parameters), so a reload or a shared link keeps it.
 */

export function NewBatchForm({
  household,
  products,
  recipes,
}: {
  household: HouseholdView;
  products: ProductView[];
  recipes: RecipeView[];
}) {
  const units = useUnits();
  const [params, setParams] = useSearchParams();
  const navigate = useNavigate();
  const create = useCreateBatch(household.id);
  const places = usePlaces(household.id);
  const [notes, setNotes] = useState('');
  const error = create.error instanceof ApiError ? create.error : null;
  const formRef = useFocusFirstError(error);

  const productId = params.get('productId') ?? '';
  const forProduct = recipes.filter((r) => r.productId === productId);
  const recipe =
    forProduct.find((r) => r.id === params.get('recipeId')) ?? (forProduct.length === 1 ? forProduct[0] : undefined);
  const product = products.find((p) => p.id === productId);
  const testedSizes = recipe ? (JAR_SIZES.filter((s) => recipe.baseMinutes[s] !== undefined) as JarSize[]) : [];
  const jarSize = (JAR_SIZES as readonly string[]).includes(params.get('jarSize') ?? '')
    ? (params.get('jarSize') as JarSize)
    : (testedSizes[0] ?? product?.jarSize ?? 'half-pint');
  // A jar's mouth is the jar's; the size's usual one until the cook says (it decides which lids the batch takes).
  const mouth = mouthFor(
    jarSize,
    (MOUTHS as readonly string[]).includes(params.get('mouth') ?? '') ? (params.get('mouth') as Mouth) : null,
  );
  const method = (PROCESSING_METHODS as readonly string[]).includes(params.get('method') ?? '')
    ? (params.get('method') as Method)
    : (recipe?.method ?? household.defaultMethod);
  const jarsText = params.get('jars') ?? '';
  const sealedText = params.get('sealed') ?? jarsText;
  const today = calendarDateIn(household.timeZone);
  const cannedOn = params.get('date') ?? today;
  // Seals left to check only for a batch processed today; an earlier day's seals are checked already.
  const seals = params.get('seals') === 'to-check' && cannedOn === today ? 'to-check' : 'checked';

  // Where the jars go: the product's usual place unless the cook chose another ('none': no place).
  const place = params.get('place') ?? product?.defaultPlaceId ?? 'none';

  const plan = recipe
    ? recipeProcessingPlan(recipe, {
        jarSize,
        method,
        altitudeFt: household.altitudeFt,
        unitSystem: household.unitSystem,
      })
    : null;
  const filled = numberFrom(jarsText);
  const sealed = numberFrom(sealedText);
  const unsealed =
    seals === 'checked' && Number.isInteger(filled) && Number.isInteger(sealed) && filled > sealed
      ? filled - sealed
      : 0;

  function set(changes: Record<string, string | null>) {
    const next = new URLSearchParams(params);
    for (const [key, value] of Object.entries(changes)) {
      if (value === null || value === '') next.delete(key);
      else next.set(key, value);
    }
    setParams(next, { replace: true });
  }

  function submit(event: FormEvent) {
    event.preventDefault();
    if (!recipe || !plan?.allowed) return;
    create.mutate(
      {
        productId,
        recipeId: recipe.id,
        cannedOn,
        jarSize,
        mouth,
        jarsFilled: filled,
        jarsSealed: seals === 'to-check' ? filled : sealed,
        method,
        notes,
        seals,
        placeId: place === 'none' ? null : place,
      },
      {
        onSuccess: (created) =>
          navigate(paths.batch(household.id, created.batch.id, { saved: true, todoId: params.get('todoId') }), {
            state: { stockWarnings: created.stockWarnings },
          }),
      },
    );
  }

  return (
    <form ref={formRef} onSubmit={submit} noValidate className="grid gap-6 lg:grid-cols-[3fr_2fr] lg:items-start">
      <div className="flex flex-col gap-4">
        <SelectField
          label="What did you make?"
          value={productId}
          onChange={(e) => set({ productId: e.target.value, recipeId: null, jarSize: null, method: null, place: null })}
          error={error?.fields.productId}
        >
          <option value="">Choose a product</option>
          {products.map((p) => (
            <option key={p.id} value={p.id}>
              {p.name}
            </option>
          ))}
        </SelectField>
        {product && forProduct.length === 0 ? (
          <Notice tone="soon" title={`No tested recipe for ${product.name} yet`}>
            A batch follows a tested recipe, so its processing time is known.{' '}
            <Link to={paths.newRecipe(household.id, product.id)} className="font-bold text-action underline">
              Add the recipe
            </Link>{' '}
            first.
          </Notice>
        ) : (
          <SelectField
            label="Which tested recipe?"
            value={recipe?.id ?? ''}
            disabled={!product}
            onChange={(e) => set({ recipeId: e.target.value, jarSize: null, method: null })}
            error={error?.fields.recipeId}
          >
            <option value="">{product ? 'Choose a recipe' : 'Choose a product first'}</option>
            {forProduct.map((r) => (
              <option key={r.id} value={r.id}>
                {r.name}
              </option>
            ))}
          </SelectField>
        )}
        <TextField
          label="Canning day"
          type="date"
          value={cannedOn}
          max={today}
          onChange={(e) => set({ date: e.target.value })}
          error={error?.fields.cannedOn}
        />
        <div className="grid gap-4 sm:grid-cols-2">
          <SelectField
            label="Jar size"
            value={jarSize}
            onChange={(e) => set({ jarSize: e.target.value, mouth: null })}
            error={error?.fields.jarSize}
          >
            {JAR_SIZES.map((size) => (
              <option key={size} value={size}>
                {units.jarSize(size)}
                {recipe && !testedSizes.includes(size) ? ' (no tested time)' : ''}
              </option>
            ))}
          </SelectField>
          <SelectField
            label="Jar mouth"
            value={mouth}
            onChange={(e) => set({ mouth: e.target.value === mouthFor(jarSize) ? null : e.target.value })}
            error={error?.fields.mouth}
            hint={`Which lids the jars take; ${MOUTH_LABELS[mouthFor(jarSize)].toLowerCase()} is the usual for ${jarSizeWords(jarSize)} jars (common practice).`}
          >
            {MOUTHS.map((m) => (
              <option key={m} value={m}>
                {MOUTH_LABELS[m]}
              </option>
            ))}
          </SelectField>
          <TextField
            label="Jars filled"
            inputMode="numeric"
            value={jarsText}
            onChange={(e) => set({ jars: e.target.value })}
            error={error?.fields.jarsFilled}
          />
          {seals === 'checked' && (
            <TextField
              label="Jars sealed"
              inputMode="numeric"
              value={sealedText}
              onChange={(e) => set({ sealed: e.target.value })}
              error={error?.fields.jarsSealed}
              hint="Test each lid once cool."
            />
          )}
        </div>
        {cannedOn === today && (
          <fieldset className="flex flex-col gap-2">
            <legend className="mb-1 font-bold">Seals</legend>
            {(['to-check', 'checked'] as const).map((choice) => (
              <ChoiceCard
                key={choice}
                name="seals"
                value={choice}
                checked={seals === choice}
                onChange={() => set({ seals: choice === 'to-check' ? 'to-check' : null })}
                label={SEALS_CHOICE[choice].label}
                hint={SEALS_CHOICE[choice].hint}
              />
            ))}
            {error?.fields.seals && <p className="font-bold text-past">{error.fields.seals}</p>}
          </fieldset>
        )}
        {unsealed > 0 && (
          <Notice tone="soon" title={`${unsealed} jar${unsealed > 1 ? 's' : ''} did not seal`}>
            {UNSEALED_JAR_ADVICE} Saving puts {unsealed > 1 ? 'them' : 'it'} in the fridge as opened on the canning day.
          </Notice>
        )}
        <SelectField
          label="Canner"
          value={method}
          onChange={(e) => set({ method: e.target.value })}
          error={error?.fields.method}
        >
          {PROCESSING_METHODS.map((m) => (
            <option key={m} value={m}>
              {METHOD_NAMES[m]}
            </option>
          ))}
        </SelectField>
        {(places.data?.length ?? 0) > 0 && (
          <SelectField
            label={PLACE_WORDS.batchPlace}
            value={place}
            onChange={(e) => set({ place: e.target.value })}
            error={error?.fields.placeId}
            hint={
              product?.defaultPlaceId && place === product.defaultPlaceId ? `${product.name}’s usual place.` : undefined
            }
          >
            <option value="none">{PLACE_WORDS.none}</option>
            {places.data!.map((p) => (
              <option key={p.id} value={p.id}>
                {p.name}
              </option>
            ))}
          </SelectField>
        )}
        <TextAreaField
          label="Notes"
          value={notes}
          onChange={(e) => setNotes(e.target.value)}
          placeholder="What was different this time?"
        />
      </div>
      <div className="flex flex-col gap-3 lg:col-start-2 lg:row-span-2 lg:row-start-1">
        {plan ? (
          <PlanPanel plan={plan} method={method} altitudeFt={household.altitudeFt} />
        ) : (
          <Notice tone="info" title="The processing plan appears here">
            Choose the product and its tested recipe; the plan is worked out for your altitude,{' '}
            {units.altitude(household.altitudeFt)}.
          </Notice>
        )}
      </div>
      {/* After the plan on a phone, so the cook reads it before saving. */}
      <div className="flex flex-col gap-4">
        <FormFooter
          error={error}
          pending={create.isPending}
          disabled={!plan?.allowed}
          submitLabel="Save the batch"
          pendingLabel="Saving…"
          secondary={plan && !plan.allowed && <span className="font-bold text-past">Not allowed: see the plan.</span>}
        />
      </div>
    </form>
  );
}
