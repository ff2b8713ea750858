// The one way Larderly writes a canning number: pressure, headspace, jar size, altitude, minutes.
// The modules themselves, not the domain's index, so a screen that shows an amount does not load all of the domain.
// Every quantity goes through here with the household's unit system: the stored value stays as the domain keeps it
// (feet, psi, inches, an ingredient in the unit it was written in), and only the words change.
import { formatKitchenAmount, roundKitchenAmount } from '../domain/kitchen-amounts';
import {
  amountIn,
  feetToMeters,
  jarCapacityMl,
  metersToFeet,
  ML_PER_US_TBSP,
  MM_PER_INCH,
  psiToKpa,
  type IngredientUnit,
  type JarSize,
  type UnitSystem,
} from '../domain/units';

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

/** A jar keeps its trade name; metric puts its volume beside it: "pint (473 mL)". */
export function jarSizeWords(size: JarSize, system: UnitSystem = 'us'): string {
  if (system !== 'metric') return JAR_SIZE_NAMES[size];
  return `${JAR_SIZE_NAMES[size]} (${Math.round(jarCapacityMl(size)).toLocaleString('en-US')} mL)`;
}

/**
 * "11 pounds of pressure" in a sentence; "11 lb" where space is short (a table cell, a card line). Gauges read in
 * pounds, so metric keeps them and says kilopascals beside: "11 pounds of pressure (76 kPa)".
 */
export function pressureWords(psi: number, short = false, system: UnitSystem = 'us'): string {
  const pounds = short ? `${psi} lb` : `${psi} pounds of pressure`;
  return system === 'metric' ? `${pounds} (${Math.round(psiToKpa(psi))} kPa)` : pounds;
}

/** Headspace as the trade writes it: "1/4 inch", "1/2 inch", "1 inch", "1 1/4 inches"; metric in whole mm. */
export function headspaceWords(inches: number, system: UnitSystem = 'us'): string {
  if (system === 'metric') return `${Math.round(inches * MM_PER_INCH)} mm`;
  const rounded = roundKitchenAmount(inches, 'cup');
  const number = formatKitchenAmount(rounded, 'cup').replace(/ cups?$/, '');
  return `${number} ${rounded > 1 ? 'inches' : 'inch'}`;
}

/** What the headspace field is called in the household's units: "inches" or "mm". */
export function headspaceUnitWords(system: UnitSystem): string {
  return system === 'metric' ? 'mm' : 'inches';
}

/**
 * The headspace field's value as a person edits it: inches as stored, or millimetres to three decimals, which keeps
 * every eighth of an inch exact (3.175, 6.35, 12.7, 25.4, 31.75 mm) so saving unchanged keeps the inches.
 */
export function headspaceInputValue(inches: number, system: UnitSystem): string {
  if (system !== 'metric') return String(inches);
  return String(Math.round(inches * MM_PER_INCH * 1000) / 1000);
}

/**
 * The one parser of a typed headspace: "0.5" (inches) or "12.7" / "13 mm" (millimetres) becomes inches, the unit
 * recipes and batches store (to 1/10,000 inch, so a value shown in mm comes back as it was); null when not a number.
 */
export function parseHeadspace(text: string, system: UnitSystem): number | null {
  const cleaned = text
    .trim()
    .replace(',', '.')
    .replace(/\s*(in|inch|inches|"|mm|millimeters|millimetres)$/i, '');
  if (!/^(\d+(\.\d*)?|\.\d+)$/.test(cleaned)) return null;
  const value = Number(cleaned);
  return system === 'metric' ? Math.round((value / MM_PER_INCH) * 10_000) / 10_000 : value;
}

/** How deep water stands over the jars: "1 inch", "2 inches"; metric in cm to one decimal: "2.5 cm". */
export function waterDepthWords(inches: number, system: UnitSystem = 'us'): string {
  if (system === 'metric') return `${(Math.round(inches * MM_PER_INCH) / 10).toLocaleString('en-US')} cm`;
  return headspaceWords(inches, 'us');
}

/** "2,350 ft"; metric to the whole meter: "716 m". */
export function altitudeWords(feet: number, system: UnitSystem = 'us'): string {
  if (system === 'metric') return `${Math.round(feetToMeters(feet)).toLocaleString('en-US')} m`;
  return `${feet.toLocaleString('en-US')} ft`;
}

/** What the altitude field is called and says, in the household's units. */
export function altitudeUnitWords(system: UnitSystem): string {
  return system === 'metric' ? 'meters' : 'feet';
}

/** The altitude field's value as a person edits it: whole feet, or whole meters. */
export function altitudeInputValue(feet: number, system: UnitSystem): string {
  return String(system === 'metric' ? Math.round(feetToMeters(feet)) : feet);
}

/**
 * The one parser of a typed altitude: "2,350" (feet) or "716" / "716 m" (meters) becomes whole feet, the unit the
 * processing tables use; null when it is not a number.
 */
export function parseAltitude(text: string, system: UnitSystem): number | null {
  const cleaned = text
    .trim()
    .replaceAll(',', '')
    .replace(/\s*(ft|feet|m|meters|metres)$/i, '');
  if (cleaned === '' || !/^-?\d+(\.\d+)?$/.test(cleaned)) return null;
  const value = Number(cleaned);
  return Math.round(system === 'metric' ? metersToFeet(value) : value);
}

/** An ingredient amount in the household's units: "1 1/2 cups" or "355 mL", "2 lb" or "910 g". */
export function amountWords(value: number, unit: IngredientUnit, system: UnitSystem = 'us'): string {
  const shown = amountIn(value, unit, system);
  return formatKitchenAmount(shown.value, shown.unit);
}

/** "1 minute", "20 minutes". */
export function minutesWords(minutes: number): string {
  return count(minutes, 'minute');
}

/** "1 jar", "3 jars". */
export function count(n: number, singular: string, plural = `${singular}s`): string {
  return `${n} ${n === 1 ? singular : plural}`;
}

const round = (rate: number) => (rate >= 1 ? Math.round(rate * 10) / 10 : Math.round(rate * 100) / 100);

/** A rate such as 0.35 tablespoons a day, rounded to what a person can picture; metric in mL a day. */
export function tbspPerDay(rate: number, system: UnitSystem = 'us'): string {
  if (system === 'metric') return `${round(rate * ML_PER_US_TBSP)} mL a day`;
  return `${round(rate)} tbsp a day`;
}

/** "2 tbsp", "1 1/2 tbsp": an amount as a spoon measures it; metric in mL ("30 mL"). */
export function tbspWords(tbsp: number, system: UnitSystem = 'us'): string {
  if (system === 'metric') return formatKitchenAmount(tbsp * ML_PER_US_TBSP, 'ml');
  return formatKitchenAmount(tbsp, 'tbsp');
}
