// Kinds of preserve and the defaults each kind starts with; the tested recipe and the household's settings win.
import { PROCESSING_METHODS, isPressureMethod, type Method } from './processing-tables';
import { requireOneOf } from './validate';

export const PRODUCT_KINDS = [
  'relish',
  'pickle',
  'chutney',
  'jam',
  'jelly',
  'fruit-butter',
  'sauce',
  'salsa',
  'other',
] as const;
export type ProductKind = (typeof PRODUCT_KINDS)[number];

// From memory, not a published figure (NCHFP gives none for opened jars): about a month for relishes
// and pickled products, about three weeks for spreads (the low-sugar figure, used for all of them so
// no spread is kept too long), and under a week for sauces, salsas and anything else.
const OPENED_USE_WITHIN_DAYS: Record<ProductKind, number> = {
  relish: 30,
  pickle: 30,
  chutney: 30,
  jam: 21,
  jelly: 21,
  'fruit-butter': 21,
  sauce: 5,
  salsa: 7,
  other: 5,
};

// USDA Complete Guide, Guide 1 glossary and recipes: 1/4 inch for jams and jellies, 1/2 inch for
// pickles and relishes; fruit butters 1/4 inch and the other acid kinds 1/2 inch are from memory.
const HEADSPACE_INCHES: Record<ProductKind, number> = {
  relish: 1 / 2,
  pickle: 1 / 2,
  chutney: 1 / 2,
  jam: 1 / 4,
  jelly: 1 / 4,
  'fruit-butter': 1 / 4,
  sauce: 1 / 2,
  salsa: 1 / 2,
  other: 1 / 2,
};

/** USDA Complete Guide, Guide 1: pressure-canned low-acid foods usually take 1 inch. */
const PRESSURE_HEADSPACE_INCHES = 1;

/** Days an opened jar of this kind keeps in the fridge, a starting value the household can change. */
export function defaultUseWithinDays(kind: ProductKind): number {
  return OPENED_USE_WITHIN_DAYS[requireOneOf(kind, PRODUCT_KINDS, 'kind')];
}

/** Suggested headspace in inches; the tested recipe's own headspace always wins. */
export function defaultHeadspaceInches(kind: ProductKind, method?: Method): number {
  requireOneOf(kind, PRODUCT_KINDS, 'kind');
  if (method !== undefined && isPressureMethod(requireOneOf(method, PROCESSING_METHODS, 'method'))) {
    return PRESSURE_HEADSPACE_INCHES;
  }
  return HEADSPACE_INCHES[kind];
}
