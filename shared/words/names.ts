// One name for each thing Larderly shows: canners, kinds, the heat scale, jar states, dates, sections.
import type { JarState, Method, ProductKind } from '../domain';

/** A product's chip color, chosen by the household; each maps to a theme token in the client. */
export const PRODUCT_COLOURS = ['honey', 'leaf', 'brine', 'earth', 'wheat'] as const;
export type ProductColour = (typeof PRODUCT_COLOURS)[number];

export const PRODUCT_COLOUR_NAMES: Record<ProductColour, string> = {
  honey: 'Honey',
  leaf: 'Leaf green',
  brine: 'Brine teal',
  earth: 'Earth brown',
  wheat: 'Wheat',
};

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

/** The canner a batch is processed in; the same words on the batch form, the plan, the log and the CSV. */
export const METHOD_NAMES: Record<Method, string> = {
  'boiling-water': 'Boiling-water canner',
  'atmospheric-steam': 'Atmospheric steam canner',
  'pressure-dial': 'Pressure canner, dial gauge',
  'pressure-weighted': 'Pressure canner, weighted gauge',
};

/** "in a boiling-water canner", for sentences. */
export function inCanner(method: Method): string {
  return `in a ${METHOD_NAMES[method].replace(/^[A-Z]/, (c) => c.toLowerCase())}`;
}

/** The heat scale, 0 to 5, said one way everywhere. */
export const HEAT_NAMES = ['no heat', 'mild', 'warm', 'hot', 'very hot', 'fiery'] as const;
export const HEAT_LEVELS = [0, 1, 2, 3, 4, 5] as const;

/** "heat 3 of 5, hot"; a choice in a list reads "3 of 5: hot". */
export function heatWords(heat: number, asChoice = false): string {
  const name = HEAT_NAMES[heat] ?? '';
  return asChoice ? `${heat} of 5: ${name}` : `heat ${heat} of 5, ${name}`;
}

/** A jar's state as a badge says it. */
export const JAR_STATE_NAMES: Record<JarState, string> = {
  sealed: 'sealed',
  opened: 'opened, in the fridge',
  finished: 'finished',
  discarded: 'discarded',
  given: 'given away',
};
export const UNSEALED_STATE_NAME = 'did not seal, in the fridge';

/** What a person does with a jar; the fridge, the jar's page and the shelf say the same. */
export const JAR_ACTION_NAMES = { open: 'Mark opened', finish: 'Mark finished', discard: 'Discard' } as const;

/** The one name of each date a jar carries. */
export const DATE_NAMES = {
  canned: 'Canned',
  bestQuality: 'Best quality by',
  oldestBestQuality: 'Oldest jar best quality by',
  pastBestQuality: 'Past best quality',
  useBy: 'Use by',
  opened: 'Opened',
} as const;

/** The one name of the suggestion to make a new batch, and of its screen and sections. */
export const RESTOCK_NAME = 'Restock';

export const SLOT_NAMES = { breakfast: 'Breakfast', lunch: 'Lunch', dinner: 'Dinner', snack: 'Snack' } as const;

/** The source most of Larderly's storage advice comes from, spelled out at first use on a page. */
export const NCHFP = { full: 'National Center for Home Food Preservation (NCHFP)', short: 'NCHFP' } as const;
