import { useParams } from 'react-router-dom';
import { Notice } from '@/components/ui/notice';
import { Card, PageHeader } from '@/components/ui/page';
import { useCurrentHousehold } from '@/features/households/use-current-household';
import { useProducts } from '@/features/shelf/api/get-products';
import { ProductForm } from '@/features/shelf/components/product-form';

export function ProductEditRoute() {
  const { hid } = useCurrentHousehold();
  const { productId } = useParams();
  const products = useProducts(hid);
  const product = products.data?.find((p) => p.id === productId);
  const editing = productId !== undefined;
  return (
    <>
      <PageHeader
        title={editing ? (product?.name ?? 'Product') : 'New product'}
        lead="A preserve the household keeps: what it is, how hot, and how long an opened jar keeps."
      />
      {products.error && (
        <Notice tone="past" role="alert">
          {products.error.message}
        </Notice>
      )}
      {products.data && editing && !product && <Notice tone="past">That product was not found.</Notice>}
      {products.data && (!editing || product) && (
        <Card>
          <ProductForm key={product?.id ?? 'new'} hid={hid} product={product} />
        </Card>
      )}
    </>
  );
}
