import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { INGREDIENT_UNITS, formatKitchenAmount, roundKitchenAmount, type IngredientUnit } from '@shared/domain';

describe('formatKitchenAmount', () => {
  // The contract's own examples of a friendly amount.
  it('writes 1.75 cups as "1 3/4 cups" and 2.25 tsp as "2 1/4 tsp"', () => {
    expect(formatKitchenAmount(1.75, 'cup')).toBe('1 3/4 cups');
    expect(formatKitchenAmount(2.25, 'tsp')).toBe('2 1/4 tsp');
  });

  // Common practice: measuring cups and spoons come in halves, thirds, quarters and eighths.
  it.each<[number, IngredientUnit, string]>([
    [0.5, 'cup', '1/2 cup'],
    [1 / 3, 'cup', '1/3 cup'],
    [2 / 3, 'cup', '2/3 cup'],
    [0.125, 'tsp', '1/8 tsp'],
    [1.375, 'tbsp', '1 3/8 tbsp'],
    [3, 'quart', '3 quarts'],
    [1, 'pint', '1 pint'],
    [2, 'gallon', '2 gallons'],
    [6, 'fl-oz', '6 fl oz'],
    [2.5, 'lb', '2 1/2 lb'],
    [3, 'each', '3'],
  ])('writes %d %s as "%s"', (value, unit, expected) => {
    expect(formatKitchenAmount(value, unit)).toBe(expected);
  });

  it('rounds to the nearest measure: 0.95 cup reads "1 cup", 0.3 cup reads "1/3 cup"', () => {
    expect(formatKitchenAmount(0.95, 'cup')).toBe('1 cup');
    expect(formatKitchenAmount(0.3, 'cup')).toBe('1/3 cup');
  });

  it('writes metric amounts as decimals to the gram or millilitre', () => {
    expect(formatKitchenAmount(12.3, 'g')).toBe('12 g');
    expect(formatKitchenAmount(473.2, 'ml')).toBe('475 mL');
    expect(formatKitchenAmount(1.234, 'kg')).toBe('1.23 kg');
    expect(formatKitchenAmount(0.5, 'l')).toBe('0.5 L');
  });

  it('never shows a positive amount as 0', () => {
    expect(formatKitchenAmount(0.001, 'tsp')).toBe('1/8 tsp');
    expect(formatKitchenAmount(0.001, 'g')).toBe('0.5 g');
    expect(formatKitchenAmount(0.01, 'each')).toBe('1/4');
  });

  it('never shows a positive amount as 0, for any amount and unit (fast-check)', () => {
    fc.assert(
      fc.property(
        fc.double({ min: Number.MIN_VALUE, max: 1e4, noNaN: true }),
        fc.constantFrom(...INGREDIENT_UNITS),
        (value, unit) => {
          expect(roundKitchenAmount(value, unit)).toBeGreaterThan(0);
          expect(formatKitchenAmount(value, unit)).not.toMatch(/^0( |$)/);
        },
      ),
    );
  });

  it.each([
    [Number.NaN, 'cup', /amount must be a finite number/],
    [-0.5, 'cup', /amount must not be negative/],
    [1, 'pinch', /unit must be one of/],
  ])('formatKitchenAmount(%s, %s) throws a RangeError', (value, unit, message) => {
    expect(() => formatKitchenAmount(value, unit as IngredientUnit)).toThrow(RangeError);
    expect(() => formatKitchenAmount(value, unit as IngredientUnit)).toThrow(message);
  });
});

describe('roundKitchenAmount', () => {
  it('rounding up never gives less than the amount (fast-check)', () => {
    fc.assert(
      fc.property(fc.double({ min: 0, max: 1e4, noNaN: true }), fc.constantFrom(...INGREDIENT_UNITS), (value, unit) => {
        expect(roundKitchenAmount(value, unit, 'up')).toBeGreaterThanOrEqual(value - 1e-9);
      }),
    );
  });

  it('rounding up moves to the next measure, not the nearest: 2.01 cups becomes 2 1/8', () => {
    expect(roundKitchenAmount(2.01, 'cup', 'up')).toBe(2.125);
    expect(roundKitchenAmount(2.01, 'cup')).toBe(2);
  });

  it('does not let floating-point noise push an exact amount up a step', () => {
    expect(roundKitchenAmount(0.1 * 3 * 10, 'cup', 'up')).toBe(3);
  });
});
