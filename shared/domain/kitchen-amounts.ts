// Amounts rounded and written the way a cook measures them: spoon and cup fractions, whole grams.
import { INGREDIENT_UNITS, type IngredientUnit } from './units';
import { requireNonNegative, requireOneOf } from './validate';

export type RoundingDirection = 'nearest' | 'up';

// Halves, thirds, quarters and eighths: the measuring cups and spoons in a kitchen drawer.
const COOK_FRACTIONS = [0, 1 / 8, 1 / 4, 1 / 3, 3 / 8, 1 / 2, 5 / 8, 2 / 3, 3 / 4, 7 / 8, 1];
const FRACTION_NAMES = ['', '1/8', '1/4', '1/3', '3/8', '1/2', '5/8', '2/3', '3/4', '7/8', ''];
// A whole onion or lemon is cut in halves or quarters, not eighths.
const COUNT_FRACTIONS = [0, 1 / 4, 1 / 2, 3 / 4, 1];

// Float noise such as 2.0000000000000004 must not round up to the next eighth.
const NOISE = 1e-9;

const METRIC_UNITS = ['ml', 'l', 'g', 'kg'] as const;
type MetricUnit = (typeof METRIC_UNITS)[number];

const UNIT_NAMES: Record<IngredientUnit, [singular: string, plural: string]> = {
  tsp: ['tsp', 'tsp'],
  tbsp: ['tbsp', 'tbsp'],
  'fl-oz': ['fl oz', 'fl oz'],
  cup: ['cup', 'cups'],
  pint: ['pint', 'pints'],
  quart: ['quart', 'quarts'],
  gallon: ['gallon', 'gallons'],
  ml: ['mL', 'mL'],
  l: ['L', 'L'],
  lb: ['lb', 'lb'],
  oz: ['oz', 'oz'],
  g: ['g', 'g'],
  kg: ['kg', 'kg'],
  each: ['', ''],
};

function isMetric(unit: IngredientUnit): unit is MetricUnit {
  return (METRIC_UNITS as readonly string[]).includes(unit);
}

// Kitchen scales and jugs read to the gram or millilitre; large amounts need less.
function metricStep(value: number, unit: MetricUnit): number {
  if (unit === 'l' || unit === 'kg') return 0.01;
  if (value < 10) return 0.5;
  if (value < 100) return 1;
  if (value < 1000) return 5;
  return 10;
}

function roundToFractions(value: number, fractions: number[], direction: RoundingDirection): number {
  const whole = Math.floor(value);
  const part = value - whole;
  const fraction =
    direction === 'up'
      ? fractions.find((candidate) => candidate >= part - NOISE)!
      : fractions.reduce((best, candidate) => (Math.abs(candidate - part) < Math.abs(best - part) ? candidate : best));
  return whole + fraction;
}

function roundToStep(value: number, step: number, direction: RoundingDirection): number {
  const steps = direction === 'up' ? Math.ceil(value / step - NOISE) : Math.round(value / step);
  return Number((steps * step).toFixed(6));
}

function smallestStep(unit: IngredientUnit): number {
  if (isMetric(unit)) return metricStep(0, unit);
  return unit === 'each' ? COUNT_FRACTIONS[1] : COOK_FRACTIONS[1];
}

/** Rounds to an amount a cook can measure in the same unit; a positive amount never becomes 0. */
export function roundKitchenAmount(
  value: number,
  unit: IngredientUnit,
  direction: RoundingDirection = 'nearest',
): number {
  const amount = requireNonNegative(value, 'amount');
  requireOneOf(unit, INGREDIENT_UNITS, 'unit');
  const rounded = isMetric(unit)
    ? roundToStep(amount, metricStep(amount, unit), direction)
    : roundToFractions(amount, unit === 'each' ? COUNT_FRACTIONS : COOK_FRACTIONS, direction);
  return amount > 0 && rounded === 0 ? smallestStep(unit) : rounded;
}

function writeNumber(amount: number, unit: IngredientUnit): string {
  if (isMetric(unit)) return String(Number(amount.toFixed(2)));
  const whole = Math.floor(amount + NOISE);
  const index = COOK_FRACTIONS.findIndex((fraction) => Math.abs(amount - whole - fraction) < 1e-6);
  const fractionName = FRACTION_NAMES[index];
  if (!fractionName) return String(whole);
  return whole === 0 ? fractionName : `${whole} ${fractionName}`;
}

/** A friendly amount such as "1 3/4 cups" or "2 1/4 tsp". */
export function formatKitchenAmount(value: number, unit: IngredientUnit): string {
  const amount = roundKitchenAmount(value, unit);
  const [singular, plural] = UNIT_NAMES[unit];
  const number = writeNumber(amount, unit);
  const unitName = amount > 0 && amount <= 1 ? singular : plural;
  return unitName ? `${number} ${unitName}` : number;
}
