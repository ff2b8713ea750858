import { z } from 'zod';
import type { WeekAllocation } from '../domain';
import { LIMITS, limitWords } from './limits';

import { DIET_TAGS, SLOTS, type DietTag, type Slot } from '../choices';

export { DIET_LABELS, DIET_TAGS, SLOTS, type DietTag, type Slot } from '../choices';
export { dayOfWeek, weekDates, weekStartOf } from '../domain';

const isoDate = z.iso.date({ error: 'Use a date written YYYY-MM-DD.' });
const id = z.uuid({ error: 'That id is not valid.' });
const slot = z.enum(SLOTS, { error: 'Choose breakfast, lunch, dinner or snack.' });
const servings = z
  .number({ error: 'Servings must be a number.' })
  .int('Use whole servings.')
  .min(1, 'Plan at least 1 serving.')
  .max(LIMITS.servings, `Plan at most ${LIMITS.servings} servings.`);
const tbspPerServing = z
  .number({ error: 'The portion must be a number of tablespoons.' })
  .positive('A portion is more than 0 tablespoons.')
  .max(LIMITS.tbspPerServing, `A portion is at most ${LIMITS.tbspPerServing} tablespoons (a quart) per serving.`);
const title = z
  .string({ error: 'Name the meal.' })
  .trim()
  .min(1, 'Name the meal.')
  .max(LIMITS.length.mealName, `Use at most ${LIMITS.length.mealName} characters.`);
const position = z
  .number()
  .int('Positions are whole numbers.')
  .min(0, 'Positions start at 0.')
  .max(LIMITS.planPosition);

export const mealProductInput = z.object({ productId: id, tbspPerServing }).strict();

export const mealBody = z
  .object({
    name: title,
    tags: z
      .array(
        z.string().trim().min(1).max(LIMITS.length.mealTag, `A tag is at most ${LIMITS.length.mealTag} characters.`),
      )
      .max(LIMITS.mealTags, `Use at most ${LIMITS.mealTags} tags.`)
      .default([]),
    usualServings: servings.default(2),
    notes: z
      .string()
      .max(LIMITS.length.notes, `Notes are at most ${limitWords(LIMITS.length.notes)} characters.`)
      .default(''),
    products: z.array(mealProductInput).max(12, 'Pair a meal with at most 12 products.').default([]),
  })
  .strict();
export type MealBody = z.input<typeof mealBody>;
export const mealPatch = mealBody.partial().strict();
export type MealPatch = z.input<typeof mealPatch>;

export const weekQuery = z.object({ start: isoDate.optional() });

export const planEntryCreate = z
  .object({
    date: isoDate,
    slot,
    /** where in the slot; the end when left out */
    position: position.optional(),
    mealId: id.optional(),
    title: title.optional(),
    servings: servings.optional(),
  })
  .strict()
  .refine((v) => v.mealId !== undefined || v.title !== undefined, {
    message: 'Choose a meal from the library or name one.',
    path: ['title'],
  });
export type PlanEntryCreate = z.input<typeof planEntryCreate>;

export const planEntryPatch = z
  .object({
    date: isoDate.optional(),
    slot: slot.optional(),
    position: position.optional(),
    servings: servings.optional(),
    title: title.optional(),
    /** user ids of the members who eat; null for everybody */
    eaters: z.array(id).max(50).nullable().optional(),
  })
  .strict();
export type PlanEntryPatch = z.input<typeof planEntryPatch>;

export const pairingCreate = z.object({ productId: id, tbspPerServing: tbspPerServing.optional() }).strict();
export type PairingCreate = z.input<typeof pairingCreate>;
export const pairingPatch = z.object({ tbspPerServing }).strict();

export const weekCopy = z
  .object({ from: isoDate, to: isoDate })
  .strict()
  .refine((v) => v.from !== v.to, { message: 'Copy to another week.', path: ['to'] });
export type WeekCopy = z.input<typeof weekCopy>;

export const preferencesPatch = z
  .object({
    heatTolerance: z
      .number({ error: 'Heat tolerance is a number from 0 to 5.' })
      .int()
      .min(0, 'Heat tolerance is 0 to 5.')
      .max(5, 'Heat tolerance is 0 to 5.')
      .optional(),
    dietTags: z
      .array(z.enum(DIET_TAGS, { error: 'Choose no-added-sugar or low-salt.' }))
      .max(DIET_TAGS.length)
      .optional(),
  })
  .strict();
export type PreferencesPatch = z.input<typeof preferencesPatch>;

export interface MealView {
  id: string;
  name: string;
  tags: string[];
  usualServings: number;
  notes: string;
  products: { productId: string; tbspPerServing: number }[];
}

/** Why a pairing does not suit someone who eats the meal. */
export interface EaterFlag {
  kind: 'heat' | 'diet';
  userId: string;
  /** a few words for the card */
  label: string;
  reason: string;
}

export interface PairingView {
  id: string;
  productId: string;
  tbspPerServing: number;
  flags: EaterFlag[];
}

export interface PlanEntryView {
  id: string;
  date: string;
  slot: Slot;
  position: number;
  title: string;
  mealId: string | null;
  servings: number;
  eaters: string[] | null;
  pairings: PairingView[];
}

export interface WeekDay {
  date: string;
  entries: PlanEntryView[];
}

/** A product as the board shows it: on the shelf rail when it has jars. */
export interface WeekProduct {
  id: string;
  name: string;
  kind: string;
  heat: number;
  colour: string;
  openedJars: number;
  sealedJars: number;
}

export interface WeekJar {
  id: string;
  code: string;
  productId: string;
  state: 'sealed' | 'opened';
  openedOn: string | null;
  bestBy: string;
  remainingTbsp: number;
  capacityTbsp: number;
}

export interface WeekMember {
  userId: string;
  name: string;
  heatTolerance: number;
  dietTags: DietTag[];
}

export interface WeekView {
  start: string;
  end: string;
  today: string;
  weekStartsOn: number;
  days: WeekDay[];
  /** allocateWeek over the household's current jars, limited to this week's dates */
  allocation: WeekAllocation;
  jars: Record<string, WeekJar>;
  products: WeekProduct[];
  members: WeekMember[];
}
