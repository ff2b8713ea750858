import convert from 'convert-units';
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import {
  JAR_SIZES,
  VOLUME_UNITS,
  convertVolume,
  jarCapacityMl,
  jarCapacityTbsp,
  type JarSize,
  type VolumeUnit,
} from '@shared/domain';

// Relative to the size of the amount, with a floor so amounts near zero are not held to zero error.
function expectClose(actual: number, expected: number, relative = 1e-12): void {
  expect(Math.abs(actual - expected)).toBeLessThanOrEqual(Math.max(Math.abs(expected), 1e-9) * relative);
}

describe('convertVolume against NIST Handbook 44, Appendix C (US customary units)', () => {
  it.each<[VolumeUnit, number]>([
    ['fl-oz', 29.5735295625], // NIST HB 44: 1 US fluid ounce = 29.5735295625 mL exactly
    ['tbsp', 29.5735295625 / 2], // NIST HB 44: 1 tbsp = 1/2 fl oz
    ['tsp', 29.5735295625 / 6], // NIST HB 44: 1 tsp = 1/6 fl oz
    ['cup', 236.5882365], // NIST HB 44: 1 cup = 8 fl oz
    ['pint', 473.176473], // NIST HB 44: 1 pint = 2 cups
    ['quart', 946.352946], // NIST HB 44: 1 quart = 2 pints
    ['gallon', 3785.411784], // NIST HB 44: 1 gallon = 4 quarts
    ['l', 1000],
  ])('1 %s is %d mL (NIST HB 44)', (unit, millilitres) => {
    expectClose(convertVolume(1, unit, 'ml'), millilitres);
    expectClose(convertVolume(millilitres, 'ml', unit), 1);
  });

  it('keeps the customary ratios exact: 3 tsp = 1 tbsp, 16 tbsp = 1 cup, 4 quarts = 1 gallon (NIST HB 44)', () => {
    expect(convertVolume(3, 'tsp', 'tbsp')).toBe(1);
    expect(convertVolume(16, 'tbsp', 'cup')).toBe(1);
    expect(convertVolume(4, 'quart', 'gallon')).toBe(1);
    expect(convertVolume(2, 'cup', 'pint')).toBe(1);
  });

  it('128 tablespoons fill 8 cups = 4 pints = 2 quarts (common practice)', () => {
    expect(convertVolume(128, 'tbsp', 'cup')).toBe(8);
    expect(convertVolume(128, 'tbsp', 'pint')).toBe(4);
    expect(convertVolume(128, 'tbsp', 'quart')).toBe(2);
  });
});

describe('convertVolume cross-checked with the convert-units package (library, version 2.3.4)', () => {
  const convertUnitsName: Record<VolumeUnit, string> = {
    tsp: 'tsp',
    tbsp: 'Tbs',
    'fl-oz': 'fl-oz',
    cup: 'cup',
    pint: 'pnt',
    quart: 'qt',
    gallon: 'gal',
    ml: 'ml',
    l: 'l',
  };
  // convert-units links litres to US fluid ounces by 33.8140226 fl oz per litre, rounded to nine
  // significant figures, so across the metric/US line it differs from the exact NIST factor by about
  // 3 parts in a billion; a relative tolerance of 1e-8 allows that and nothing more.
  const LIBRARY_TOLERANCE = 1e-8;

  for (const from of VOLUME_UNITS) {
    for (const to of VOLUME_UNITS) {
      it(`1 ${from} in ${to} agrees with convert-units`, () => {
        expectClose(
          convertVolume(1, from, to),
          convert(1).from(convertUnitsName[from]).to(convertUnitsName[to]),
          LIBRARY_TOLERANCE,
        );
      });
    }
  }
});

describe('convertVolume properties (fast-check)', () => {
  const unit = fc.constantFrom(...VOLUME_UNITS);
  const amount = fc.double({ min: 0, max: 1e6, noNaN: true, noDefaultInfinity: true });

  it('round-trips any amount between any two units', () => {
    fc.assert(
      fc.property(amount, unit, unit, (value, from, to) => {
        expectClose(convertVolume(convertVolume(value, from, to), to, from), value);
      }),
    );
  });

  it('going through a third unit gives the same as going directly', () => {
    fc.assert(
      fc.property(amount, unit, unit, unit, (value, from, via, to) => {
        expectClose(convertVolume(convertVolume(value, from, via), via, to), convertVolume(value, from, to));
      }),
    );
  });
});

describe('convertVolume refuses malformed input', () => {
  it.each([
    [Number.NaN, 'cup', 'ml', /value must be a finite number/],
    [-1, 'cup', 'ml', /value must not be negative/],
    [1, 'pinch', 'ml', /from must be one of/],
    [1, 'cup', 'bucket', /to must be one of/],
  ])('convertVolume(%s, %s, %s) throws a RangeError', (value, from, to, message) => {
    expect(() => convertVolume(value, from as VolumeUnit, to as VolumeUnit)).toThrow(RangeError);
    expect(() => convertVolume(value, from as VolumeUnit, to as VolumeUnit)).toThrow(message);
  });
});

describe('jar capacities (nominal sizes: common practice; millilitres: NIST HB 44)', () => {
  it.each<[JarSize, number]>([
    ['quarter-pint', 4],
    ['half-pint', 8],
    ['twelve-ounce', 12],
    ['pint', 16],
    ['pint-and-half', 24],
    ['quart', 32],
    ['half-gallon', 64],
  ])('a %s jar holds %d fl oz', (size, fluidOunces) => {
    expectClose(jarCapacityMl(size), fluidOunces * 29.5735295625);
    expect(jarCapacityTbsp(size)).toBe(fluidOunces * 2);
  });

  it('agrees with convert-units (library, 2.3.4) on the pint and quart jars, within its nine-figure factor', () => {
    expectClose(jarCapacityMl('pint'), convert(1).from('pnt').to('ml'), 1e-8);
    expectClose(jarCapacityMl('quart'), convert(1).from('qt').to('ml'), 1e-8);
  });

  it('128 tablespoons fill 8 half-pints = 4 pints = 2 quarts (common practice)', () => {
    expect(128 / jarCapacityTbsp('half-pint')).toBe(8);
    expect(128 / jarCapacityTbsp('pint')).toBe(4);
    expect(128 / jarCapacityTbsp('quart')).toBe(2);
  });

  it('lists the sizes from smallest to largest', () => {
    const capacities = JAR_SIZES.map(jarCapacityMl);
    expect([...capacities].sort((a, b) => a - b)).toEqual(capacities);
  });

  it('refuses an unknown jar size with a RangeError', () => {
    expect(() => jarCapacityMl('jam-jar' as JarSize)).toThrow(RangeError);
    expect(() => jarCapacityTbsp('jam-jar' as JarSize)).toThrow(/jarSize must be one of/);
  });
});
