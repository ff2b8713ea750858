// Empty jars and new lids kept in stock: which lid a jar takes, and what a batch needs bought after what is in stock.
import type { JarSize } from './units';

/** Lids and bands come in two mouth sizes; a jar's mouth is a property of the jar. */
export const MOUTHS = ['regular', 'wide'] as const;
export type Mouth = (typeof MOUTHS)[number];

export const STOCK_ITEMS = ['jar', 'lid'] as const;
export type StockItem = (typeof STOCK_ITEMS)[number];

/**
 * The mouth assumed for each jar size until the household chooses (a jar's mouth is a property of the jar, so the
 * batch form lets the cook say). From memory of the common North American jar lines (e.g. Ball's): the 4-ounce jelly
 * jar is sold with a regular mouth, the pint-and-a-half and the half-gallon mostly with a wide one; the other sizes
 * come with either, and regular is the default as the more common (common practice).
 */
export const USUAL_MOUTH: Record<JarSize, Mouth> = {
  'quarter-pint': 'regular',
  'half-pint': 'regular',
  'twelve-ounce': 'regular',
  pint: 'regular',
  'pint-and-half': 'wide',
  quart: 'regular',
  'half-gallon': 'wide',
};

/** The mouth of a batch's jars: the one the cook chose, else the size's usual one. */
export function mouthFor(size: JarSize, chosen?: Mouth | null): Mouth {
  return chosen ?? USUAL_MOUTH[size];
}

export interface BatchShopping {
  /** Empty jars of the size in stock, and new lids of the mouth. */
  emptyJars: number;
  lids: number;
  buyJars: number;
  buyLids: number;
}

/**
 * What a batch of `jars` needs bought: jars beyond the empty ones in stock, and one new lid a jar beyond the lids
 * in stock. Lids seal once and are not reused; jars (and bands) are (USDA Complete Guide to Home Canning, 2015,
 * Guide 1; NCHFP).
 */
export function batchShopping(jars: number, stock: { emptyJars: number; lids: number }): BatchShopping {
  const emptyJars = Math.max(0, stock.emptyJars);
  const lids = Math.max(0, stock.lids);
  return { emptyJars, lids, buyJars: Math.max(0, jars - emptyJars), buyLids: Math.max(0, jars - lids) };
}
