// The one way Larderly writes a canning number: pressure, headspace, jar size, altitude, minutes.
// The modules themselves, not the domain's index, so a screen that shows an amount does not load all of the domain.
import { formatKitchenAmount, roundKitchenAmount } from '../domain/kitchen-amounts';
import type { JarSize } from '../domain/units';

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

export function jarSizeWords(size: JarSize): string {
  return JAR_SIZE_NAMES[size];
}

/** "11 pounds of pressure" in a sentence; "11 lb" where space is short (a table cell, a card line). */
export function pressureWords(psi: number, short = false): string {
  return short ? `${psi} lb` : `${psi} pounds of pressure`;
}

/** Headspace as the trade writes it: "1/4 inch", "1/2 inch", "1 inch", "1 1/4 inches". */
export function headspaceWords(inches: number): string {
  const rounded = roundKitchenAmount(inches, 'cup');
  const number = formatKitchenAmount(rounded, 'cup').replace(/ cups?$/, '');
  return `${number} ${rounded > 1 ? 'inches' : 'inch'}`;
}

/** "2,350 ft". */
export function altitudeWords(feet: number): string {
  return `${feet.toLocaleString('en-US')} ft`;
}

/** "1 minute", "20 minutes". */
export function minutesWords(minutes: number): string {
  return count(minutes, 'minute');
}

/** "1 jar", "3 jars". */
export function count(n: number, singular: string, plural = `${singular}s`): string {
  return `${n} ${n === 1 ? singular : plural}`;
}

/** A rate such as 0.35 tablespoons a day, rounded to what a person can picture. */
export function tbspPerDay(rate: number): string {
  const rounded = rate >= 1 ? Math.round(rate * 10) / 10 : Math.round(rate * 100) / 100;
  return `${rounded} tbsp a day`;
}

/** "2 tbsp", "1 1/2 tbsp": an amount as a spoon measures it. */
export function tbspWords(tbsp: number): string {
  return formatKitchenAmount(tbsp, 'tbsp');
}
