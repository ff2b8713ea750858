import { EmptyState, PageHeader } from '@/components/ui/page';

export function FridgeRoute() {
  return (
    <>
      <PageHeader title="Fridge" lead="Opened jars, how long they have been open and when to finish them." />
      <EmptyState title="No jars are open">When someone opens a jar, its use-by countdown starts here.</EmptyState>
    </>
  );
}
