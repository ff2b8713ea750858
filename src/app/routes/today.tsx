import { EmptyState, PageHeader } from '@/components/ui/page';

export function TodayRoute() {
  return (
    <>
      <PageHeader title="Today" lead="What to open and use today, the fridge countdowns, restock suggestions and your to-dos." />
      <EmptyState title="Nothing needs you today">Once jars are on the shelf and meals are on the week, this is where the day starts.</EmptyState>
    </>
  );
}
