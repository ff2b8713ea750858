// The safety words shown beside every canning number: general cautions, per-method cautions, and after-processing steps.
import type { Method } from './processing-tables';

/** The usual cautions; Larderly defers to tested recipes and local extension services. */
export const SAFETY_CAUTIONS: readonly string[] = [
  'Use only tested recipes, and follow them as written.',
  'Never reduce the vinegar, lemon juice or other acid in a tested recipe.',
  'Adjust the processing for your altitude.',
  'Check every seal once the jars have cooled; refrigerate or reprocess any jar that did not seal.',
  'When in doubt, throw it out.',
  "Your local extension service and the tested recipe's own instructions come first where they differ from this plan.",
];

const METHOD_CAUTIONS: Record<Method, readonly string[]> = {
  // Common practice, from memory of USDA Guide 1.
  'boiling-water': ['Keep the jars covered by at least 1 inch of water at a full rolling boil for the whole time.'],
  // University of Wisconsin-Madison research (Willmore, Etzel, Andress and Ingham, 2015), as extension services summarise it.
  'atmospheric-steam': [
    'Only for acid foods (pH 4.6 or below) with a recipe tested for the boiling-water canner, using its time with the altitude adjustment.',
    'The whole process, altitude adjustment included, must not pass 45 minutes.',
    'Jars up to a quart only, heated before filling.',
    'Vent until a full column of steam flows, and keep the canner at a full steam (212 °F / 100 °C at sea level) for the whole time.',
  ],
  // Common practice, from memory of USDA Guide 1 and extension services' gauge testing.
  'pressure-dial': [
    'Vent the canner for 10 minutes before closing it and bringing it up to pressure.',
    'Have the dial gauge tested for accuracy every year.',
  ],
  'pressure-weighted': ['Vent the canner for 10 minutes before putting the weight on and bringing it up to pressure.'],
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

export function cautionsFor(method: Method): string[] {
  return [...SAFETY_CAUTIONS, ...METHOD_CAUTIONS[method]];
}

export function afterProcessingSteps(method: Method): string[] {
  return [...AFTER_PROCESSING[method]];
}
