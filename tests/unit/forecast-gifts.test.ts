import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import {
  addDays,
  forecastProduct,
  restockSuggestions,
  type FinishedPortion,
  type ForecastJar,
  type GivenJar,
} from '@shared/domain';

// Our own household's pear butter in half-pints (16 tbsp, common practice); values worked by hand from the rule:
// the eating rate is what was finished in the 84 days before today, and a jar given away is not eaten.
const today = '2026-12-20';
const sealed = (n: number): ForecastJar[] =>
  Array.from({ length: n }, () => ({ productId: 'pear', state: 'sealed', remainingTbsp: 16 }));
// 84 tbsp over the 84 days before today: 1 tbsp a day. 2026-09-27 is today - 84 days.
const eaten: FinishedPortion[] = [
  { productId: 'pear', finishedOn: '2026-09-27', tbsp: 42 },
  { productId: 'pear', finishedOn: '2026-12-19', tbsp: 42 },
];
// A generous December: six jars given in the fortnight before today, and one on the day itself.
const december: GivenJar[] = [
  ...Array.from({ length: 6 }, (_, i) => ({ productId: 'pear', givenOn: addDays(today, -1 - 2 * i) })),
  { productId: 'pear', givenOn: today },
];

const forecast = (given: GivenJar[], jars = sealed(4)) =>
  forecastProduct({ productId: 'pear', today, horizonDays: 14, jars, finished: eaten, given, planned: [] });

describe('the forecast counts gifts apart from what was eaten', () => {
  it('keeps the eating rate of the same history with or without a generous December', () => {
    const without = forecast([]);
    const withGifts = forecast(december);
    expect(without.historyTbspPerDay).toBe(1);
    expect(withGifts.historyTbspPerDay).toBe(1);
    expect(withGifts.dailyTbsp).toBe(without.dailyTbsp);
    // Gifts inside the 84 days are counted apart; today's is not in the history yet, like a jar finished today.
    expect(withGifts.givenJarsInHistory).toBe(6);
    expect(without.givenJarsInHistory).toBe(0);
    // Four sealed jars (64 tbsp) at 1 tbsp a day cover today and the 63 days after; day 64 (2027-02-22) cannot.
    expect(withGifts.runOutOn).toBe('2027-02-22');
  });

  it('counts only the product’s own gifts, inside the window, both ends checked', () => {
    const edges: GivenJar[] = [
      { productId: 'pear', givenOn: addDays(today, -84) },
      { productId: 'pear', givenOn: addDays(today, -85) },
      { productId: 'plum', givenOn: addDays(today, -3) },
    ];
    expect(forecast(edges).givenJarsInHistory).toBe(1);
  });

  it('never moves the rate, whatever the gifts, and passes them on through the restock suggestions', () => {
    const day = fc.integer({ min: -200, max: 0 }).map((offset) => addDays(today, offset));
    const gifts = fc.array(fc.record({ productId: fc.constantFrom('pear', 'plum'), givenOn: day }), { maxLength: 40 });
    fc.assert(
      fc.property(gifts, (given) => {
        const base = forecast([]);
        const withGifts = forecast(given);
        expect(withGifts.historyTbspPerDay).toBe(base.historyTbspPerDay);
        expect(withGifts.runOutOn).toBe(base.runOutOn);
      }),
    );
    const { forecasts } = restockSuggestions({
      today,
      products: [{ id: 'pear', favourite: true, minJars: 2, harvestMonths: [9], jarSize: 'half-pint' }],
      jars: sealed(4),
      finished: eaten,
      given: december,
      planned: [],
    });
    expect(forecasts[0]).toMatchObject({ historyTbspPerDay: 1, givenJarsInHistory: 6 });
  });

  it('refuses a gift without a real date, as the other inputs do', () => {
    expect(() =>
      restockSuggestions({
        today,
        products: [],
        jars: [],
        finished: [],
        given: [{ productId: 'pear', givenOn: '2026-02-30' }],
        planned: [],
      }),
    ).toThrow(/given\[0\]\.givenOn/);
  });
});
