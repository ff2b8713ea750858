/** Every screen of the household, in the order the navigation shows them. */
export const SCREENS = [
  { path: '', label: 'Today', icon: 'sun', primary: true },
  { path: 'week', label: 'Week', icon: 'grid', primary: true },
  { path: 'shelf', label: 'Shelf', icon: 'shelf', primary: true },
  { path: 'fridge', label: 'Fridge', icon: 'fridge', primary: true },
  { path: 'batches', label: 'Batches', icon: 'pot', primary: false },
  { path: 'recipes', label: 'Recipes', icon: 'card', primary: false },
  { path: 'restock', label: 'Restock', icon: 'jar-plus', primary: false },
  { path: 'todo', label: 'To-do', icon: 'check', primary: false },
  { path: 'household', label: 'Household', icon: 'home', primary: false },
] as const;

export type ScreenIcon = (typeof SCREENS)[number]['icon'] | 'more';
