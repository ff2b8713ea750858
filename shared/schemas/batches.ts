import { z } from 'zod';
import { LIMITS, limitWords } from './limits';
import {
  JAR_SIZES,
  MOUTHS,
  PROCESSING_METHODS,
  type JarSize,
  type JarState,
  type Method,
  type Mouth,
  type ProcessingPlan,
} from '../domain';

// A real calendar date (2026-02-30 is refused), checked by zod's ISO date format.
export const isoDate = z.iso.date({ error: 'Enter a real date as YYYY-MM-DD.' });

export const SEAL_STATES = ['checked', 'to-check'] as const;
export type SealState = (typeof SEAL_STATES)[number];

export const batchCreate = z
  .object({
    productId: z.uuid({ error: 'Choose the product.' }),
    recipeId: z.uuid({ error: 'Choose the tested recipe you followed.' }),
    cannedOn: isoDate,
    jarSize: z.enum(JAR_SIZES, { error: 'Choose a jar size.' }),
    /** The jars' mouth, for their lids; without it, the size's usual mouth. */
    mouth: z.enum(MOUTHS, { error: 'Choose regular or wide mouth.' }).optional(),
    jarsFilled: z
      .number({ error: 'Enter how many jars you filled.' })
      .int('Use a whole number of jars.')
      .min(1, 'Fill at least 1 jar.')
      .max(LIMITS.jarsPerBatch, `Use at most ${LIMITS.jarsPerBatch} jars in one batch.`),
    jarsSealed: z
      .number({ error: 'Enter how many jars sealed.' })
      .int('Use a whole number of jars.')
      .min(0, 'Use 0 or more jars.')
      .max(LIMITS.jarsPerBatch, `Use at most ${LIMITS.jarsPerBatch} jars.`),
    method: z.enum(PROCESSING_METHODS, { error: 'Choose the canner you used.' }),
    headspaceInches: z.number().min(0).max(LIMITS.headspaceInches).optional(),
    notes: z
      .string()
      .max(LIMITS.length.notes, `Use at most ${limitWords(LIMITS.length.notes)} characters.`)
      .default(''),
    /** 'to-check': recorded right after processing, every jar's seal is checked once it has cooled. */
    seals: z
      .enum(SEAL_STATES, { error: 'Say whether the seals are checked already or still to check.' })
      .default('checked'),
    /** Where the jars go; left out, the product's usual place. null: no place. */
    placeId: z.uuid({ error: 'Choose a place from the list, or no place.' }).nullable().optional(),
  })
  .strict()
  .refine((batch) => batch.jarsSealed <= batch.jarsFilled, {
    path: ['jarsSealed'],
    message: 'More jars cannot seal than were filled.',
  });
export type BatchCreate = z.input<typeof batchCreate>;

/** Jars picked jar by jar, or a count (the batch's last jars by code). */
const jarPick = z.union([
  z.object({ jarIds: z.array(z.uuid({ error: 'A jar in the list was not found.' })).max(200) }).strict(),
  z
    .object({
      count: z
        .number({ error: 'Enter how many jars.' })
        .int('Use a whole number of jars.')
        .min(0, 'Use 0 or more jars.')
        .max(200),
    })
    .strict(),
]);

/** The seal check of a batch's jars to check: every jar not named sealed; those named go to the fridge or are reprocessed. */
export const sealCheckBody = z
  .object({
    fridge: jarPick.default({ count: 0 }),
    reprocess: jarPick.default({ count: 0 }),
  })
  .strict();
export type SealCheckInput = z.input<typeof sealCheckBody>;

export interface ProcessingView {
  id: string;
  number: number;
  processedAt: string;
  method: Method;
  altitudeFt: number;
  minutes: number | null;
  pressurePsi: number | null;
  jars: number;
  who: string | null;
}

/** A batch with jars still to check: from when, and until when a jar that did not seal may be reprocessed. */
export interface SealCheckView {
  batchId: string;
  productName: string;
  jarSize: JarSize;
  processingNumber: number;
  processedAt: string;
  checkFrom: string;
  /** null when reprocessing is no longer offered (past 24 hours, or already reprocessed). */
  reprocessUntil: string | null;
  jarIds: string[];
  /** The household's time zone, for the times above. */
  timeZone: string;
}

export interface SealCheckDone {
  sealed: number;
  toFridge: number;
  reprocessed: number;
  plan: ProcessingPlan | null;
  batch: BatchDetail;
  /** Said when the reprocess used more new lids than were in stock. */
  stockWarnings: string[];
}

export const planQuery = z.object({
  recipeId: z.uuid({ error: 'Choose a recipe.' }),
  jarSize: z.enum(JAR_SIZES, { error: 'Choose a jar size.' }),
  method: z.enum(PROCESSING_METHODS, { error: 'Choose a canner.' }),
});

export const jarStateQuery = z.object({
  state: z.union([z.enum(['sealed', 'opened', 'finished', 'discarded', 'given']), z.literal('all')]).optional(),
  productId: z.uuid().optional(),
  batchId: z.uuid().optional(),
  /** A place's id, or 'none' for jars with no place named. */
  placeId: z.union([z.uuid({ error: 'That place was not found.' }), z.literal('none')]).optional(),
});

export const JAR_ACTIONS = ['open', 'finish', 'discard'] as const;
export type JarAction = (typeof JAR_ACTIONS)[number];

export interface JarView {
  id: string;
  code: string;
  state: JarState;
  unsealed: boolean;
  bestBy: string;
  openedOn: string | null;
  useBy: string | null;
  finishedOn: string | null;
  discardedOn: string | null;
  /** The day the jar was given away, and to whom when the giver said. */
  givenOn: string | null;
  givenTo: string | null;
  capacityTbsp: number;
  remainingTbsp: number;
  batchId: string;
  cannedOn: string;
  jarSize: JarSize;
  batchNotes: string;
  productId: string;
  productName: string;
  productKind: string;
  productColour: string;
  /** Sealed past the household's best-quality months. */
  pastBestQuality: boolean;
  /** 'to-check' while the jar cools after processing. */
  seal: SealState;
  placeId: string | null;
  /** The place's name, null when none is named. */
  placeName: string | null;
}

export interface BatchView {
  id: string;
  productId: string;
  productName: string;
  recipeId: string | null;
  recipeName: string | null;
  cannedOn: string;
  jarSize: JarSize;
  /** The jars' mouth: the one recorded, else the size's usual one. */
  mouth: Mouth;
  jarsFilled: number;
  jarsSealed: number;
  method: Method;
  altitudeFt: number;
  minutes: number | null;
  pressurePsi: number | null;
  headspaceInches: number | null;
  notes: string;
  hasPhoto: boolean;
  jarCounts: Record<JarState, number>;
}

export interface JarEventView {
  id: string;
  kind: string;
  happenedOn: string;
  jarCode: string;
  /** A gift's recipient, when the giver named one. */
  givenTo: string | null;
  who: string | null;
  /** For a move: the place names it moved between. */
  placeMove?: { from: string | null; to: string | null } | null;
}

export interface BatchDetail extends BatchView {
  jars: JarView[];
  history: JarEventView[];
  processings: ProcessingView[];
  /** The household's time zone, for the processing times. */
  timeZone: string;
  /** The jars still to check, when there are any. */
  sealCheck: SealCheckView | null;
}

export interface BatchCreated {
  batch: BatchView;
  jars: JarView[];
  plan: ProcessingPlan;
  /** Said when the batch used more jars or lids than were in stock (the counts stop at 0). */
  stockWarnings: string[];
}

/** Before a jar is opened: jars of the same product that should be used first (the choice stays the person's). */
export interface OpeningAdvice {
  /** Already open in the fridge, soonest use-by first. */
  openedJars: JarView[];
  /** Sealed and older than the jar about to be opened, oldest first. */
  olderSealed: JarView[];
}

export interface JarByCode {
  householdId: string;
  householdName: string;
  role: import('../roles').Role;
  jar: JarView;
  /** The jar's latest change, which a put-back reverses. */
  lastChange: JarChange | null;
}

/** How long a helper may undo their own open, finish or discard; cooks and keepers may put a jar back any time. */
export const JAR_UNDO_MINUTES = 10;

/**
 * Giving a jar away: to whom is optional, one line of plain text. Control characters and the invisible marks that
 * turn text around (which could make a history line read as something else) are refused; blank means nobody named.
 */
/** Whom a jar went to, as every door takes it (the give form, the CSV import): trimmed, bounded, plain. */
export const giftRecipientText = z
  .string({ error: 'Write whom the jar went to, or leave it empty.' })
  .trim()
  .max(LIMITS.length.giftRecipient, `Use at most ${LIMITS.length.giftRecipient} characters for the name.`)
  .refine(
    // eslint-disable-next-line no-control-regex
    (value) => !/[\u0000-\u001f\u007f-\u009f\u200e\u200f\u202a-\u202e\u2066-\u2069]/.test(value),
    'Write the name on one line, in plain letters, without special characters.',
  );

export const jarGiveBody = z.object({
  to: giftRecipientText
    .optional()
    .nullable()
    .transform((value) => (value ? value : null)),
});
export type JarGive = z.input<typeof jarGiveBody>;

/** Jars given away in the household's calendar year, all together and by product (most given first). */
export interface GiftsThisYear {
  year: number;
  jars: number;
  byProduct: { productId: string; productName: string; jars: number }[];
}

export const jarUndoBody = z.object({ eventId: z.uuid({ error: 'Say which change to undo.' }) });

/** What an open, finish, discard or undo answers: the jar now, and the event it wrote (to undo it). */
export interface JarActed {
  jar: JarView;
  eventId: string;
}

export interface JarChange {
  eventId: string;
  kind: string;
  happenedOn: string;
  at: string;
  who: string | null;
  byUserId: string | null;
}

/** One row of a batch import, as the preview shows it. */
export interface ImportRow {
  row: number;
  productName: string;
  recipeName: string | null;
  cannedOn: string;
  jarSize: JarSize;
  jarsFilled: number;
  jarsSealed: number;
  method: Method;
  minutes: number | null;
}

export interface ImportProblem {
  row: number;
  field: string;
  message: string;
}

export const importBody = z.object({
  csv: z
    .string({ error: 'Choose a CSV file.' })
    .min(1, 'The file is empty.')
    .max(500_000, 'Use a file of at most 500 kB.'),
  commit: z.boolean().default(false),
});
