import { describe, expect, it } from 'vitest';
import {
  amountIn,
  convertMass,
  convertVolume,
  feetToMeters,
  GRAMS_PER_POUND,
  KPA_PER_PSI,
  METERS_PER_FOOT,
  metersToFeet,
  ML_PER_US_CUP,
  ML_PER_US_TBSP,
  psiToKpa,
} from '@shared/domain';
import {
  altitudeWords,
  amountWords,
  headspaceWords,
  jarSizeWords,
  parseAltitude,
  pressureWords,
  tbspPerDay,
  tbspWords,
} from '@shared/words';

function expectClose(actual: number, expected: number, relative = 1e-12): void {
  expect(Math.abs(actual - expected)).toBeLessThanOrEqual(Math.max(Math.abs(expected), 1e-9) * relative);
}

describe('the published factors', () => {
  // NIST Handbook 44 (2024), Appendix C, units of volume: 1 cup = 236.5882365 mL, 1 tablespoon = 14.78676478125 mL.
  it('has the US cup and tablespoon of NIST Handbook 44', () => {
    expect(ML_PER_US_CUP).toBeCloseTo(236.5882365, 10);
    expect(ML_PER_US_TBSP).toBeCloseTo(14.78676478125, 12);
    expectClose(convertVolume(1, 'cup', 'ml'), 236.5882365);
    expectClose(convertVolume(1, 'tbsp', 'ml'), 14.78676478125);
    expectClose(convertVolume(236.5882365, 'ml', 'cup'), 1);
  });

  // NIST SP 811 (2008), Appendix B.8: pound (avoirdupois) = 0.45359237 kg exactly; ounce = 28.349523125 g.
  it('has the avoirdupois pound and ounce of NIST SP 811', () => {
    expect(GRAMS_PER_POUND).toBe(453.59237);
    expectClose(convertMass(1, 'lb', 'g'), 453.59237);
    expectClose(convertMass(1, 'oz', 'g'), 28.349523125);
    expectClose(convertMass(1, 'kg', 'lb'), 1 / 0.45359237);
  });

  // NIST SP 811 (2008), Appendix B.8: foot = 0.3048 m exactly; pound-force per square inch = 6.894757 kPa.
  it('has the foot and the psi of NIST SP 811', () => {
    expect(METERS_PER_FOOT).toBe(0.3048);
    expectClose(feetToMeters(1000), 304.8);
    expectClose(metersToFeet(0.3048), 1);
    expect(KPA_PER_PSI).toBe(6.894757);
    expectClose(psiToKpa(10), 68.94757);
  });
});

describe('amounts in the household’s system', () => {
  it('shows customary volumes and weights in metric, and back', () => {
    // 6 cups x 236.5882365 mL (NIST HB 44) = 1,419.529419 mL.
    const sugar = amountIn(6, 'cup', 'metric');
    expect(sugar.unit).toBe('l');
    expectClose(sugar.value, 1.419529419);
    expect(amountWords(6, 'cup', 'metric')).toBe('1.42 L');
    // 2 tbsp x 14.78676478125 mL (NIST HB 44) = 29.57 mL, written to the milliliter.
    expect(amountWords(2, 'tbsp', 'metric')).toBe('30 mL');
    // 5 lb x 453.59237 g (NIST SP 811) = 2,267.96 g.
    expect(amountWords(5, 'lb', 'metric')).toBe('2.27 kg');
    expect(amountWords(4, 'oz', 'metric')).toBe('115 g');
    // 250 mL / 236.5882365 mL a cup (NIST HB 44) = 1.0567 cups, measured as 1 cup.
    expect(amountWords(250, 'ml', 'us')).toBe('1 cup');
    // 454 g / 453.59237 g a pound (NIST SP 811) = 1.0009 lb.
    expect(amountWords(454, 'g', 'us')).toBe('1 lb');
    expect(amountWords(15, 'ml', 'us')).toBe('1 tbsp');
  });

  it('keeps an amount already in the household’s units, and counts, as they are', () => {
    expect(amountWords(1.5, 'cup', 'us')).toBe('1 1/2 cups');
    expect(amountWords(500, 'g', 'metric')).toBe('500 g');
    expect(amountWords(3, 'each', 'metric')).toBe('3');
    expect(amountIn(3, 'each', 'us')).toEqual({ value: 3, unit: 'each' });
  });

  it('writes spoons and rates of use in milliliters in metric', () => {
    expect(tbspWords(2, 'metric')).toBe('30 mL');
    expect(tbspWords(2, 'us')).toBe('2 tbsp');
    // 0.5 tbsp x 14.78676478125 mL = 7.39 mL.
    expect(tbspPerDay(0.5, 'metric')).toBe('7.4 mL a day');
    expect(tbspPerDay(0.5, 'us')).toBe('0.5 tbsp a day');
  });
});

describe('canning numbers in the household’s system', () => {
  it('keeps jar trade names and puts the milliliters beside them in metric', () => {
    // A pint is 16 US fl oz x 29.5735295625 mL (NIST HB 44) = 473.18 mL.
    expect(jarSizeWords('pint', 'metric')).toBe('pint (473 mL)');
    expect(jarSizeWords('half-pint', 'metric')).toBe('half-pint (237 mL)');
    expect(jarSizeWords('quart', 'metric')).toBe('quart (946 mL)');
    expect(jarSizeWords('quart', 'us')).toBe('quart');
  });

  it('keeps pounds of pressure, the gauge’s unit, with kPa beside them in metric', () => {
    // 11 psi x 6.894757 kPa (NIST SP 811) = 75.84 kPa; 10 psi = 68.95 kPa.
    expect(pressureWords(11, false, 'metric')).toBe('11 pounds of pressure (76 kPa)');
    expect(pressureWords(10, true, 'metric')).toBe('10 lb (69 kPa)');
    expect(pressureWords(11)).toBe('11 pounds of pressure');
  });

  it('writes altitude in meters and headspace in millimeters in metric', () => {
    // 2,350 ft x 0.3048 m (NIST SP 811) = 716.28 m; 1/2 inch x 25.4 mm = 12.7 mm.
    expect(altitudeWords(2350, 'metric')).toBe('716 m');
    expect(altitudeWords(2350, 'us')).toBe('2,350 ft');
    expect(headspaceWords(0.5, 'metric')).toBe('13 mm');
    expect(headspaceWords(0.25, 'metric')).toBe('6 mm');
    expect(headspaceWords(0.5, 'us')).toBe('1/2 inch');
  });

  it('reads a typed altitude into whole feet', () => {
    // 716 m / 0.3048 m a foot (NIST SP 811) = 2,349.08 ft.
    expect(parseAltitude('716', 'metric')).toBe(2349);
    expect(parseAltitude('1,000 m', 'metric')).toBe(3281);
    expect(parseAltitude('2,350', 'us')).toBe(2350);
    expect(parseAltitude('2350 ft', 'us')).toBe(2350);
    expect(parseAltitude('high', 'us')).toBeNull();
    expect(parseAltitude('', 'metric')).toBeNull();
  });
});
