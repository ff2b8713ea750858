import { z } from 'zod';
import { DEFAULT_VARIETY_DAYS } from '../domain';
import { SLOTS, type Slot } from './week';

const isoDate = z.iso.date({ error: 'Use a date written YYYY-MM-DD.' });
const id = z.uuid({ error: 'That id is not valid.' });
const slot = z.enum(SLOTS, { error: 'Choose breakfast, lunch, dinner or snack.' });
const slotChoice = z.object({ date: isoDate, slot, mealId: id }).strict();

/** What to fill: every open slot of the week, one day's, or one kind of slot (the lunches). */
export const proposalScope = z.discriminatedUnion(
  'kind',
  [
    z.object({ kind: z.literal('week') }).strict(),
    z.object({ kind: z.literal('day'), date: isoDate }).strict(),
    z.object({ kind: z.literal('slot'), slot }).strict(),
  ],
  { error: 'Ask for the week, a day or one kind of slot.' },
);
export type ProposalScope = z.infer<typeof proposalScope>;

export const proposalRequest = z
  .object({
    start: isoDate,
    scope: proposalScope,
    varietyDays: z
      .number({ error: 'Variety is a number of days.' })
      .int('Use whole days.')
      .min(1, 'Variety is at least 1 day.')
      .max(14, 'Variety is at most 14 days.')
      .default(DEFAULT_VARIETY_DAYS),
    /** proposed meals the cook keeps while asking again or swapping one */
    keep: z.array(slotChoice).max(28, 'Keep at most 28 meals.').default([]),
    /** meals the cook turned down in a slot */
    avoid: z.array(slotChoice).max(200, 'Turn down at most 200 meals at once.').default([]),
  })
  .strict();
export type ProposalRequest = z.input<typeof proposalRequest>;

export const proposalAccept = z
  .object({
    entries: z
      .array(
        z
          .object({
            date: isoDate,
            slot,
            mealId: id,
            servings: z
              .number()
              .int('Use whole servings.')
              .min(1, 'Plan at least 1 serving.')
              .max(100, 'Plan at most 100 servings.'),
            eaters: z.array(id).max(50).nullable(),
          })
          .strict(),
      )
      .min(1, 'Choose at least one proposed meal.')
      .max(28, 'Accept at most 28 meals at once.'),
  })
  .strict();
export type ProposalAccept = z.input<typeof proposalAccept>;

export const proposalUndo = z
  .object({
    entryIds: z.array(id).min(1, 'Name the planned meals to take back.').max(28, 'Take back at most 28 meals at once.'),
  })
  .strict();

export const wasteQuery = z.object({ start: isoDate });

/** The week's waste as planned: the board's before-and-after figure. */
export interface WasteFigure {
  tbspPastUseBy: number;
  sealedJarsPastBest: number;
}

export interface ProposedJar {
  jarId: string;
  code: string;
  tbsp: number;
  opens: boolean;
}

export interface ProposedMealView {
  date: string;
  slot: Slot;
  mealId: string;
  title: string;
  servings: number;
  eaters: string[] | null;
  pairings: { productId: string; name: string; tbspPerServing: number; jars: ProposedJar[] }[];
  /** plain words: why this meal, here */
  reason: string;
  /** the next best meals for the slot, best first */
  alternatives: { mealId: string; title: string }[];
}

export interface ProposalView {
  start: string;
  end: string;
  before: WasteFigure;
  after: WasteFigure;
  proposed: ProposedMealView[];
  /** open slots nothing suits without a flag, a repeat or an overdrawn jar */
  unfilled: { date: string; slot: Slot }[];
}
