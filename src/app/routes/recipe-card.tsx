import { Link, useParams } from 'react-router-dom';
import { can } from '@shared/roles';
import { Notice } from '@/components/ui/notice';
import { PageHeader } from '@/components/ui/page';
import { useHousehold } from '@/features/households/api/get-household';
import { useCurrentHousehold } from '@/features/households/use-current-household';
import { useRecipe } from '@/features/shelf/api/get-recipes';
import { RecipeCard } from '@/features/shelf/components/recipe-card';
import { paths } from '@shared/paths';

export function RecipeCardRoute() {
  const { hid, role } = useCurrentHousehold();
  const { recipeId = '' } = useParams();
  const recipe = useRecipe(hid, recipeId);
  const household = useHousehold(hid);
  return (
    <>
      <PageHeader
        title={recipe.data?.name ?? 'Recipe'}
        lead={recipe.data ? `For ${recipe.data.productName}` : undefined}
        actions={
          can(role, 'cook') && recipe.data ? (
            <Link
              to={paths.editRecipe(hid, recipeId)}
              className="inline-flex min-h-11 items-center rounded-lg border border-line bg-surface px-4 font-bold hover:bg-sunken"
            >
              Edit
            </Link>
          ) : undefined
        }
      />
      {recipe.error && (
        <Notice tone="past" role="alert">
          {recipe.error.message}
        </Notice>
      )}
      {recipe.data && household.data && (
        <RecipeCard hid={hid} recipe={recipe.data} altitudeFt={household.data.altitudeFt} />
      )}
    </>
  );
}
