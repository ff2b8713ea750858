// The safety words beside every canning number and every use-by date, sized to the place they appear.
// The plan's full list (per canner) is shared/domain/cautions.ts; these are the shorter forms.

import type { PlanQuantities } from '../domain/cautions';
import type { UnitSystem } from '../domain/units';
import { altitudeWords, JAR_SIZE_NAMES, jarSizeWords, waterDepthWords } from './units';

/**
 * The quantities of a processing plan's cautions and reasons in the household's units: "1 inch" or "2.5 cm" of water
 * over the jars, "10,000 ft" or "3,048 m", "quart" or "quart (946 mL)". The domain's numbers stay in inches and feet.
 */
export function planQuantities(system: UnitSystem): PlanQuantities {
  return {
    waterDepth: (inches) => waterDepthWords(inches, system),
    altitude: (feet) => altitudeWords(feet, system),
    jarSize: (size) => (system === 'metric' ? jarSizeWords(size, system) : JAR_SIZE_NAMES[size]),
  };
}

/** The heading placed before any processing numbers on a plan. */
export const BEFORE_YOU_START = 'Before you start';

/** One line under a card or a log that shows minutes, pressure, altitude or headspace. */
export const CANNING_CAUTION_LINE =
  'Follow a tested recipe as written, never reduce its acid, adjust for altitude, check every seal. Your tested recipe and local extension service come first.';

/** One sentence in an e-mail or a push message that carries canning numbers. */
export const CANNING_CAUTION_SENTENCE =
  'Larderly follows published tables; use tested recipes only, never reduce the acid, and let your tested recipe and local extension service decide where they differ.';

/**
 * Opened jars: no published figure covers every product (National Center for Home Food Preservation,
 * "Storing Home Canned Foods"), so the use-within days are a household setting with defaults from memory.
 */
export const USE_BY_CAUTION_LINE =
  'The use-by is a default, not a tested figure: the tested recipe’s storage advice and the jar’s look and smell come first. When in doubt, throw it out.';

/** Beside the product's use-within field: the days are a default, and what comes first. */
export const USE_WITHIN_DEFAULT_HINT =
  'A default from memory, not a published figure (the National Center for Home Food Preservation gives none for every opened product): the tested recipe’s storage advice and the jar’s look and smell come first.';

/** The short form a push notification has room for, after a use-by date (the e-mail adds the sentence below). */
export const USE_BY_CAUTION_PUSH =
  'The use-by is a default; the jar’s look and smell come first. When in doubt, throw it out.';

/** The short form a push notification has room for, after canning times (a seal check, a reprocess deadline). */
export const CANNING_CAUTION_PUSH = 'Your tested recipe and local extension service come first.';

/**
 * Beside a best-quality date (the label sheet, the shelf): it is about quality, not safety. The USDA Complete Guide
 * to Home Canning (2015) gives about a year for best quality; the seal, look and smell decide at opening.
 */
export const BEST_QUALITY_CAUTION_LINE =
  'Best quality by is about taste and color, not safety: at opening, check the seal, the look and the smell first. When in doubt, throw it out.';

/** One sentence for a reminder e-mail or push about a use-by date. */
export const USE_BY_CAUTION_SENTENCE =
  'The use-by date is a default from the product’s settings; follow your tested recipe, check the jar’s look and smell, and when in doubt, throw it out.';

/** The unsealed jar (NCHFP, "Storing Home Canned Foods"), shown in the warning color wherever it appears. */
export { UNSEALED_JAR_ADVICE } from '../domain/shelf-life';

/**
 * Checks at opening, as the USDA Complete Guide to Home Canning (2015) and the National Center for Home Food
 * Preservation advise for home-canned food (worded from memory, in our own words).
 */
export const OPENING_CHECKS = [
  'Check the seal: the lid should be concave and not move when pressed, and should not come off without force.',
  'Look: no bulging or leaking lid, no mold, no rising bubbles, no spurting liquid and no cloudiness that was not there before.',
  'Smell: any off, sour or yeasty odor means the jar is spoiled. Do not taste it.',
  'When in doubt, throw it out.',
] as const;
export const OPENING_CHECKS_SOURCE = 'USDA Complete Guide to Home Canning; National Center for Home Food Preservation';
