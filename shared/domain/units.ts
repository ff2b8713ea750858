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
