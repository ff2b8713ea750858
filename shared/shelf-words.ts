// Names the shelf screens and the server's messages share; no zod here, so the client chunks stay small.
import type { Method, ProductKind } from './domain';

/** A product's chip colour, chosen by the household; each maps to a theme token in the client. */
export const PRODUCT_COLOURS = ['honey', 'leaf', 'brine', 'earth', 'wheat'] as const;
export type ProductColour = (typeof PRODUCT_COLOURS)[number];

export const PRODUCT_KIND_NAMES: Record<ProductKind, string> = {
  relish: 'Relish',
  pickle: 'Pickle',
  chutney: 'Chutney',
  jam: 'Jam',
  jelly: 'Jelly',
  'fruit-butter': 'Fruit butter',
  sauce: 'Sauce',
  salsa: 'Salsa',
  other: 'Other',
};

export const METHOD_NAMES: Record<Method, string> = {
  'boiling-water': 'Boiling-water canner',
  'atmospheric-steam': 'Atmospheric steam canner',
  'pressure-dial': 'Pressure canner, dial gauge',
  'pressure-weighted': 'Pressure canner, weighted gauge',
};

/** "2,350 ft". */
export function feet(altitudeFt: number): string {
  return `${altitudeFt.toLocaleString('en-US')} ft`;
}

/**
 * Checks at opening, as the USDA Complete Guide to Home Canning (2015) and the National Center for Home Food
 * Preservation advise for home-canned food (worded from memory, in our own words).
 */
export const OPENING_CHECKS = [
  'Check the seal: the lid should be concave and not move when pressed, and should not come off without force.',
  'Look: no bulging or leaking lid, no mould, no rising bubbles, no spurting liquid and no cloudiness that was not there before.',
  'Smell: any off, sour or yeasty odour means the jar is spoiled. Do not taste it.',
  'When in doubt, throw it out.',
] as const;
export const OPENING_CHECKS_SOURCE = 'USDA Complete Guide to Home Canning; National Center for Home Food Preservation';
