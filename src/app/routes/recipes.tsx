import { EmptyState, PageHeader } from '@/components/ui/page';

export function RecipesRoute() {
  return (
    <>
      <PageHeader title="Recipes" lead="Tested recipes, scaled to the jars you want without weakening their acid." />
      <EmptyState title="No recipes yet">Add a tested recipe to scale it and plan batches from it.</EmptyState>
    </>
  );
}
