import { EmptyState, PageHeader } from '@/components/ui/page';

export function WeekRoute() {
  return (
    <>
      <PageHeader title="Week" lead="Plan the household's meals and pair them with jars from the shelf." />
      <EmptyState title="The week is open">Meals you plan show up here, each paired with the jar it draws from.</EmptyState>
    </>
  );
}
