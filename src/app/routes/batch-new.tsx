import { Navigate } from 'react-router-dom';
import { can } from '@shared/roles';
import { Notice } from '@/components/ui/notice';
import { PageHeader } from '@/components/ui/page';
import { useHousehold } from '@/features/households/api/get-household';
import { AltitudeGate } from '@/features/households/components/altitude-gate';
import { useCurrentHousehold } from '@/features/households/use-current-household';
import { useProducts } from '@/features/shelf/api/get-products';
import { useRecipes } from '@/features/shelf/api/get-recipes';
import { FirstProduct } from '@/features/shelf/components/first-product';
import { NewBatchForm } from '@/features/shelf/components/new-batch-form';
import { paths } from '@shared/paths';

export function NewBatchRoute() {
  const { hid, role } = useCurrentHousehold();
  const household = useHousehold(hid);
  const products = useProducts(hid);
  const recipes = useRecipes(hid);
  if (role && !can(role, 'cook')) return <Navigate to={paths.batches(hid)} replace />;
  const failed = household.error ?? products.error ?? recipes.error;
  return (
    <>
      <PageHeader
        title="Record a batch"
        lead="Fill it in as the day goes: the processing plan follows your choices and your altitude."
      />
      {failed && (
        <Notice tone="past" role="alert">
          {failed.message}
        </Notice>
      )}
      {household.data && products.data && recipes.data ? (
        <AltitudeGate hid={hid}>
          {products.data.length === 0 ? (
            <FirstProduct
              hid={hid}
              why="A batch is a canning session of one product, made from its tested recipe."
              canCook
            />
          ) : (
            <NewBatchForm household={household.data} products={products.data} recipes={recipes.data} />
          )}
        </AltitudeGate>
      ) : (
        !failed && <p className="text-ink-muted">Getting the recipes…</p>
      )}
    </>
  );
}
