import { z } from 'zod';
import {
  INGREDIENT_ROLES,
  INGREDIENT_UNITS,
  JAR_SIZES,
  JAR_STATES,
  MOUTHS,
  PROCESSING_METHODS,
  PRODUCT_KINDS,
  RESTOCK_REASONS,
} from '../domain';
import { householdName } from './auth';
import { mealTimesBody } from './calendar';
import { canner, UNIT_SYSTEMS } from './households';
import { ingredientInput } from './recipes';
import { PRODUCT_COLOURS } from '../words';
import { SLOTS } from './week';
import { LIMITS } from './limits';

const N = LIMITS.length;

/** A household's backup file: its shelf, week and to-dos, never people, sessions, keys or tokens. */
export const BACKUP_FORMAT = 'larderly-household-backup';
export const BACKUP_VERSION = 1;
export { BACKUP_MAX_BYTES } from '../choices';

const id = z.uuid({ error: 'An id in the file is not valid.' });
const date = z.iso.date({ error: 'A date in the file is not written YYYY-MM-DD.' });
const int = (min: number, max: number) => z.number().int().min(min).max(max);
const text = (max: number) => z.string().max(max);
const tbsp = z.number().min(0).max(100_000);
const list = <T extends z.ZodType>(item: T, max: number) =>
  z.array(item).max(max, `The file has more than ${max.toLocaleString('en-US')} of these.`);

// Added with shelf places; older files have none, and their jars come back with no place.
const place = z.object({ id, name: text(N.placeName).trim().min(1) });
const placeRef = id.nullable().default(null);

const product = z.object({
  id,
  name: text(N.productName).min(1),
  kind: z.enum(PRODUCT_KINDS),
  heat: int(0, LIMITS.heat),
  favourite: z.boolean(),
  minJars: int(0, LIMITS.minJars),
  useWithinDays: int(1, LIMITS.useWithinDays).nullable(),
  harvestMonths: z.array(int(1, 12)).max(12),
  jarSize: z.enum(JAR_SIZES),
  colour: z.enum(PRODUCT_COLOURS),
  notes: text(N.notes),
  defaultPlaceId: placeRef,
});

const recipe = z.object({
  id,
  productId: id,
  name: text(N.recipeName).min(1),
  yieldJars: int(1, LIMITS.recipeYieldJars),
  yieldJarSize: z.enum(JAR_SIZES),
  ingredients: z.array(ingredientInput).max(LIMITS.ingredientsPerRecipe),
  acidPercent: z.number().min(0).max(100).nullable(),
  ph: z.number().min(0).max(14).nullable(),
  acidified: z.boolean(),
  method: z.enum(PROCESSING_METHODS),
  baseMinutes: z.partialRecord(z.enum(JAR_SIZES), int(0, LIMITS.processingMinutes)),
  altitudeTable: z
    .array(z.object({ upToFt: int(0, LIMITS.altitudeFt.max), addMinutes: int(0, LIMITS.processingMinutes) }))
    .max(LIMITS.altitudeRows)
    .nullable(),
  headspaceInches: z.number().min(0).max(LIMITS.headspaceInches),
  steps: text(N.steps),
  source: text(N.source),
});

const batch = z.object({
  id,
  productId: id,
  recipeId: id.nullable(),
  cannedOn: date,
  jarSize: z.enum(JAR_SIZES),
  /** Added with the jar and lid stock; older backups have none (the size's usual mouth). */
  mouth: z.enum(MOUTHS).nullable().default(null),
  jarsFilled: int(1, LIMITS.jarsPerBatch),
  jarsSealed: int(0, LIMITS.jarsPerBatch),
  method: z.enum(PROCESSING_METHODS),
  altitudeFt: int(LIMITS.altitudeFt.min, LIMITS.altitudeFt.max),
  minutes: int(0, LIMITS.batchMinutes).nullable(),
  pressurePsi: int(0, LIMITS.pressurePsi).nullable(),
  headspaceInches: z.number().min(0).max(LIMITS.headspaceInches).nullable(),
  notes: text(N.notes),
});

const jar = z.object({
  id,
  batchId: id,
  productId: id,
  state: z.enum(JAR_STATES),
  capacityTbsp: tbsp,
  remainingTbsp: tbsp,
  unsealed: z.boolean(),
  bestBy: date,
  openedOn: date.nullable(),
  useBy: date.nullable(),
  finishedOn: date.nullable(),
  discardedOn: date.nullable(),
  // Older files carry no gifts; their jars were not given.
  givenOn: date.nullable().optional(),
  givenTo: text(N.giftRecipient).nullable().optional(),
  // Older files carry no label codes; the import then gives fresh ones.
  code: z
    .string()
    .regex(/^[0-9A-HJKMNP-TV-Z]{6}$/, 'A label code is 6 letters and digits.')
    .optional(),
  placeId: placeRef,
});

const jarEvent = z.object({
  id,
  jarId: id,
  batchId: id,
  kind: z.enum([
    'filled',
    'unsealed',
    'opened',
    'finished',
    'discarded',
    'given',
    'restored',
    'seal-checked',
    'reprocessed',
    'moved',
  ]),
  happenedOn: date,
  // Older files carry no gifts.
  givenTo: text(N.giftRecipient).nullable().optional(),
  placeMove: z
    .object({ from: text(N.placeName).nullable(), to: text(N.placeName).nullable() })
    .strict()
    .nullable()
    .default(null),
});

const meal = z.object({
  id,
  name: text(N.mealName).min(1),
  tags: z.array(text(N.mealTag)).max(LIMITS.mealTags),
  usualServings: int(1, LIMITS.servings),
  notes: text(N.notes),
});
const mealProduct = z.object({
  id,
  mealId: id,
  productId: id,
  tbspPerServing: z.number().positive().max(LIMITS.tbspPerServing),
});
const planEntry = z.object({
  id,
  date,
  slot: z.enum(SLOTS),
  position: int(0, LIMITS.planPosition),
  title: text(N.mealName).min(1),
  mealId: id.nullable(),
  servings: int(1, LIMITS.servings),
});
const pairing = z.object({
  id,
  planEntryId: id,
  productId: id,
  tbspPerServing: z.number().positive().max(LIMITS.tbspPerServing),
});
const words = (max: number, items = 50) => z.array(text(max)).max(items);
const shoppingItem = z.object({
  name: text(N.ingredientName),
  role: z.enum(INGREDIENT_ROLES),
  amount: z
    .number()
    .min(0)
    .max(LIMITS.ingredientAmount * 100),
  unit: z.enum(INGREDIENT_UNITS),
  shown: z.object({ amount: z.number().min(0), unit: z.enum(INGREDIENT_UNITS) }).optional(),
  text: text(200),
});
/** A restock to-do's batch plan, every field as the server writes it: the to-do page draws each of them. */
const batchPlan = z.object({
  productId: id,
  productName: text(N.productName),
  recipeId: id,
  recipeName: text(N.recipeName),
  recipeSource: text(N.source),
  reason: z.enum(RESTOCK_REASONS).nullable(),
  jars: int(1, LIMITS.jarsPerBatch),
  jarSize: z.enum(JAR_SIZES),
  method: z.enum(PROCESSING_METHODS),
  altitudeFt: int(LIMITS.altitudeFt.min, LIMITS.altitudeFt.max),
  headspaceInches: z.number().min(0).max(LIMITS.headspaceInches),
  scaled: z.object({
    factor: z.number().positive().max(1000),
    acidFactor: z.number().positive().max(1000),
    ingredients: z
      .array(
        z.object({
          name: text(N.ingredientName),
          amount: z.number().min(0),
          exactAmount: z.number().min(0),
          unit: z.enum(INGREDIENT_UNITS),
          role: z.enum(INGREDIENT_ROLES),
        }),
      )
      .max(LIMITS.ingredientsPerRecipe),
    cautions: words(500),
  }),
  processing: z.object({
    allowed: z.boolean(),
    minutes: int(0, LIMITS.batchMinutes).nullable(),
    pressurePsi: int(0, LIMITS.pressurePsi).nullable(),
    reasons: words(1000),
    cautions: words(1000),
    afterProcessing: words(1000),
    altitudeAddMinutes: int(0, LIMITS.processingMinutes).nullable(),
  }),
  equipment: z.object({
    jars: int(1, LIMITS.jarsPerBatch),
    newLids: int(0, LIMITS.jarsPerBatch),
    cannerMethod: z.enum(PROCESSING_METHODS).optional(),
    cannerCapacityJars: int(1, LIMITS.cannerCapacityJars),
    cannerLoads: z.array(int(0, LIMITS.cannerCapacityJars)).max(LIMITS.jarsPerBatch),
  }),
  shopping: z.object({
    produce: z.array(shoppingItem).max(LIMITS.ingredientsPerRecipe),
    pantry: z.array(shoppingItem).max(LIMITS.ingredientsPerRecipe),
  }),
  targetOn: date,
  targetWhy: text(1000),
  plannedOn: date,
  changes: words(1000).optional(),
});

/** A count of empty jars of one size or of new lids of one mouth; the history of changes stays behind, like who did what. */
const stockCount = z.discriminatedUnion('item', [
  z.object({ id, item: z.literal('jar'), size: z.enum(JAR_SIZES), count: int(0, LIMITS.stockCount) }),
  z.object({ id, item: z.literal('lid'), size: z.enum(MOUTHS), count: int(0, LIMITS.stockCount) }),
]);

const todo = z.object({
  id,
  title: text(N.todoTitle).min(1),
  notes: text(N.todoNotes),
  dueOn: date.nullable(),
  done: z.boolean(),
  doneAt: z.iso.datetime({ offset: true }).nullable(),
  position: int(0, LIMITS.todoPosition),
  kind: z.enum(['plain', 'restock']),
  productId: id.nullable(),
  // A restock to-do's batch plan as the server wrote it, checked field by field; its product and recipe ids are remapped.
  batchPlan: batchPlan.nullable(),
});

export const householdBackup = z
  .object({
    format: z.literal(BACKUP_FORMAT, { error: 'This is not a Larderly household backup.' }),
    version: z.literal(BACKUP_VERSION, {
      error: `This backup was written by another version of Larderly (this one reads version ${BACKUP_VERSION}).`,
    }),
    exportedAt: z.iso.datetime({ offset: true }),
    household: z.object({
      name: householdName,
      altitudeFt: int(LIMITS.altitudeFt.min, LIMITS.altitudeFt.max),
      unitSystem: z.enum(UNIT_SYSTEMS),
      timeZone: text(64),
      bestQualityMonths: int(1, LIMITS.bestQualityMonths),
      weekStartsOn: int(0, 6),
      /** Older backups have one capacity instead of a list of canners. */
      cannerCapacityJars: int(1, LIMITS.cannerCapacityJars).optional(),
      canners: z.array(canner).min(1).max(PROCESSING_METHODS.length).optional(),
      defaultMethod: z.enum(PROCESSING_METHODS),
      /** Added with the household calendar; older backups have none and get the default times. */
      mealTimes: mealTimesBody.optional(),
    }),
    places: list(place, LIMITS.places).default([]),
    products: list(product, 2_000),
    recipes: list(recipe, 2_000),
    batches: list(batch, 10_000),
    jars: list(jar, 50_000),
    jarEvents: list(jarEvent, 200_000),
    meals: list(meal, 2_000),
    mealProducts: list(mealProduct, 20_000),
    planEntries: list(planEntry, 20_000),
    pairings: list(pairing, 50_000),
    todos: list(todo, 5_000),
    /** Added with the jar and lid stock; older backups have none. */
    jarStock: list(stockCount, JAR_SIZES.length + MOUTHS.length)
      .refine((rows) => new Set(rows.map((row) => `${row.item} ${row.size}`)).size === rows.length, {
        error: 'The file counts the same jar size or lid mouth twice.',
      })
      .default([]),
  })
  .strict();

export type HouseholdBackup = z.infer<typeof householdBackup>;
export type BackupTable = Exclude<keyof HouseholdBackup, 'format' | 'version' | 'exportedAt' | 'household'>;

export interface ImportResult {
  household: { id: string; name: string };
  counts: Record<BackupTable, number>;
}
