import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import {
  addDays,
  endOfNextHarvestMonth,
  restockSuggestions,
  type FinishedPortion,
  type ForecastJar,
  type PlannedDraw,
  type RestockInput,
  type RestockProduct,
} from '@shared/domain';

// Our own household's courgette relish in half-pints (16 tbsp, common practice); expected values worked by hand
// from the contract.
const today = '2025-03-10';
const relish: RestockProduct = {
  id: 'relish',
  favourite: true,
  minJars: 2,
  harvestMonths: [8, 9],
  jarSize: 'half-pint',
};
const sealed = (remainingTbsp = 16): ForecastJar => ({ productId: 'relish', state: 'sealed', remainingTbsp });
const opened = (remainingTbsp: number): ForecastJar => ({ productId: 'relish', state: 'opened', remainingTbsp });
// 84 tbsp over the 84 days before today: 1 tbsp a day. 2024-12-16 is today - 84 days, 2025-03-09 is today - 1.
const oneTbspADay: FinishedPortion[] = [
  { productId: 'relish', finishedOn: '2024-12-16', tbsp: 42 },
  { productId: 'relish', finishedOn: '2025-03-09', tbsp: 42 },
];
const ask = (overrides: Partial<RestockInput>) =>
  restockSuggestions({ today, products: [relish], jars: [], finished: [], planned: [], ...overrides });

describe('restockSuggestions: the forecast (worked by hand from the contract)', () => {
  it('takes the history rate from the 84 days before today, both ends checked', () => {
    const outside: FinishedPortion[] = [
      { productId: 'relish', finishedOn: '2024-12-15', tbsp: 500 },
      { productId: 'relish', finishedOn: today, tbsp: 500 },
      { productId: 'other', finishedOn: '2025-03-01', tbsp: 500 },
    ];
    const [forecast] = ask({ finished: [...oneTbspADay, ...outside] }).forecasts;
    expect(forecast.historyTbspPerDay).toBe(1);
    expect(forecast.dailyTbsp).toBe(1);
  });

  it('runs out on the first day the tablespoons left cannot cover: 20 tbsp at 1 a day lasts 20 days', () => {
    const [forecast] = ask({ jars: [sealed(), opened(4)], finished: oneTbspADay }).forecasts;
    expect(forecast.onHandTbsp).toBe(20);
    expect(forecast.runOutOn).toBe('2025-03-30');
    expect(forecast.projectedJars).toBe(0);
  });

  it('draws planned portions on their days, then the history rate after the last planned date', () => {
    // 03-10 draws 0, 03-11 draws 5 (15 left), then 1 a day covers 03-12 to 03-26; 03-27 cannot be covered.
    const planned: PlannedDraw[] = [{ productId: 'relish', date: '2025-03-11', tbsp: 5 }];
    const [forecast] = ask({ jars: [sealed(), opened(4)], finished: oneTbspADay, planned }).forecasts;
    expect(forecast.runOutOn).toBe('2025-03-27');
    expect(forecast.plannedTbspPerDay).toBe(2.5);
    expect(forecast.dailyTbsp).toBe(2.5);
  });

  it('runs out on a planned day the shelf cannot cover', () => {
    const planned: PlannedDraw[] = [
      { productId: 'relish', date: '2025-03-12', tbsp: 5 },
      { productId: 'relish', date: '2025-03-13', tbsp: 5 },
      { productId: 'relish', date: '2025-03-01', tbsp: 50 },
    ];
    const [forecast] = ask({ jars: [opened(8)], planned }).forecasts;
    expect(forecast.runOutOn).toBe('2025-03-13');
    expect(forecast.dailyTbsp).toBe(2.5);
  });

  it('gives no run-out date where nothing is ever drawn, or the plan is covered and there is no history', () => {
    expect(ask({ jars: [sealed()] }).forecasts[0].runOutOn).toBeNull();
    const planned: PlannedDraw[] = [{ productId: 'relish', date: '2025-03-12', tbsp: 5 }];
    expect(ask({ jars: [sealed()], planned }).forecasts[0].runOutOn).toBeNull();
  });

  it('gives no run-out date where the rate is so small the day could not be written before year 10000', () => {
    const crumbs: FinishedPortion[] = [{ productId: 'relish', finishedOn: '2025-03-09', tbsp: 1e-300 }];
    expect(ask({ jars: [sealed()], finished: crumbs }).forecasts[0].runOutOn).toBeNull();
  });

  it('projects whole jars left after the draw on today + leadDays: 64 - 15 = 49 tbsp is 3 half-pints', () => {
    const [forecast] = ask({ jars: [sealed(), sealed(), sealed(), sealed()], finished: oneTbspADay }).forecasts;
    expect(forecast.projectedJars).toBe(3);
    expect(forecast.sealedJars).toBe(4);
  });

  it('counts sealed and opened jars on hand, never finished or discarded ones', () => {
    const jars: ForecastJar[] = [sealed(), opened(3), { productId: 'relish', state: 'finished', remainingTbsp: 0 }];
    const [forecast] = ask({
      jars: [...jars, { productId: 'relish', state: 'discarded', remainingTbsp: 10 }],
    }).forecasts;
    expect(forecast).toMatchObject({ onHandTbsp: 19, jarsOnHand: 2, sealedJars: 1 });
  });
});

describe('restockSuggestions: reasons and suggested jars (worked by hand from the contract)', () => {
  it("'runs-out-soon' when the run-out date comes strictly before today + leadDays", () => {
    // 13 tbsp at 1 a day runs out on 03-23, the day before 03-24 (today + 14).
    const suggestion = ask({ jars: [opened(13)], finished: oneTbspADay, products: [{ ...relish, minJars: 0 }] })
      .suggestions[0];
    expect(suggestion).toMatchObject({
      productId: 'relish',
      reason: 'runs-out-soon',
      runOutOn: '2025-03-23',
      dailyTbsp: 1,
    });
  });

  it('a run-out exactly on today + leadDays is not soon', () => {
    const result = ask({ jars: [opened(14)], finished: oneTbspADay, products: [{ ...relish, minJars: 0 }] });
    expect(result.forecasts[0].runOutOn).toBe('2025-03-24');
    expect(result.suggestions).toEqual([]);
  });

  it("'below-minimum' when the sealed jars now are fewer than minJars, with jars to last to the end of next harvest month", () => {
    // Next harvest month after March: August, so 2025-03-10 to 2025-08-31 is 175 days at 1 tbsp: 11 half-pints,
    // minus 2 jars on hand, plus 2 minimum = 11.
    const result = ask({ jars: [sealed(), opened(4)], finished: oneTbspADay });
    expect(result.suggestions).toEqual([
      {
        productId: 'relish',
        reason: 'below-minimum',
        runOutOn: '2025-03-30',
        dailyTbsp: 1,
        suggestedJars: 11,
        lastsUntil: '2025-08-31',
      },
    ]);
  });

  it("'below-minimum' when enough jars are sealed now but too few are projected at today + leadDays", () => {
    const result = ask({
      jars: [sealed(), sealed(), sealed(), sealed()],
      finished: oneTbspADay,
      products: [{ ...relish, minJars: 4 }],
    });
    expect(result.suggestions[0]).toMatchObject({ reason: 'below-minimum', suggestedJars: 11 - 4 + 4 });
  });

  it('no suggestion where the shelf is above its minimum now and at the horizon', () => {
    expect(ask({ jars: [sealed(), sealed(), sealed(), sealed()], finished: oneTbspADay }).suggestions).toEqual([]);
  });

  it('suggests at least 1 jar', () => {
    const jars = [opened(16), opened(16), opened(16), opened(16), opened(16)];
    const result = ask({ jars, products: [{ ...relish, minJars: 1 }] });
    expect(result.suggestions[0]).toMatchObject({ reason: 'below-minimum', dailyTbsp: 0, suggestedJars: 1 });
  });

  it('never suggests a batch of a non-favourite, but still forecasts it', () => {
    const result = ask({ jars: [opened(3)], finished: oneTbspADay, products: [{ ...relish, favourite: false }] });
    expect(result.suggestions).toEqual([]);
    expect(result.forecasts[0]).toMatchObject({ productId: 'relish', runOutOn: '2025-03-13', dailyTbsp: 1 });
  });

  it('uses the leadDays given', () => {
    const result = ask({
      jars: [opened(13)],
      finished: oneTbspADay,
      products: [{ ...relish, minJars: 0 }],
      leadDays: 7,
    });
    expect(result.suggestions).toEqual([]);
  });
});

describe('endOfNextHarvestMonth (Gregorian calendar, worked by hand)', () => {
  it.each<[string, number[], string]>([
    ['2025-03-10', [8, 9], '2025-08-31'],
    ['2025-08-05', [8, 9], '2025-09-30'],
    ['2025-10-05', [9, 8], '2026-08-31'],
    ['2025-08-05', [8], '2026-08-31'],
    ['2025-08-05', [], '2025-09-30'],
    ['2025-12-20', [], '2026-01-31'],
    ['2027-01-15', [2], '2027-02-28'],
    ['2028-01-15', [2], '2028-02-29'],
  ])('from %s with harvest months %j: %s', (from, months, expected) => {
    expect(endOfNextHarvestMonth(from, months)).toBe(expected);
  });
});

describe('restockSuggestions properties (fast-check)', () => {
  const input = fc.record({
    jars: fc.array(
      fc.record({
        productId: fc.constant('relish'),
        state: fc.constantFrom('sealed' as const, 'opened' as const),
        remainingTbsp: fc.integer({ min: 0, max: 32 }).map((halves) => halves / 2),
      }),
      { maxLength: 10 },
    ),
    finished: fc.array(
      fc.record({
        productId: fc.constant('relish'),
        finishedOn: fc.integer({ min: 1, max: 84 }).map((ago) => addDays(today, -ago)),
        tbsp: fc.double({ min: 0, max: 30, noNaN: true }),
      }),
      { maxLength: 12 },
    ),
    planned: fc.array(
      fc.record({
        productId: fc.constant('relish'),
        date: fc.integer({ min: 0, max: 20 }).map((days) => addDays(today, days)),
        tbsp: fc.integer({ min: 0, max: 8 }),
      }),
      { maxLength: 10 },
    ),
  });
  const dayOrNever = (date: string | null) => (date === null ? Number.POSITIVE_INFINITY : Date.parse(date));

  it('a higher daily rate never gives a later run-out date', () => {
    fc.assert(
      fc.property(input, fc.double({ min: 1, max: 20, noNaN: true }), (shelf, faster) => {
        const slow = ask(shelf).forecasts[0];
        const quick = ask({
          ...shelf,
          finished: shelf.finished.map((entry) => ({ ...entry, tbsp: entry.tbsp * faster })),
        }).forecasts[0];
        expect(quick.historyTbspPerDay).toBeGreaterThanOrEqual(slow.historyTbspPerDay);
        expect(dayOrNever(quick.runOutOn)).toBeLessThanOrEqual(dayOrNever(slow.runOutOn));
      }),
    );
  });

  it('suggests only for favourites, always at least one jar', () => {
    fc.assert(
      fc.property(input, fc.boolean(), fc.integer({ min: 0, max: 6 }), (shelf, favourite, minJars) => {
        const { suggestions, forecasts } = ask({ ...shelf, products: [{ ...relish, favourite, minJars }] });
        expect(forecasts).toHaveLength(1);
        if (!favourite) expect(suggestions).toEqual([]);
        for (const suggestion of suggestions) expect(suggestion.suggestedJars).toBeGreaterThanOrEqual(1);
      }),
    );
  });
});

describe('restockSuggestions refuses malformed input with a RangeError', () => {
  it.each<[string, Partial<RestockInput>, RegExp]>([
    ['a part day of lead time', { leadDays: 1.5 }, /leadDays must be a whole number/],
    [
      'a thirteenth month',
      { products: [{ ...relish, harvestMonths: [13] }] },
      /harvestMonths\[0\] must be a month from 1 to 12/,
    ],
    ['month 0', { products: [{ ...relish, harvestMonths: [0] }] }, /harvestMonths\[0\] must be at least 1/],
    ['a negative minimum', { products: [{ ...relish, minJars: -1 }] }, /minJars must be at least 0/],
    ['an unknown jar size', { products: [{ ...relish, jarSize: 'crock' as never }] }, /jarSize must be one of/],
    [
      'an unknown jar state',
      { jars: [{ productId: 'relish', state: 'lost' as never, remainingTbsp: 1 }] },
      /state must be one of/,
    ],
    ['a negative amount left', { jars: [opened(-1)] }, /remainingTbsp must not be negative/],
    [
      'an impossible finished date',
      { finished: [{ productId: 'relish', finishedOn: '2025-02-29', tbsp: 1 }] },
      /not a real calendar date/,
    ],
    [
      'a NaN planned portion',
      { planned: [{ productId: 'relish', date: today, tbsp: Number.NaN }] },
      /planned\[0\].tbsp must be a finite number/,
    ],
    ['an impossible today', { today: '10/03/2025' }, /today must be a date written YYYY-MM-DD/],
  ])('%s', (_, overrides, message) => {
    expect(() => ask(overrides)).toThrow(RangeError);
    expect(() => ask(overrides)).toThrow(message);
  });
});
