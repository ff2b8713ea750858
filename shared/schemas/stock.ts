import { z } from 'zod';
import { JAR_SIZES, MOUTHS, type JarSize, type Mouth, type StockItem } from '../domain';
import type { StockReason } from '../words/stock';
import { LIMITS, limitWords } from './limits';

const stockCount = z
  .number({ error: 'Enter how many there are.' })
  .int('Use a whole number.')
  .min(0, 'Use 0 or more.')
  .max(LIMITS.stockCount, `Use at most ${limitWords(LIMITS.stockCount)}.`);
const note = z
  .string()
  .max(LIMITS.length.stockNote, `Use at most ${limitWords(LIMITS.length.stockNote)} characters.`)
  .default('');

/** A count set by hand, after counting the cupboard (jars break, lids are bought). */
export const stockCorrection = z.discriminatedUnion(
  'item',
  [
    z
      .object({
        item: z.literal('jar'),
        size: z.enum(JAR_SIZES, { error: 'Choose a jar size.' }),
        count: stockCount,
        note,
      })
      .strict(),
    z
      .object({
        item: z.literal('lid'),
        size: z.enum(MOUTHS, { error: 'Choose regular or wide mouth.' }),
        count: stockCount,
        note,
      })
      .strict(),
  ],
  { error: 'Say whether this is a count of empty jars or of new lids.' },
);
export type StockCorrection = z.input<typeof stockCorrection>;

/** Finishing or discarding a jar; a discard says whether the empty jar was kept (it is, unless said otherwise). */
export const jarActionBody = z
  .object({ kept: z.boolean({ error: 'Say whether the empty jar was kept.' }).optional() })
  .strict();

export interface StockChangeView {
  id: string;
  at: string;
  item: StockItem;
  size: JarSize | Mouth;
  reason: StockReason;
  delta: number;
  countAfter: number;
  /** Jars or lids used beyond what was in stock (the count stopped at 0). */
  short: number;
  note: string;
  who: string | null;
  batchId: string | null;
}

export interface JarStockView {
  jars: { size: JarSize; count: number }[];
  lids: { mouth: Mouth; count: number }[];
  /** Newest first, the latest changes only. */
  history: StockChangeView[];
}
