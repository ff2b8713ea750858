import { EmptyState, PageHeader } from '@/components/ui/page';

export function BatchesRoute() {
  return (
    <>
      <PageHeader title="Batches" lead="Each canning session: what went in the jars, how it was processed, how many sealed." />
      <EmptyState title="No batches yet">Your first batch will show its processing plan for your altitude here.</EmptyState>
    </>
  );
}
