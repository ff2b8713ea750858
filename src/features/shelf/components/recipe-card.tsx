import { JAR_SIZES } from '@shared/domain';
import type { RecipeView } from '@shared/schemas/recipes';
import { INGREDIENT_ROLE_NAMES, METHOD_NAMES, minutesWords } from '@shared/words';
import { CautionLine } from '@/components/ui/caution-line';
import { Card } from '@/components/ui/page';
import { AltitudeGate } from '@/features/households';
import { ScalingTool } from './scaling-tool';
import { useUnits } from '@/lib/units';

export function RecipeCard({ hid, recipe, altitudeFt }: { hid: string; recipe: RecipeView; altitudeFt: number }) {
  const units = useUnits();
  return (
    <div className="grid gap-5 lg:grid-cols-[3fr_2fr]">
      <Card className="flex flex-col gap-4">
        <dl className="grid grid-cols-[auto_1fr] gap-x-4 gap-y-1">
          <dt className="text-ink-muted">Makes</dt>
          <dd>
            {recipe.yieldJars} {units.jarSize(recipe.yieldJarSize)} jars
          </dd>
          <dt className="text-ink-muted">Canner</dt>
          <dd>{METHOD_NAMES[recipe.method]}</dd>
          <dt className="text-ink-muted">Acid</dt>
          <dd>
            {recipe.ph !== null ? `pH ${recipe.ph}` : recipe.acidified ? 'acid or acidified' : 'not known to be acid'}
            {recipe.acidPercent !== null ? `; vinegar or juice of ${recipe.acidPercent}% acidity` : ''}
          </dd>
          <dt className="text-ink-muted">Headspace</dt>
          <dd>{units.headspace(recipe.headspaceInches)}</dd>
          <dt className="text-ink-muted">Source</dt>
          <dd>{recipe.source || 'not given'}</dd>
        </dl>
        <div>
          <h2 className="text-xl">Tested minutes at 0–{units.altitude(1000)}</h2>
          <ul className="tabular flex flex-wrap gap-3">
            {JAR_SIZES.filter((size) => recipe.baseMinutes[size] !== undefined).map((size) => (
              <li key={size} className="rounded-lg bg-sunken px-3 py-1">
                {units.jarSize(size)}: <b>{minutesWords(recipe.baseMinutes[size]!)}</b>
              </li>
            ))}
          </ul>
          <CautionLine about="canning" />
        </div>
        <div>
          <h2 className="text-xl">Ingredients</h2>
          <table className="w-full text-left">
            <caption className="sr-only">Ingredients of the tested batch</caption>
            <tbody>
              {recipe.ingredients.map((ingredient, index) => (
                <tr key={`${ingredient.name}-${index}`} className="border-t border-line">
                  <td className="tabular py-2 pr-3 font-bold whitespace-nowrap">
                    {units.amount(ingredient.amount, ingredient.unit)}
                  </td>
                  <td className="py-2">{ingredient.name}</td>
                  <td className="py-2 text-sm text-ink-muted">{INGREDIENT_ROLE_NAMES[ingredient.role]}</td>
                </tr>
              ))}
            </tbody>
          </table>
        </div>
        {recipe.steps && (
          <div>
            <h2 className="text-xl">Method</h2>
            <p className="whitespace-pre-line">{recipe.steps}</p>
          </div>
        )}
      </Card>
      <Card>
        <AltitudeGate hid={hid}>
          <ScalingTool hid={hid} recipe={recipe} altitudeFt={altitudeFt} />
        </AltitudeGate>
      </Card>
    </div>
  );
}
