import type { JarSize } from './domain';

/** How a cook says each jar size, for titles and sentences. */
export const JAR_SIZE_NAMES: Record<JarSize, string> = {
  'quarter-pint': 'quarter-pint',
  'half-pint': 'half-pint',
  'twelve-ounce': '12-ounce',
  pint: 'pint',
  'pint-and-half': 'pint-and-a-half',
  quart: 'quart',
  'half-gallon': 'half-gallon',
};
