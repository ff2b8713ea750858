// Kitchen volumes and jar sizes, converted with the exact US customary factors of NIST Handbook 44.
import { requireNumber, requireOneOf } from './validate';

export const VOLUME_UNITS = ['tsp', 'tbsp', 'fl-oz', 'cup', 'pint', 'quart', 'gallon', 'ml', 'l'] as const;
export type VolumeUnit = (typeof VOLUME_UNITS)[number];

export const MASS_UNITS = ['lb', 'oz', 'g', 'kg'] as const;
export type MassUnit = (typeof MASS_UNITS)[number];

export const INGREDIENT_UNITS = [...VOLUME_UNITS, ...MASS_UNITS, 'each'] as const;
export type IngredientUnit = (typeof INGREDIENT_UNITS)[number];

export const JAR_SIZES = [
  'quarter-pint',
  'half-pint',
  'twelve-ounce',
  'pint',
  'pint-and-half',
  'quart',
  'half-gallon',
] as const;
export type JarSize = (typeof JAR_SIZES)[number];

/** NIST Handbook 44, Appendix C: 1 US fluid ounce = 29.5735295625 mL exactly. */
export const ML_PER_US_FLUID_OUNCE = 29.5735295625;

// NIST Handbook 44, Appendix C: tbsp = 1/2 fl oz, tsp = 1/6 fl oz, cup = 8, pint = 16, quart = 32, gallon = 128.
const FLUID_OUNCES: Record<Exclude<VolumeUnit, 'ml' | 'l'>, number> = {
  tsp: 1 / 6,
  tbsp: 1 / 2,
  'fl-oz': 1,
  cup: 8,
  pint: 16,
  quart: 32,
  gallon: 128,
};

const MILLILITRES: Record<'ml' | 'l', number> = { ml: 1, l: 1000 };

// Nominal jar volumes (common practice).
const JAR_FLUID_OUNCES: Record<JarSize, number> = {
  'quarter-pint': 4,
  'half-pint': 8,
  'twelve-ounce': 12,
  pint: 16,
  'pint-and-half': 24,
  quart: 32,
  'half-gallon': 64,
};

function millilitresPer(unit: VolumeUnit): number {
  return unit === 'ml' || unit === 'l' ? MILLILITRES[unit] : FLUID_OUNCES[unit] * ML_PER_US_FLUID_OUNCE;
}

export function convertVolume(value: number, from: VolumeUnit, to: VolumeUnit): number {
  const amount = requireNumber(value, 'value');
  if (amount < 0) throw new RangeError(`value must not be negative; got ${amount}`);
  requireOneOf(from, VOLUME_UNITS, 'from');
  requireOneOf(to, VOLUME_UNITS, 'to');
  if (from === to) return amount;
  // Staying in fluid ounces between customary units keeps 3 tsp = 1 tbsp exact in floating point.
  if (from in FLUID_OUNCES && to in FLUID_OUNCES) {
    return (amount * FLUID_OUNCES[from as keyof typeof FLUID_OUNCES]) / FLUID_OUNCES[to as keyof typeof FLUID_OUNCES];
  }
  return (amount * millilitresPer(from)) / millilitresPer(to);
}

export function jarFluidOunces(size: JarSize): number {
  return JAR_FLUID_OUNCES[requireOneOf(size, JAR_SIZES, 'jarSize')];
}

export function jarCapacityMl(size: JarSize): number {
  return jarFluidOunces(size) * ML_PER_US_FLUID_OUNCE;
}

export function jarCapacityTbsp(size: JarSize): number {
  return jarFluidOunces(size) / FLUID_OUNCES.tbsp;
}

// ---- Unit systems: the household shows and takes US customary or metric; stored values stay as the domain has them
// (feet, pounds per square inch, inches of headspace, ingredient amounts in the unit they were written in).

export const UNIT_SYSTEMS = ['us', 'metric'] as const;
export type UnitSystem = (typeof UNIT_SYSTEMS)[number];

/** NIST Handbook 44, Appendix C: 1 US cup = 8 fl oz = 236.5882365 mL exactly. */
export const ML_PER_US_CUP = 8 * ML_PER_US_FLUID_OUNCE;
/** NIST Handbook 44, Appendix C: 1 US tablespoon = 1/2 fl oz = 14.78676478125 mL exactly. */
export const ML_PER_US_TBSP = ML_PER_US_FLUID_OUNCE / 2;
/** NIST SP 811, Appendix B: 1 pound (avoirdupois) = 453.59237 g exactly. */
export const GRAMS_PER_POUND = 453.59237;
/** NIST SP 811, Appendix B: 1 ounce (avoirdupois) = 1/16 lb = 28.349523125 g exactly. */
export const GRAMS_PER_OUNCE = GRAMS_PER_POUND / 16;
/** NIST SP 811, Appendix B: 1 foot = 0.3048 m exactly. */
export const METERS_PER_FOOT = 0.3048;
/** NIST SP 811, Appendix B: 1 inch = 25.4 mm exactly. */
export const MM_PER_INCH = 25.4;
/** NIST SP 811, Appendix B: 1 pound-force per square inch = 6.894757 kPa. */
export const KPA_PER_PSI = 6.894757;

const GRAMS: Record<MassUnit, number> = { lb: GRAMS_PER_POUND, oz: GRAMS_PER_OUNCE, g: 1, kg: 1000 };

export function convertMass(value: number, from: MassUnit, to: MassUnit): number {
  const amount = requireNumber(value, 'value');
  if (amount < 0) throw new RangeError(`value must not be negative; got ${amount}`);
  requireOneOf(from, MASS_UNITS, 'from');
  requireOneOf(to, MASS_UNITS, 'to');
  if (from === to) return amount;
  return (amount * GRAMS[from]) / GRAMS[to];
}

export function isVolumeUnit(unit: IngredientUnit): unit is VolumeUnit {
  return (VOLUME_UNITS as readonly string[]).includes(unit);
}

export function isMassUnit(unit: IngredientUnit): unit is MassUnit {
  return (MASS_UNITS as readonly string[]).includes(unit);
}

const METRIC_INGREDIENT_UNITS: readonly IngredientUnit[] = ['ml', 'l', 'g', 'kg', 'each'];
const US_INGREDIENT_UNITS: readonly IngredientUnit[] = [
  'tsp',
  'tbsp',
  'fl-oz',
  'cup',
  'pint',
  'quart',
  'gallon',
  'lb',
  'oz',
  'each',
];

/** The units a household of this system measures with, in the order a form offers them. */
export function ingredientUnitsFor(system: UnitSystem): readonly IngredientUnit[] {
  return requireOneOf(system, UNIT_SYSTEMS, 'unitSystem') === 'metric' ? METRIC_INGREDIENT_UNITS : US_INGREDIENT_UNITS;
}

export function belongsTo(unit: IngredientUnit, system: UnitSystem): boolean {
  return ingredientUnitsFor(system).includes(unit);
}

/** Largest customary volume a cook would measure the amount in (at least one of it), from tsp to gallon. */
function customaryVolume(ml: number): { value: number; unit: VolumeUnit } {
  const tsp = convertVolume(ml, 'ml', 'tsp');
  if (tsp < 3) return { value: tsp, unit: 'tsp' };
  const tbsp = tsp / 3;
  if (tbsp < 4) return { value: tbsp, unit: 'tbsp' };
  const cups = convertVolume(ml, 'ml', 'cup');
  if (cups < 16) return { value: cups, unit: 'cup' };
  return { value: cups / 16, unit: 'gallon' };
}

/**
 * The same amount in the household's system: metric shows mL (L from 1,000 mL) and g (kg from 1,000 g);
 * US customary shows tsp, tbsp and cups (gallons from 16 cups), and oz (lb from 16 oz). Amounts already in the
 * household's system, and counts, stay as they are.
 */
export function amountIn(
  value: number,
  unit: IngredientUnit,
  system: UnitSystem,
): { value: number; unit: IngredientUnit } {
  requireOneOf(unit, INGREDIENT_UNITS, 'unit');
  if (unit === 'each' || belongsTo(unit, system)) return { value, unit };
  if (isVolumeUnit(unit)) {
    if (system === 'metric') {
      const ml = convertVolume(value, unit, 'ml');
      return ml >= 1000 ? { value: ml / 1000, unit: 'l' } : { value: ml, unit: 'ml' };
    }
    return customaryVolume(convertVolume(value, unit, 'ml'));
  }
  const mass = unit as MassUnit;
  if (system === 'metric') {
    const grams = convertMass(value, mass, 'g');
    return grams >= 1000 ? { value: grams / 1000, unit: 'kg' } : { value: grams, unit: 'g' };
  }
  const ounces = convertMass(value, mass, 'oz');
  return ounces >= 16 ? { value: ounces / 16, unit: 'lb' } : { value: ounces, unit: 'oz' };
}

export function feetToMeters(feet: number): number {
  return requireNumber(feet, 'feet') * METERS_PER_FOOT;
}

export function metersToFeet(meters: number): number {
  return requireNumber(meters, 'meters') / METERS_PER_FOOT;
}

export function psiToKpa(psi: number): number {
  return requireNumber(psi, 'psi') * KPA_PER_PSI;
}
