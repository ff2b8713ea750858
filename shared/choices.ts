// The fixed lists both sides offer (meal slots, diets, to-do filters) and the backup size limit, as plain values:
// the schemas in shared/schemas build their zod shapes from these, and the client imports them from here so no
// zod reaches the browser.

export const SLOTS = ['breakfast', 'lunch', 'dinner', 'snack'] as const;
export type Slot = (typeof SLOTS)[number];

/** Diets the planner can check against a recipe's ingredients. */
export const DIET_TAGS = ['no-added-sugar', 'low-salt'] as const;
export type DietTag = (typeof DIET_TAGS)[number];
export const DIET_LABELS: Record<DietTag, string> = { 'no-added-sugar': 'No added sugar', 'low-salt': 'Low salt' };

export const TODO_FILTERS = ['open', 'mine', 'done', 'all'] as const;
export type TodoFilter = (typeof TODO_FILTERS)[number];

/** The largest household backup file the import accepts. */
export const BACKUP_MAX_BYTES = 10 * 1024 * 1024;
