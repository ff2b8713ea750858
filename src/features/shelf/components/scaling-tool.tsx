import { useState } from 'react';
import { Link } from 'react-router-dom';
import { recipeProcessingPlan } from '@shared/processing-plan';
import { JAR_SIZES, scaleRecipe, type JarSize } from '@shared/domain';
import type { RecipeView } from '@shared/schemas/recipes';
import { minutesWords } from '@shared/words';
import { SelectField, TextField } from '@/components/ui/field';
import { Notice } from '@/components/ui/notice';
import { numberFrom } from '../number-from';
import { Cautions } from './plan-panel';
import { paths } from '@shared/paths';
import { useUnits } from '@/lib/units';

/** Scales a tested recipe to the jars wanted; acid is never weakened, and the cautions come along. */

export function ScalingTool({ hid, recipe, altitudeFt }: { hid: string; recipe: RecipeView; altitudeFt: number }) {
  const units = useUnits();
  const [jarsText, setJarsText] = useState(String(recipe.yieldJars));
  const [jarSize, setJarSize] = useState<JarSize>(recipe.yieldJarSize);
  const jars = numberFrom(jarsText);
  const valid = Number.isInteger(jars) && jars >= 1 && jars <= 200;
  const scaled = valid
    ? scaleRecipe(
        { yield: { jars: recipe.yieldJars, jarSize: recipe.yieldJarSize }, ingredients: recipe.ingredients },
        { jars, jarSize },
      )
    : null;
  const plan = recipeProcessingPlan(recipe, {
    jarSize,
    method: recipe.method,
    altitudeFt,
    unitSystem: units.system,
  });

  return (
    <section aria-labelledby="scale-heading" className="flex flex-col gap-4">
      <h2 id="scale-heading" className="text-xl">
        Scale it
      </h2>
      <div className="grid grid-cols-2 gap-3">
        <TextField
          label="Jars"
          inputMode="numeric"
          value={jarsText}
          onChange={(e) => setJarsText(e.target.value)}
          error={valid ? undefined : 'Enter 1 to 200 jars.'}
        />
        <SelectField label="Jar size" value={jarSize} onChange={(e) => setJarSize(e.target.value as JarSize)}>
          {JAR_SIZES.map((size) => (
            <option key={size} value={size}>
              {units.jarSize(size)}
            </option>
          ))}
        </SelectField>
      </div>
      {scaled && (
        <>
          <p className="text-ink-muted">
            {scaled.factor === 1
              ? 'The tested batch, as written.'
              : `${Math.round(scaled.factor * 100) / 100} times the tested batch.`}
            {scaled.acidFactor > scaled.factor ? ' Acid is scaled up a little more, so rounding never weakens it.' : ''}
          </p>
          <table className="w-full text-left">
            <caption className="sr-only">Scaled ingredients</caption>
            <tbody>
              {scaled.ingredients.map((ingredient, index) => (
                <tr key={`${ingredient.name}-${index}`} className="border-t border-line">
                  <td className="tabular py-2 pr-3 font-bold whitespace-nowrap">
                    {units.amount(ingredient.amount, ingredient.unit)}
                  </td>
                  <td className="py-2">
                    {ingredient.name}
                    {ingredient.role === 'acid' && (
                      <span className="ml-2 rounded-full bg-info-soft px-2 text-sm font-bold text-info">
                        acid: never less
                      </span>
                    )}
                  </td>
                </tr>
              ))}
            </tbody>
          </table>
          {scaled.cautions.map((caution) => (
            <Notice key={caution} tone="soon">
              {caution}
            </Notice>
          ))}
        </>
      )}
      <Cautions cautions={plan.cautions} />
      {plan.allowed ? (
        <Notice
          tone="action"
          title={`${units.jarSize(jarSize)} jars: ${minutesWords(plan.minutes!)}${plan.pressurePsi !== null ? ` at ${units.pressure(plan.pressurePsi)}` : ''} at ${units.altitude(altitudeFt)}`}
        >
          {valid && (
            <Link
              to={paths.newBatch(hid, { productId: recipe.productId, recipeId: recipe.id, jars, jarSize })}
              className="font-bold text-action underline"
            >
              Record this batch
            </Link>
          )}
        </Notice>
      ) : (
        <Notice tone="past" title="Not allowed" role="alert">
          {plan.reasons.join(' ')}
        </Notice>
      )}
    </section>
  );
}
