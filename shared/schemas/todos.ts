import { z } from 'zod';
import { TODO_FILTERS } from '../choices';
import { LIMITS, limitWords } from './limits';
import {
  JAR_SIZES,
  type IngredientRole,
  type IngredientUnit,
  type JarSize,
  type Method,
  type Mouth,
  type ProcessingPlan,
  type RestockReason,
  type ScaledRecipe,
} from '../domain';

export const TODO_KINDS = ['plain', 'restock'] as const;
export type TodoKind = (typeof TODO_KINDS)[number];

export { TODO_FILTERS, type TodoFilter } from '../choices';

// A real calendar date (2026-02-30 is refused).
const isoDate = z.iso.date({ error: 'Use a real date such as 2026-09-14.' });
const title = z
  .string()
  .trim()
  .min(1, 'Give the to-do a title.')
  .max(LIMITS.length.todoTitle, `Keep the title under ${LIMITS.length.todoTitle} characters.`);
const notes = z
  .string()
  .max(LIMITS.length.todoNotes, `Keep the notes under ${limitWords(LIMITS.length.todoNotes)} characters.`);
const assignee = z.uuid({ error: 'Choose a member of the household.' }).nullable();

export const todoListQuery = z.object({
  filter: z.enum(TODO_FILTERS, { error: 'Filter by open, mine, done or all.' }).default('all'),
});

export const todoCreate = z
  .object({ title, notes: notes.optional(), dueOn: isoDate.nullable().optional(), assigneeId: assignee.optional() })
  .strict();
export type TodoCreate = z.infer<typeof todoCreate>;

export const todoPatch = z
  .object({
    title: title.optional(),
    notes: notes.optional(),
    dueOn: isoDate.nullable().optional(),
    assigneeId: assignee.optional(),
    done: z.boolean({ error: 'Done is true or false.' }).optional(),
    position: z
      .number()
      .int('A position is a whole number.')
      .min(0, 'A position starts at 0.')
      .max(LIMITS.todoPosition)
      .optional(),
  })
  .strict()
  .refine((patch) => Object.keys(patch).length > 0, 'Send at least one field to change.');
export type TodoPatch = z.infer<typeof todoPatch>;

export const restockTodoCreate = z
  .object({
    jars: z
      .number()
      .int('Use a whole number of jars.')
      .min(1, 'Make at least 1 jar.')
      .max(LIMITS.jarsPerBatch, `Plan at most ${LIMITS.jarsPerBatch} jars at a time.`)
      .optional(),
    jarSize: z.enum(JAR_SIZES, { error: 'Choose a jar size.' }).optional(),
  })
  .strict();
export type RestockTodoCreate = z.infer<typeof restockTodoCreate>;

export interface ShoppingItem {
  name: string;
  role: IngredientRole;
  amount: number;
  unit: IngredientUnit;
  /** The same amount in the household's units, as the text writes it (older plans have none until read again). */
  shown?: { amount: number; unit: IngredientUnit };
  /** Written the way a cook measures it, in the household's units, e.g. "2 1/4 cups" or "530 mL". */
  text: string;
}

/** What a restock to-do carries: everything needed to make the batch. */
export interface BatchPlan {
  productId: string;
  productName: string;
  recipeId: string;
  recipeName: string;
  recipeSource: string;
  reason: RestockReason | null;
  jars: number;
  jarSize: JarSize;
  method: Method;
  altitudeFt: number;
  headspaceInches: number;
  scaled: ScaledRecipe;
  processing: ProcessingPlan;
  equipment: {
    jars: number;
    newLids: number;
    /** The canner the loads are counted in (older plans have none: the recipe's method). */
    cannerMethod?: Method;
    cannerCapacityJars: number;
    cannerLoads: number[];
  };
  shopping: { produce: ShoppingItem[]; pantry: ShoppingItem[] };
  targetOn: string;
  targetWhy: string;
  plannedOn: string;
  /** Filled in on every read: what differs from the plan as first made (altitude, canner, recipe), in words. */
  changes?: string[];
  /** Filled in on every read: the empty jars and new lids in stock now, and what to buy beyond them. */
  stock?: BatchPlanStock;
}

export interface BatchPlanStock {
  mouth: Mouth;
  emptyJars: number;
  lids: number;
  buyJars: number;
  buyLids: number;
  /** "You have 6 empty pint jars and no regular-mouth lids: buy 4 jars and 10 regular-mouth lids." */
  words: string;
  /** The to-do the plan offers to add ("Buy 10 regular-mouth lids and 4 pint jars"), or null with nothing to buy. */
  todoTitle: string | null;
}

export interface TodoView {
  id: string;
  title: string;
  notes: string;
  dueOn: string | null;
  assigneeId: string | null;
  assigneeName: string | null;
  done: boolean;
  doneAt: string | null;
  position: number;
  kind: TodoKind;
  productId: string | null;
  batchPlan: BatchPlan | null;
  createdBy: string | null;
}
