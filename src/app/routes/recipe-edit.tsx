import { useParams, useSearchParams } from 'react-router-dom';
import { Notice } from '@/components/ui/notice';
import { Card, PageHeader } from '@/components/ui/page';
import { useCurrentHousehold } from '@/features/households/use-current-household';
import { useProducts } from '@/features/shelf/api/get-products';
import { useRecipe } from '@/features/shelf/api/get-recipes';
import { can } from '@shared/roles';
import { FirstProduct } from '@/features/shelf/components/first-product';
import { RecipeForm } from '@/features/shelf/components/recipe-form';

export function RecipeEditRoute() {
  const { hid, role } = useCurrentHousehold();
  const { recipeId } = useParams();
  const [params] = useSearchParams();
  const products = useProducts(hid);
  const recipe = useRecipe(hid, recipeId ?? '');
  const editing = recipeId !== undefined;
  const ready = products.data && (!editing || recipe.data);
  return (
    <>
      <PageHeader
        title={editing ? 'Edit the recipe' : 'New recipe'}
        lead="Enter a tested recipe as its source gives it: times, headspace and acid exactly as written."
      />
      {(products.error ?? (editing ? recipe.error : null)) && (
        <Notice tone="past" role="alert">
          {(products.error ?? recipe.error)?.message}
        </Notice>
      )}
      {ready && products.data!.length === 0 && (
        <FirstProduct
          hid={hid}
          why="A recipe is how a product is made, so the product comes first."
          canCook={can(role, 'cook')}
        />
      )}
      {ready && products.data!.length > 0 && (
        <Card>
          <RecipeForm
            hid={hid}
            products={products.data!}
            recipe={editing ? recipe.data : undefined}
            productId={params.get('productId') ?? undefined}
          />
        </Card>
      )}
    </>
  );
}
