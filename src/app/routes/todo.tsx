import { EmptyState, PageHeader } from '@/components/ui/page';

export function TodoRoute() {
  return (
    <>
      <PageHeader title="To-do" lead="The household list, with batch plans for the next canning day." />
      <EmptyState title="The list is clear">Restock batches and everyday jobs land here for the whole household.</EmptyState>
    </>
  );
}
