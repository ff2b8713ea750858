import { useState, type FormEvent } from 'react';
import { useNavigate } from 'react-router-dom';
import {
  defaultHeadspaceInches,
  INGREDIENT_ROLES,
  ingredientUnitsFor,
  JAR_SIZES,
  PROCESSING_METHODS,
  type IngredientRole,
  type IngredientUnit,
  type JarSize,
  type Method,
  type UnitSystem,
} from '@shared/domain';

import type { ProductView } from '@shared/schemas/products';
import type { RecipeView } from '@shared/schemas/recipes';
import {
  headspaceInputValue,
  headspaceWords,
  headspaceUnitWords,
  INGREDIENT_ROLE_NAMES,
  INGREDIENT_UNIT_NAMES,
  METHOD_NAMES,
  parseHeadspace,
} from '@shared/words';
import { Button } from '@/components/ui/button';
import { CheckboxField, SelectField, TextAreaField, TextField } from '@/components/ui/field';
import { FormFooter } from '@/components/ui/form-footer';
import { ApiError } from '@/lib/api-client';
import { useFocusFirstError } from '@/lib/focus-first-error';
import { useRecipes } from '../api/get-recipes';
import { useSaveRecipe } from '../api/save-recipe';
import { numberFrom } from '../number-from';
import { paths } from '@shared/paths';
import { useUnits } from '@/lib/units';

interface IngredientDraft {
  name: string;
  amount: string;
  unit: IngredientUnit;
  role: IngredientRole;
}

const blankIngredient = (system: UnitSystem): IngredientDraft => ({
  name: '',
  amount: '',
  unit: system === 'metric' ? 'ml' : 'cup',
  role: 'produce',
});
const optionalNumber = (text: string) => (text.trim() === '' ? null : numberFrom(text));

/** The household's units, and the ingredient's own where it was written in the other system. */
const unitChoices = (current: IngredientUnit, system: UnitSystem): readonly IngredientUnit[] => {
  const offered = ingredientUnitsFor(system);
  return offered.includes(current) ? offered : [current, ...offered];
};

/** The form's fields from a saved recipe (to edit it, or to start a new one from its copy), or blank. */
function draftFrom(
  products: ProductView[],
  recipe: RecipeView | undefined,
  productId: string | undefined,
  system: UnitSystem,
  name = recipe?.name ?? '',
) {
  const firstProduct = products.find((p) => p.id === (recipe?.productId ?? productId)) ?? products[0];
  return {
    productId: firstProduct?.id ?? '',
    name,
    yieldJars: String(recipe?.yieldJars ?? 4),
    yieldJarSize: (recipe?.yieldJarSize ?? firstProduct?.jarSize ?? 'pint') as JarSize,
    method: (recipe?.method ?? 'boiling-water') as Method,
    acidified: recipe?.acidified ?? false,
    ph: recipe?.ph === null || recipe === undefined ? '' : String(recipe.ph),
    acidPercent: recipe?.acidPercent === null || recipe === undefined ? '' : String(recipe.acidPercent),
    // Typed in the household's units (inches or mm); stored in inches.
    headspace: headspaceInputValue(
      recipe?.headspaceInches ?? (firstProduct ? defaultHeadspaceInches(firstProduct.kind) : 0.5),
      system,
    ),
    baseMinutes: Object.fromEntries(
      JAR_SIZES.map((size) => [size, recipe?.baseMinutes[size] === undefined ? '' : String(recipe.baseMinutes[size])]),
    ) as Record<JarSize, string>,
    steps: recipe?.steps ?? '',
    source: recipe?.source ?? '',
    altitudeTable: recipe?.altitudeTable ?? null,
  };
}

/** In metric, the inches a tested recipe gives beside the mm typed, so the cook can check it against the book. */
function headspaceHint(text: string, system: UnitSystem): string | undefined {
  const inches = parseHeadspace(text, system);
  if (system !== 'metric' || inches === null || inches <= 0) return undefined;
  return `That is ${headspaceWords(inches, 'us')}, as tested recipes give it.`;
}

const ingredientDrafts = (recipe: RecipeView | undefined, system: UnitSystem): IngredientDraft[] =>
  recipe ? recipe.ingredients.map((i) => ({ ...i, amount: String(i.amount) })) : [blankIngredient(system)];

/** A tested recipe, entered as its source gives it: the app never invents a time. A new one may start from a copy. */
export function RecipeForm({
  hid,
  products,
  recipe,
  productId,
}: {
  hid: string;
  products: ProductView[];
  recipe?: RecipeView;
  productId?: string;
}) {
  const units = useUnits();
  const save = useSaveRecipe(hid, recipe?.id);
  const navigate = useNavigate();
  const [form, setForm] = useState(() => draftFrom(products, recipe, productId, units.system));
  const [ingredients, setIngredients] = useState<IngredientDraft[]>(() => ingredientDrafts(recipe, units.system));
  const [copiedFrom, setCopiedFrom] = useState('');
  const error = save.error instanceof ApiError ? save.error : null;
  const formRef = useFocusFirstError(error);

  function startFromCopy(recipeId: string, household: RecipeView[]) {
    setCopiedFrom(recipeId);
    const original = household.find((r) => r.id === recipeId);
    setForm(draftFrom(products, original, productId, units.system, original ? `${original.name} (copy)` : ''));
    setIngredients(ingredientDrafts(original, units.system));
    save.reset();
  }

  function submit(event: FormEvent) {
    event.preventDefault();
    const baseMinutes = Object.fromEntries(
      JAR_SIZES.filter((size) => form.baseMinutes[size].trim() !== '').map((size) => [
        size,
        numberFrom(form.baseMinutes[size]),
      ]),
    );
    save.mutate(
      {
        productId: form.productId,
        name: form.name,
        yieldJars: numberFrom(form.yieldJars),
        yieldJarSize: form.yieldJarSize,
        ingredients: ingredients
          .filter((i) => i.name.trim() || i.amount.trim())
          .map((i) => ({ name: i.name, amount: numberFrom(i.amount), unit: i.unit, role: i.role })),
        acidPercent: optionalNumber(form.acidPercent),
        ph: optionalNumber(form.ph),
        acidified: form.acidified,
        method: form.method,
        baseMinutes,
        altitudeTable: form.altitudeTable,
        // Not a number stays not a number, so the server's field error says what to enter.
        headspaceInches: parseHeadspace(form.headspace, units.system) ?? Number.NaN,
        steps: form.steps,
        source: form.source,
      },
      { onSuccess: (saved) => navigate(paths.recipe(hid, saved.id)) },
    );
  }

  const setIngredient = (index: number, changes: Partial<IngredientDraft>) =>
    setIngredients(ingredients.map((i, n) => (n === index ? { ...i, ...changes } : i)));

  return (
    <form ref={formRef} onSubmit={submit} noValidate className="grid gap-4 sm:grid-cols-2">
      {!recipe && <CopyChoice hid={hid} value={copiedFrom} onChoose={startFromCopy} />}
      <SelectField
        label="Product"
        value={form.productId}
        onChange={(e) => setForm({ ...form, productId: e.target.value })}
        error={error?.fields.productId}
      >
        {products.map((p) => (
          <option key={p.id} value={p.id}>
            {p.name}
          </option>
        ))}
      </SelectField>
      <TextField
        label="Recipe name"
        value={form.name}
        onChange={(e) => setForm({ ...form, name: e.target.value })}
        error={error?.fields.name}
      />
      <TextField
        label="Tested yield (jars)"
        inputMode="numeric"
        value={form.yieldJars}
        onChange={(e) => setForm({ ...form, yieldJars: e.target.value })}
        error={error?.fields.yieldJars}
      />
      <SelectField
        label="Jar size of the yield"
        value={form.yieldJarSize}
        onChange={(e) => setForm({ ...form, yieldJarSize: e.target.value as JarSize })}
      >
        {JAR_SIZES.map((size) => (
          <option key={size} value={size}>
            {units.jarSize(size)}
          </option>
        ))}
      </SelectField>
      <SelectField
        label="Tested for"
        value={form.method}
        onChange={(e) => setForm({ ...form, method: e.target.value as Method })}
        error={error?.fields.method}
      >
        {PROCESSING_METHODS.map((m) => (
          <option key={m} value={m}>
            {METHOD_NAMES[m]}
          </option>
        ))}
      </SelectField>
      <TextField
        label={`Headspace (${headspaceUnitWords(units.system)})`}
        inputMode="decimal"
        value={form.headspace}
        onChange={(e) => setForm({ ...form, headspace: e.target.value })}
        error={error?.fields.headspaceInches}
        hint={headspaceHint(form.headspace, units.system)}
      />
      <div className="sm:col-span-2">
        <CheckboxField
          label="Acid or acidified (pH 4.6 or below)"
          hint="Tick only where the tested recipe is for a boiling-water canner. A measured pH below wins over this."
          checked={form.acidified}
          onChange={(e) => setForm({ ...form, acidified: e.target.checked })}
        />
      </div>
      <TextField
        label="Measured pH (optional)"
        inputMode="decimal"
        value={form.ph}
        onChange={(e) => setForm({ ...form, ph: e.target.value })}
        error={error?.fields.ph}
      />
      <TextField
        label="Acid strength, % (optional)"
        inputMode="decimal"
        value={form.acidPercent}
        onChange={(e) => setForm({ ...form, acidPercent: e.target.value })}
        error={error?.fields.acidPercent}
        hint="5 for the usual vinegar."
      />
      <fieldset className="sm:col-span-2">
        <legend className="font-bold">Tested minutes at 0–{units.altitude(1000)}, by jar size</legend>
        <p className="text-sm text-ink-muted">
          Copy them from the tested recipe; leave a size empty where it gives no time.
        </p>
        {error?.fields.baseMinutes && (
          <p className="text-sm font-bold text-past" role="alert" data-field-error>
            {error.fields.baseMinutes}
          </p>
        )}
        <div className="mt-2 grid grid-cols-2 gap-3 sm:grid-cols-4">
          {JAR_SIZES.map((size) => (
            <TextField
              key={size}
              label={units.jarSize(size)}
              inputMode="numeric"
              value={form.baseMinutes[size]}
              onChange={(e) => setForm({ ...form, baseMinutes: { ...form.baseMinutes, [size]: e.target.value } })}
            />
          ))}
        </div>
      </fieldset>
      <fieldset className="flex flex-col gap-3 sm:col-span-2">
        <legend className="font-bold">Ingredients</legend>
        {error?.fields.ingredients && (
          <p className="text-sm font-bold text-past" role="alert" data-field-error>
            {error.fields.ingredients}
          </p>
        )}
        {ingredients.map((ingredient, index) => (
          <div
            key={index}
            className="grid grid-cols-2 items-end gap-2 rounded-lg border border-line p-2 sm:grid-cols-[2fr_1fr_1.2fr_1.6fr_auto]"
          >
            <div className="col-span-2 sm:col-span-1">
              <TextField
                label={`Ingredient ${index + 1}`}
                value={ingredient.name}
                onChange={(e) => setIngredient(index, { name: e.target.value })}
                error={error?.fields[`ingredients.${index}.name`]}
              />
            </div>
            <TextField
              label="Amount"
              inputMode="decimal"
              value={ingredient.amount}
              onChange={(e) => setIngredient(index, { amount: e.target.value })}
              error={error?.fields[`ingredients.${index}.amount`]}
            />
            <SelectField
              label="Unit"
              value={ingredient.unit}
              onChange={(e) => setIngredient(index, { unit: e.target.value as IngredientUnit })}
            >
              {unitChoices(ingredient.unit, units.system).map((unit) => (
                <option key={unit} value={unit}>
                  {INGREDIENT_UNIT_NAMES[unit]}
                </option>
              ))}
            </SelectField>
            <div className="col-span-2 sm:col-span-1">
              <SelectField
                label="Role"
                value={ingredient.role}
                onChange={(e) => setIngredient(index, { role: e.target.value as IngredientRole })}
              >
                {INGREDIENT_ROLES.map((role) => (
                  <option key={role} value={role}>
                    {INGREDIENT_ROLE_NAMES[role]}
                  </option>
                ))}
              </SelectField>
            </div>
            <Button
              variant="quiet"
              onClick={() => setIngredients(ingredients.filter((_, n) => n !== index))}
              aria-label={`Remove ingredient ${index + 1}`}
            >
              Remove
            </Button>
          </div>
        ))}
        <Button
          variant="secondary"
          className="self-start"
          onClick={() => setIngredients([...ingredients, blankIngredient(units.system)])}
        >
          Add an ingredient
        </Button>
      </fieldset>
      <div className="sm:col-span-2">
        <TextAreaField
          label="Method"
          value={form.steps}
          onChange={(e) => setForm({ ...form, steps: e.target.value })}
          error={error?.fields.steps}
        />
      </div>
      <div className="sm:col-span-2">
        <TextField
          label="Source"
          value={form.source}
          onChange={(e) => setForm({ ...form, source: e.target.value })}
          error={error?.fields.source}
          hint="Where the tested recipe comes from, for example the USDA Complete Guide to Home Canning."
        />
      </div>
      <FormFooter
        className="sm:col-span-2"
        error={error}
        pending={save.isPending}
        submitLabel={recipe ? 'Save the recipe' : 'Add the recipe'}
        pendingLabel="Saving…"
      />
    </form>
  );
}

/** "Start from a copy of…": fills the form from one of the household's recipes, to be saved as a new one. */
function CopyChoice({
  hid,
  value,
  onChoose,
}: {
  hid: string;
  value: string;
  onChoose: (recipeId: string, household: RecipeView[]) => void;
}) {
  const recipes = useRecipes(hid);
  if (!recipes.data?.length) return null;
  return (
    <div className="sm:col-span-2">
      <SelectField
        label="Start from a copy of…"
        value={value}
        onChange={(e) => onChoose(e.target.value, recipes.data)}
        hint="Fills in everything from a recipe you keep; it is saved as a new recipe under its own name, and the original stays as it is."
      >
        <option value="">Nothing: a blank recipe</option>
        {recipes.data.map((r) => (
          <option key={r.id} value={r.id}>
            {r.name}
          </option>
        ))}
      </SelectField>
    </div>
  );
}
