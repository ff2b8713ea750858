import { EmptyState, PageHeader } from '@/components/ui/page';

export function RestockRoute() {
  return (
    <>
      <PageHeader title="Restock" lead="Favourites running low, and the batch that would carry you to the next harvest." />
      <EmptyState title="Nothing is running low">Mark your favourites and set a minimum; Larderly watches the count for you.</EmptyState>
    </>
  );
}
