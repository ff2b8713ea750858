import { EmptyState, PageHeader } from '@/components/ui/page';

export function ShelfRoute() {
  return (
    <>
      <PageHeader title="Shelf" lead="Every sealed jar, by product and batch, oldest first." />
      <EmptyState title="The shelf is empty">Record a batch and its sealed jars line up here.</EmptyState>
    </>
  );
}
