import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { JAR_SIZES, jarSizeAdvice } from '@shared/domain';

// Jar capacities are nominal (common practice): quarter-pint 8 tbsp, half-pint 16, twelve-ounce 24, pint 32,
// pint-and-a-half 48, quart 64. Expected sizes worked by hand from the contract.
describe('jarSizeAdvice', () => {
  it('picks the largest jar eaten within its use-within days: 1 tbsp a day for 30 days fits 24 tbsp, a twelve-ounce jar', () => {
    expect(jarSizeAdvice(1, 30)).toEqual({ size: 'twelve-ounce', cautions: [] });
  });

  it('a jar that is finished exactly on its last day fits: 0.5 tbsp a day for 32 days is a half-pint', () => {
    expect(jarSizeAdvice(0.5, 32).size).toBe('half-pint');
    expect(jarSizeAdvice(0.5, 31).size).toBe('quarter-pint');
  });

  it('never advises more than a quart, however fast the jar goes', () => {
    expect(jarSizeAdvice(100, 30)).toEqual({ size: 'quart', cautions: [] });
  });

  it('advises a quarter-pint with a caution where even that is too big', () => {
    const advice = jarSizeAdvice(0.1, 21);
    expect(advice.size).toBe('quarter-pint');
    expect(advice.cautions).toHaveLength(1);
    expect(advice.cautions[0]).toMatch(/80 days/);
  });

  it('advises no size, with a caution, where nothing is eaten', () => {
    const advice = jarSizeAdvice(0, 30);
    expect(advice.size).toBeNull();
    expect(advice.cautions).toHaveLength(1);
  });

  it('a higher rate never gives a smaller jar (fast-check)', () => {
    fc.assert(
      fc.property(
        fc.double({ min: 0, max: 50, noNaN: true }),
        fc.double({ min: 0, max: 50, noNaN: true }),
        fc.integer({ min: 0, max: 60 }),
        (a, b, days) => {
          const [slow, fast] = [Math.min(a, b), Math.max(a, b)];
          const slowSize = jarSizeAdvice(slow, days).size;
          const fastSize = jarSizeAdvice(fast, days).size;
          if (slowSize !== null && fastSize !== null) {
            expect(JAR_SIZES.indexOf(fastSize)).toBeGreaterThanOrEqual(JAR_SIZES.indexOf(slowSize));
          }
        },
      ),
    );
  });

  it.each([
    [Number.NaN, 30, /dailyTbsp must be a finite number/],
    [-1, 30, /dailyTbsp must not be negative/],
    [1, 2.5, /useWithinDays must be a whole number/],
    [1, -1, /useWithinDays must be at least 0/],
  ])('jarSizeAdvice(%s, %s) throws a RangeError', (rate, days, message) => {
    expect(() => jarSizeAdvice(rate, days)).toThrow(RangeError);
    expect(() => jarSizeAdvice(rate, days)).toThrow(message);
  });
});
