import { Link } from 'react-router-dom';
import { can } from '@shared/roles';
import { METHOD_NAMES } from '@shared/words';
import { Notice } from '@/components/ui/notice';
import { EmptyState, PageHeader } from '@/components/ui/page';
import { useCurrentHousehold } from '@/features/households/use-current-household';
import { useRecipes } from '@/features/shelf/api/get-recipes';
import { paths } from '@shared/paths';
import { useUnits } from '@/lib/units';

export function RecipesRoute() {
  const units = useUnits();
  const { hid, role } = useCurrentHousehold();
  const recipes = useRecipes(hid);
  const canCook = can(role, 'cook');
  return (
    <>
      <PageHeader
        title="Recipes"
        lead="Tested recipes, scaled to the jars you want without weakening their acid."
        actions={
          canCook && (
            <Link
              to={paths.newRecipe(hid)}
              className="inline-flex min-h-11 items-center rounded-lg bg-action px-4 font-bold text-white hover:bg-action-strong"
            >
              New recipe
            </Link>
          )
        }
      />
      {recipes.error && (
        <Notice tone="past" role="alert">
          {recipes.error.message}
        </Notice>
      )}
      {recipes.isPending ? (
        <p className="text-ink-muted">Opening the recipe box…</p>
      ) : recipes.data?.length === 0 ? (
        <EmptyState title="No recipes yet">Add a tested recipe to scale it and plan batches from it.</EmptyState>
      ) : (
        <ul className="grid gap-3 sm:grid-cols-2">
          {recipes.data?.map((recipe) => (
            <li key={recipe.id}>
              <Link
                to={paths.recipe(hid, recipe.id)}
                className="flex h-full flex-col gap-1 rounded-card border border-line bg-surface p-4 hover:bg-sunken/60"
              >
                <span className="text-lg font-bold">{recipe.name}</span>
                <span className="text-ink-muted">for {recipe.productName}</span>
                <span className="text-[0.95rem]">
                  Makes {recipe.yieldJars} {units.jarSize(recipe.yieldJarSize)} jars ·{' '}
                  {METHOD_NAMES[recipe.method].toLowerCase()}
                </span>
              </Link>
            </li>
          ))}
        </ul>
      )}
    </>
  );
}
