import { Link } from 'react-router-dom';
import { EmptyState } from '@/components/ui/page';
import { paths } from '@shared/paths';

/** Where a household with no product yet is sent from every screen that needs one: to make its first. */
export function FirstProduct({ hid, why, canCook }: { hid: string; why: string; canCook: boolean }) {
  return (
    <EmptyState
      title="Start with your first product"
      action={
        canCook ? (
          <Link
            to={paths.newProduct(hid)}
            className="inline-flex min-h-11 items-center rounded-lg bg-action px-4 font-bold text-white hover:bg-action-strong"
          >
            Add a product
          </Link>
        ) : undefined
      }
    >
      {why} A product is a preserve you keep, such as a relish or a jam
      {canCook ? '' : '; a cook or keeper of the household adds it'}.
    </EmptyState>
  );
}
