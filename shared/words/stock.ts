// The words of the jar and lid stock: mouth sizes, why a count changed, and a batch's shopping after stock.
import type { BatchShopping, Mouth, StockItem } from '../domain/jar-stock';
import type { JarSize } from '../domain/units';
import { count, JAR_SIZE_NAMES } from './units';

/** In a sentence, before "lid" or "jar": "wide-mouth lids". */
export const MOUTH_NAMES: Record<Mouth, string> = { regular: 'regular-mouth', wide: 'wide-mouth' };
/** On its own, as a choice. */
export const MOUTH_LABELS: Record<Mouth, string> = { regular: 'Regular mouth', wide: 'Wide mouth' };

export const STOCK_REASONS = ['record', 'finish', 'discard', 'reprocess', 'correction', 'undo'] as const;
export type StockReason = (typeof STOCK_REASONS)[number];

export const STOCK_REASON_NAMES: Record<StockReason, string> = {
  record: 'Batch recorded',
  finish: 'Jar finished',
  discard: 'Jar discarded',
  reprocess: 'Jars reprocessed',
  correction: 'Counted by hand',
  undo: 'Jar put back',
};

export const STOCK_WORDS = {
  title: 'Empty jars and lids',
  intro: 'What is in the cupboard for the next batch. Counts change as batches are recorded and jars are finished.',
  emptyJars: 'Empty jars',
  newLids: 'New lids',
  lidsHint: 'A flat lid seals once; bands and jars are used again (USDA Complete Guide to Home Canning, 2015).',
  history: 'Changes',
  noHistory: 'No changes yet.',
  correct: 'Save',
  otherSizes: 'Other jar sizes',
  correctNote: 'Why (optional)',
  kept: 'The empty jar goes back with the empty jars',
  keptHint: 'Untick it if the jar is broken, chipped or thrown out with the food.',
  shopLink: 'Jars and lids',
  addLidsTodo: 'Add to the to-do list',
} as const;

/** "pint jars", "wide-mouth lids". */
export function stockItemWords(item: StockItem, size: string, n = 2): string {
  if (item === 'jar')
    return n === 1 ? `${JAR_SIZE_NAMES[size as JarSize]} jar` : `${JAR_SIZE_NAMES[size as JarSize]} jars`;
  return n === 1 ? `${MOUTH_NAMES[size as Mouth]} lid` : `${MOUTH_NAMES[size as Mouth]} lids`;
}

/** "You have 6 empty pint jars and no wide-mouth lids: buy 4 jars and 10 wide-mouth lids." */
export function batchShoppingWords(jarSize: JarSize, mouth: Mouth, shop: BatchShopping): string {
  const jarName = JAR_SIZE_NAMES[jarSize];
  const lidName = MOUTH_NAMES[mouth];
  const have = `You have ${shop.emptyJars === 0 ? 'no' : shop.emptyJars} empty ${jarName} ${shop.emptyJars === 1 ? 'jar' : 'jars'} and ${shop.lids === 0 ? 'no' : shop.lids} new ${lidName} ${shop.lids === 1 ? 'lid' : 'lids'}`;
  const buy = [
    shop.buyJars > 0 ? count(shop.buyJars, 'jar') : null,
    shop.buyLids > 0 ? count(shop.buyLids, `${lidName} lid`) : null,
  ].filter(Boolean);
  return buy.length === 0 ? `${have}: enough for this batch.` : `${have}: buy ${buy.join(' and ')}.`;
}

/** The to-do a batch plan offers: "Buy 10 wide-mouth lids and 4 pint jars". */
export function batchShoppingTodo(jarSize: JarSize, mouth: Mouth, shop: BatchShopping): string | null {
  const buy = [
    shop.buyLids > 0 ? count(shop.buyLids, `${MOUTH_NAMES[mouth]} lid`) : null,
    shop.buyJars > 0 ? count(shop.buyJars, `${JAR_SIZE_NAMES[jarSize]} jar`) : null,
  ].filter(Boolean);
  return buy.length === 0 ? null : `Buy ${buy.join(' and ')}`;
}

/** Said when a batch or reprocess used more than the stock held: the count stops at zero rather than refusing. */
export function stockShortWords(item: StockItem, size: string, used: number, had: number): string {
  return `${used} ${stockItemWords(item, size, used)} used with ${had} in stock: the count is now 0. If the other ${used - had} were bought without being entered, all is well; otherwise correct the count on ${STOCK_WORDS.title}.`;
}
