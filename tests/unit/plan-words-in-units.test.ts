// The processing plan's cautions and reasons, and the headspace field, in the household's units: the domain keeps
// inches and feet, and the words convert at the edge.
import { describe, expect, it } from 'vitest';
import { BOILING_WATER_COVER_INCHES, cautionsFor, MM_PER_INCH, processingPlan } from '@shared/domain';
import { recipeProcessingPlan, type PlanRecipe } from '@shared/processing-plan';
import {
  headspaceInputValue,
  headspaceUnitWords,
  parseHeadspace,
  planQuantities,
  waterDepthWords,
} from '@shared/words';

const acidPint = { jarSize: 'pint' as const, baseMinutes: 10, acidified: true };

describe('the water over the jars in a boiling-water canner', () => {
  // USDA Complete Guide to Home Canning (2015), Guide 1: the jars stay covered by at least 1 inch of water.
  it('is the 1 inch of the USDA Complete Guide (2015)', () => {
    expect(BOILING_WATER_COVER_INCHES).toBe(1);
  });

  // NIST SP 811 (2008), Appendix B.8: 1 inch = 2.54 cm exactly, so 1 inch is 2.5 cm to the millimetre.
  it('is written "1 inch" in US customary and "2.5 cm" in metric', () => {
    expect(MM_PER_INCH).toBe(25.4);
    expect(waterDepthWords(1, 'us')).toBe('1 inch');
    expect(waterDepthWords(2, 'us')).toBe('2 inches');
    expect(waterDepthWords(1, 'metric')).toBe('2.5 cm');
    // NIST SP 811: 2 in = 50.8 mm, 5.1 cm to the millimetre.
    expect(waterDepthWords(2, 'metric')).toBe('5.1 cm');
  });

  it('reaches the plan’s cautions in the household’s units, and nowhere says inches in metric', () => {
    const us = processingPlan({ method: 'boiling-water', altitudeFt: 0, ...acidPint });
    const metric = processingPlan({
      method: 'boiling-water',
      altitudeFt: 0,
      ...acidPint,
      quantities: planQuantities('metric'),
    });
    expect(us.cautions.join(' ')).toMatch(/covered by at least 1 inch of water/);
    expect(metric.cautions.join(' ')).toMatch(/covered by at least 2\.5 cm of water/);
    expect([...metric.cautions, ...metric.afterProcessing].join(' ')).not.toMatch(/\binch/);
    // Left out, the words are US customary, as before.
    expect(cautionsFor('boiling-water')).toEqual(us.cautions);
    expect(cautionsFor('boiling-water', planQuantities('us'))).toEqual(us.cautions);
  });
});

describe('the steam canner’s jar limit and the altitude in the plan’s words', () => {
  // Willmore et al. (2015), University of Wisconsin-Madison: jars up to a quart. The quart is 32 US fl oz
  // x 29.5735295625 mL (NIST Handbook 44, Appendix C) = 946.35 mL.
  it('names the quart with its millilitres in metric', () => {
    expect(cautionsFor('atmospheric-steam', planQuantities('metric')).join(' ')).toMatch(
      /Jars up to a quart \(946 mL\) only/,
    );
    expect(cautionsFor('atmospheric-steam').join(' ')).toMatch(/Jars up to a quart only/);
    const tooBig = processingPlan({
      method: 'atmospheric-steam',
      altitudeFt: 0,
      ...acidPint,
      jarSize: 'half-gallon',
      quantities: planQuantities('metric'),
    });
    // Half-gallon = 64 fl oz = 1,892.7 mL (NIST Handbook 44).
    expect(tooBig.reasons.join(' ')).toMatch(/up to a quart \(946 mL\); a half-gallon \(1,893 mL\) jar is bigger/);
  });

  // 10,000 ft x 0.3048 m (NIST SP 811) = 3,048 m; the 10,000 ft limit is the USDA Complete Guide's (2015) highest row.
  it('names the highest tested altitude in meters for a metric household', () => {
    const recipe: PlanRecipe = {
      method: 'boiling-water',
      baseMinutes: { pint: 10 },
      ph: null,
      acidified: true,
      altitudeTable: null,
    };
    const metric = recipeProcessingPlan(recipe, {
      method: 'boiling-water',
      jarSize: 'pint',
      altitudeFt: 12_000,
      unitSystem: 'metric',
    });
    expect(metric.allowed).toBe(false);
    expect(metric.reasons.join(' ')).toMatch(/above 3,048 m/);
    expect(metric.cautions.join(' ')).toMatch(/2\.5 cm of water/);
    const us = recipeProcessingPlan(recipe, { method: 'boiling-water', jarSize: 'pint', altitudeFt: 12_000 });
    expect(us.reasons.join(' ')).toMatch(/above 10,000 ft/);
    expect(us.cautions.join(' ')).toMatch(/1 inch of water/);
  });
});

describe('the headspace field in the household’s units', () => {
  it('is called inches or mm', () => {
    expect(headspaceUnitWords('us')).toBe('inches');
    expect(headspaceUnitWords('metric')).toBe('mm');
  });

  // NIST SP 811 (2008), Appendix B.8: 1 inch = 25.4 mm exactly. 1/4 in = 6.35 mm, 1/2 in = 12.7 mm,
  // 1 1/4 in = 31.75 mm; the trade's headspaces are 1/4, 1/2, 1 and 1 1/4 inch (USDA Complete Guide 2015).
  it('shows the stored inches in mm, exact for the trade’s headspaces', () => {
    expect(headspaceInputValue(0.25, 'metric')).toBe('6.35');
    expect(headspaceInputValue(0.5, 'metric')).toBe('12.7');
    expect(headspaceInputValue(1, 'metric')).toBe('25.4');
    expect(headspaceInputValue(1.25, 'metric')).toBe('31.75');
    expect(headspaceInputValue(0.5, 'us')).toBe('0.5');
  });

  it('reads typed mm back into the stored inches, and a value saved unchanged keeps its inches', () => {
    expect(headspaceInputValue(0.125, 'metric')).toBe('3.175');
    for (const inches of [0.0625, 0.125, 0.25, 0.5, 1, 1.25, 2]) {
      expect(parseHeadspace(headspaceInputValue(inches, 'metric'), 'metric')).toBe(inches);
    }
    // 13 mm / 25.4 mm an inch (NIST SP 811) = 0.5118 in.
    expect(parseHeadspace('13', 'metric')).toBe(0.5118);
    expect(parseHeadspace('13 mm', 'metric')).toBe(0.5118);
    expect(parseHeadspace('12,7', 'metric')).toBe(0.5);
    expect(parseHeadspace('0.5', 'us')).toBe(0.5);
    expect(parseHeadspace('1/2', 'us')).toBeNull();
    expect(parseHeadspace('', 'metric')).toBeNull();
    expect(parseHeadspace('about 6', 'metric')).toBeNull();
  });
});
