import { describe, expect, it } from 'vitest';
import {
  BOILING_WATER_ALTITUDE_TABLE,
  PROCESSING_METHODS,
  SAFETY_CAUTIONS,
  processingPlan,
  type JarSize,
  type Method,
  type ProcessingPlanInput,
} from '@shared/domain';

// The base time is the recipe's own input; the checks below are the published additions and pressures.
const BASE_MINUTES = 10;
const acidPint = { jarSize: 'pint' as JarSize, baseMinutes: BASE_MINUTES, acidified: true };

const USDA = 'USDA Complete Guide, AIB 539 (2015), Guide 1';
const STEAM = 'University of Wisconsin-Madison research, Willmore et al. 2015';

// Every row of the boiling-water table at and across its boundaries.
const BOILING_WATER_ROWS: [altitudeFt: number, addMinutes: number][] = [
  [0, 0],
  [1_000, 0],
  [1_001, 5],
  [3_000, 5],
  [3_001, 10],
  [6_000, 10],
  [6_001, 15],
  [8_000, 15],
  [8_001, 20],
  [10_000, 20],
];

// Every row of the pressure table at and across its boundaries: [altitude, dial psi, weighted psi].
const PRESSURE_ROWS: [altitudeFt: number, dialPsi: number, weightedPsi: number][] = [
  [0, 11, 10],
  [1_000, 11, 10],
  [1_001, 11, 15],
  [2_000, 11, 15],
  [2_001, 12, 15],
  [4_000, 12, 15],
  [4_001, 13, 15],
  [6_000, 13, 15],
  [6_001, 14, 15],
  [8_000, 14, 15],
  [8_001, 15, 15],
  [10_000, 15, 15],
];

describe(`boiling-water canner altitude additions (${USDA})`, () => {
  it.each(BOILING_WATER_ROWS)(`at %d ft adds %d minutes (${USDA})`, (altitudeFt, addMinutes) => {
    const plan = processingPlan({ method: 'boiling-water', altitudeFt, ...acidPint });
    expect(plan).toMatchObject({ allowed: true, minutes: BASE_MINUTES + addMinutes, pressurePsi: null, reasons: [] });
    expect(plan.altitudeAddMinutes).toBe(addMinutes);
  });

  it(`refuses at 10,001 ft, above the highest published row (${USDA}), still saying no minutes`, () => {
    const plan = processingPlan({ method: 'boiling-water', altitudeFt: 10_001, ...acidPint });
    expect(plan.allowed).toBe(false);
    expect(plan.minutes).toBeNull();
    expect(plan.reasons.join(' ')).toMatch(/10,000 ft/);
  });

  it(`counts below sea level as 0-1,000 ft (${USDA}: the first row starts at 0 ft)`, () => {
    expect(processingPlan({ method: 'boiling-water', altitudeFt: -200, ...acidPint }).minutes).toBe(BASE_MINUTES);
  });

  it(`publishes the general table as the Guide gives it (${USDA})`, () => {
    expect(BOILING_WATER_ALTITUDE_TABLE.map((row) => [row.upToFt, row.addMinutes])).toEqual([
      [1_000, 0],
      [3_000, 5],
      [6_000, 10],
      [8_000, 15],
      [10_000, 20],
    ]);
  });
});

describe(`pressure canner pounds per square inch (${USDA})`, () => {
  it.each(PRESSURE_ROWS)(
    `at %d ft: dial gauge %d psi, weighted gauge %d psi (${USDA})`,
    (altitudeFt, dialPsi, weightedPsi) => {
      const lowAcid = { altitudeFt, jarSize: 'quart' as JarSize, baseMinutes: BASE_MINUTES };
      expect(processingPlan({ method: 'pressure-dial', ...lowAcid })).toMatchObject({
        allowed: true,
        minutes: BASE_MINUTES,
        pressurePsi: dialPsi,
      });
      expect(processingPlan({ method: 'pressure-weighted', ...lowAcid })).toMatchObject({
        allowed: true,
        minutes: BASE_MINUTES,
        pressurePsi: weightedPsi,
      });
    },
  );

  it.each<Method>(['pressure-dial', 'pressure-weighted'])(
    `%s refuses at 10,001 ft (${USDA}), keeping the minutes`,
    (method) => {
      const plan = processingPlan({ method, altitudeFt: 10_001, jarSize: 'pint', baseMinutes: BASE_MINUTES });
      expect(plan).toMatchObject({ allowed: false, minutes: BASE_MINUTES, pressurePsi: null });
      expect(plan.reasons).toHaveLength(1);
    },
  );

  it('is allowed for low-acid food with no pH given: that is what a pressure canner is for (US FDA, 21 CFR Part 114)', () => {
    expect(
      processingPlan({ method: 'pressure-dial', altitudeFt: 500, jarSize: 'pint', baseMinutes: 25, ph: 6.2 }).allowed,
    ).toBe(true);
  });
});

describe('acid foods only in boiling water and steam (US FDA, 21 CFR Part 114: acid at pH 4.6 or below)', () => {
  it.each<Method>(['boiling-water', 'atmospheric-steam'])('%s allows pH 4.6 and refuses pH 4.61', (method) => {
    const input = { method, altitudeFt: 0, jarSize: 'pint' as JarSize, baseMinutes: BASE_MINUTES };
    expect(processingPlan({ ...input, ph: 4.6 }).allowed).toBe(true);
    const refused = processingPlan({ ...input, ph: 4.61 });
    expect(refused).toMatchObject({ allowed: false, minutes: BASE_MINUTES });
    expect(refused.reasons.join(' ')).toMatch(/pH of 4\.61 is above 4\.6/);
  });

  it('refuses when neither pH nor acidified says the food is acid', () => {
    const input = {
      method: 'boiling-water' as Method,
      altitudeFt: 0,
      jarSize: 'pint' as JarSize,
      baseMinutes: BASE_MINUTES,
    };
    expect(processingPlan(input).allowed).toBe(false);
    expect(processingPlan({ ...input, acidified: false }).allowed).toBe(false);
    expect(processingPlan({ ...input, acidified: true }).allowed).toBe(true);
  });

  it('lets a measured pH win over the acidified flag', () => {
    const input = {
      method: 'boiling-water' as Method,
      altitudeFt: 0,
      jarSize: 'pint' as JarSize,
      baseMinutes: BASE_MINUTES,
    };
    expect(processingPlan({ ...input, ph: 5.0, acidified: true }).allowed).toBe(false);
    expect(processingPlan({ ...input, ph: 3.5, acidified: false }).allowed).toBe(true);
  });
});

describe(`atmospheric steam canner limits (${STEAM})`, () => {
  const steam = (overrides: Partial<ProcessingPlanInput>) =>
    processingPlan({
      method: 'atmospheric-steam',
      altitudeFt: 0,
      jarSize: 'pint',
      baseMinutes: BASE_MINUTES,
      acidified: true,
      ...overrides,
    });

  it(`uses the boiling-water time with its altitude adjustment (${STEAM}; additions: ${USDA})`, () => {
    for (const [altitudeFt, addMinutes] of BOILING_WATER_ROWS) {
      expect(steam({ altitudeFt }).minutes).toBe(BASE_MINUTES + addMinutes);
    }
  });

  it(`allows a process of exactly 45 minutes in all and refuses 46 (${STEAM})`, () => {
    expect(steam({ baseMinutes: 25, altitudeFt: 9_000 })).toMatchObject({ allowed: true, minutes: 45 });
    const refused = steam({ baseMinutes: 26, altitudeFt: 9_000 });
    expect(refused).toMatchObject({ allowed: false, minutes: 46 });
    expect(refused.reasons.join(' ')).toMatch(/45 minutes/);
  });

  it(`refuses when the altitude addition is what takes it past 45 minutes (${STEAM})`, () => {
    expect(steam({ baseMinutes: 41, altitudeFt: 1_000 })).toMatchObject({ allowed: true, minutes: 41 });
    expect(steam({ baseMinutes: 41, altitudeFt: 1_001 })).toMatchObject({ allowed: false, minutes: 46 });
  });

  it(`allows jars up to a quart and refuses a half-gallon (${STEAM})`, () => {
    expect(steam({ jarSize: 'quart' }).allowed).toBe(true);
    const refused = steam({ jarSize: 'half-gallon' });
    expect(refused.allowed).toBe(false);
    expect(refused.reasons.join(' ')).toMatch(/up to a quart/);
  });

  it(`only for acid foods (${STEAM})`, () => {
    expect(steam({ acidified: false }).allowed).toBe(false);
  });

  it('gives every reason that applies at once', () => {
    expect(steam({ jarSize: 'half-gallon', acidified: false, baseMinutes: 60 }).reasons).toHaveLength(3);
  });
});

describe("a recipe's own altitude table (worked by hand from the contract)", () => {
  const recipeTable = [
    { upToFt: 1_000, addMinutes: 0 },
    { upToFt: 6_000, addMinutes: 5 },
  ];

  it('wins over the general table', () => {
    const plan = processingPlan({
      method: 'boiling-water',
      altitudeFt: 5_000,
      ...acidPint,
      altitudeTable: recipeTable,
    });
    expect(plan).toMatchObject({ allowed: true, minutes: BASE_MINUTES + 5 });
  });

  it('is read in altitude order whatever order its rows come in', () => {
    const plan = processingPlan({
      method: 'boiling-water',
      altitudeFt: 500,
      ...acidPint,
      altitudeTable: [...recipeTable].reverse(),
    });
    expect(plan.minutes).toBe(BASE_MINUTES);
  });

  it('refuses where the table does not reach the altitude, with no minutes', () => {
    const plan = processingPlan({
      method: 'boiling-water',
      altitudeFt: 6_001,
      ...acidPint,
      altitudeTable: recipeTable,
    });
    expect(plan).toMatchObject({ allowed: false, minutes: null });
    expect(plan.reasons.join(' ')).toMatch(/stops at 6,000 ft/);
  });
});

describe('cautions and after-processing steps', () => {
  it.each(PROCESSING_METHODS)('%s always carries the usual safety cautions, allowed or not', (method) => {
    for (const altitudeFt of [0, 12_000]) {
      const plan = processingPlan({ method, altitudeFt, ...acidPint });
      expect(plan.cautions).toEqual(expect.arrayContaining([...SAFETY_CAUTIONS]));
      expect(plan.afterProcessing.length).toBeGreaterThan(0);
    }
  });

  it('the usual cautions: tested recipes, never reduce acid, altitude, seals, when in doubt throw it out, defer to extension services', () => {
    const text = SAFETY_CAUTIONS.join(' ');
    for (const words of [
      /tested recipes/,
      /Never reduce/,
      /altitude/,
      /seal/,
      /When in doubt, throw it out/,
      /extension service/,
    ]) {
      expect(text).toMatch(words);
    }
  });

  // After processing: common practice, from memory (REFERENCE.md); the tested recipe's own steps win.
  it('boiling water waits 5 minutes with the lid off before lifting jars (common practice, from memory)', () => {
    expect(processingPlan({ method: 'boiling-water', altitudeFt: 0, ...acidPint }).afterProcessing.join(' ')).toMatch(
      /5 minutes/,
    );
  });

  it('pressure canners depressurise by themselves, then wait 10 minutes (common practice, from memory)', () => {
    const steps = processingPlan({ method: 'pressure-weighted', altitudeFt: 0, ...acidPint }).afterProcessing.join(' ');
    expect(steps).toMatch(/depressurise by itself/);
    expect(steps).toMatch(/10 minutes/);
  });

  it('every method ends with 12-24 hours of cooling and a seal test (common practice, from memory)', () => {
    for (const method of PROCESSING_METHODS) {
      expect(processingPlan({ method, altitudeFt: 0, ...acidPint }).afterProcessing.join(' ')).toMatch(
        /12 to 24 hours.*seal/,
      );
    }
  });
});

describe('processingPlan refuses malformed input with a RangeError', () => {
  const valid: ProcessingPlanInput = {
    method: 'boiling-water',
    altitudeFt: 0,
    jarSize: 'pint',
    baseMinutes: 10,
    acidified: true,
  };
  it.each<[string, Partial<Record<keyof ProcessingPlanInput, unknown>>, RegExp]>([
    ['an unknown method', { method: 'oven' }, /method must be one of/],
    ['a NaN altitude', { altitudeFt: Number.NaN }, /altitudeFt must be a finite number/],
    ['an unknown jar size', { jarSize: 'litre' }, /jarSize must be one of/],
    ['negative base minutes', { baseMinutes: -5 }, /baseMinutes must not be negative/],
    ['a pH above 14', { ph: 14.5 }, /ph must be between 0 and 14/],
    ['a pH below 0', { ph: -1 }, /ph must be between 0 and 14/],
    ['an acidified flag that is not true or false', { acidified: 'yes' }, /acidified must be true or false/],
    [
      'a recipe table row with a negative addition',
      { altitudeTable: [{ upToFt: 1000, addMinutes: -5 }] },
      /addMinutes must not be negative/,
    ],
  ])('%s', (_, overrides, message) => {
    expect(() => processingPlan({ ...valid, ...overrides } as ProcessingPlanInput)).toThrow(RangeError);
    expect(() => processingPlan({ ...valid, ...overrides } as ProcessingPlanInput)).toThrow(message);
  });
});
