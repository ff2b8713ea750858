// The safety words shown beside every canning number: general cautions, per-method cautions, and after-processing steps.
import type { Method } from './processing-tables';
import type { JarSize } from './units';

/**
 * How the plan's texts write a quantity. The domain keeps one unit system (inches, feet, the US jar sizes); the
 * household's words (planQuantities in shared/words/cautions.ts) convert at the edge. Left out, US customary.
 */
export interface PlanQuantities {
  /** Water over the jars: "1 inch" or "2.5 cm". */
  waterDepth(inches: number): string;
  /** "10,000 ft" or "3,048 m". */
  altitude(feet: number): string;
  /** "quart" or "quart (946 mL)". */
  jarSize(size: JarSize): string;
}

export const US_PLAN_QUANTITIES: PlanQuantities = {
  waterDepth: (inches) => `${inches} ${inches === 1 ? 'inch' : 'inches'}`,
  altitude: (feet) => `${feet.toLocaleString('en-US')} ft`,
  jarSize: (size) => size,
};

/** USDA Complete Guide to Home Canning (2015), Guide 1: the jars stay covered by at least 1 inch of water. */
export const BOILING_WATER_COVER_INCHES = 1;

/** The usual cautions; Larderly defers to tested recipes and local extension services. */
export const SAFETY_CAUTIONS: readonly string[] = [
  'Use only tested recipes, and follow them as written.',
  'Never reduce the vinegar, lemon juice or other acid in a tested recipe.',
  'Adjust the processing for your altitude.',
  'Check every seal once the jars have cooled; refrigerate or reprocess any jar that did not seal.',
  'When in doubt, throw it out.',
  "Your local extension service and the tested recipe's own instructions come first where they differ from this plan.",
];

const METHOD_CAUTIONS: Record<Method, (q: PlanQuantities) => readonly string[]> = {
  // USDA Complete Guide to Home Canning (2015), Guide 1.
  'boiling-water': (q) => [
    `Keep the jars covered by at least ${q.waterDepth(BOILING_WATER_COVER_INCHES)} of water at a full rolling boil for the whole time.`,
  ],
  // University of Wisconsin-Madison research (Willmore, Etzel, Andress and Ingham, 2015), as extension services summarise it.
  'atmospheric-steam': (q) => [
    'Only for acid foods (pH 4.6 or below) with a recipe tested for the boiling-water canner, using its time with the altitude adjustment.',
    'The whole process, altitude adjustment included, must not pass 45 minutes.',
    `Jars up to a ${q.jarSize('quart')} only, heated before filling.`,
    'Vent until a full column of steam flows, and keep the canner at a full steam (212 °F / 100 °C at sea level) for the whole time.',
  ],
  // Common practice, from memory of USDA Guide 1 and extension services' gauge testing.
  'pressure-dial': () => [
    'Vent the canner for 10 minutes before closing it and bringing it up to pressure.',
    'Have the dial gauge tested for accuracy every year.',
  ],
  'pressure-weighted': () => [
    'Vent the canner for 10 minutes before putting the weight on and bringing it up to pressure.',
  ],
};

// Common practice, from memory; the tested recipe's own steps win.
const COOL_AND_TEST = [
  'Cool the jars for 12 to 24 hours without disturbing them.',
  'Then test every seal; refrigerate or reprocess any jar that did not seal.',
];

const AFTER_PROCESSING: Record<Method, readonly string[]> = {
  'boiling-water': [
    'Turn off the heat and take off the canner lid.',
    'Wait 5 minutes before lifting the jars out.',
    ...COOL_AND_TEST,
  ],
  'atmospheric-steam': [
    "Turn off the heat and leave the lid on for the recipe's rest time before lifting the jars out.",
    ...COOL_AND_TEST,
  ],
  'pressure-dial': [
    'Turn off the heat and let the canner depressurise by itself; never cool it by force.',
    'Once it reads zero, wait 10 minutes before opening the lid.',
    ...COOL_AND_TEST,
  ],
  'pressure-weighted': [
    'Turn off the heat and let the canner depressurise by itself; never cool it by force.',
    'Once it is fully depressurised, wait 10 minutes before opening the lid.',
    ...COOL_AND_TEST,
  ],
};

/** The cautions for a canner, their quantities in the household's words (US customary when left out). */
export function cautionsFor(method: Method, quantities: PlanQuantities = US_PLAN_QUANTITIES): string[] {
  return [...SAFETY_CAUTIONS, ...METHOD_CAUTIONS[method](quantities)];
}

export function afterProcessingSteps(method: Method): string[] {
  return [...AFTER_PROCESSING[method]];
}
