import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import {
  BEST_QUALITY_MONTHS,
  UNSEALED_JAR_ADVICE,
  addDays,
  addMonths,
  bestQualityBy,
  daysBetween,
  useBy,
} from '@shared/domain';

const NCHFP = 'NCHFP, "Storing Home Canned Foods"';

describe(`bestQualityBy (${NCHFP}: use within one year for best quality)`, () => {
  it(`defaults to one year (${NCHFP})`, () => {
    expect(BEST_QUALITY_MONTHS).toBe(12);
    expect(bestQualityBy('2024-09-14')).toBe('2025-09-14');
  });

  it('clamps a month end: Feb 29 plus 12 months is Feb 28 (contract)', () => {
    expect(bestQualityBy('2024-02-29', 12)).toBe('2025-02-28');
  });

  it('takes other month counts and clamps to the shorter month (Gregorian calendar)', () => {
    expect(bestQualityBy('2025-08-31', 6)).toBe('2026-02-28');
    expect(bestQualityBy('2023-08-31', 6)).toBe('2024-02-29');
    expect(bestQualityBy('2025-01-31', 3)).toBe('2025-04-30');
    expect(bestQualityBy('2025-05-20', 0)).toBe('2025-05-20');
  });

  it.each([
    ['2025-02-29', 12, /cannedOn 2025-02-29 is not a real calendar date/],
    ['2025-13-01', 12, /not a real calendar date/],
    ['2025-9-14', 12, /cannedOn must be a date written YYYY-MM-DD/],
    ['2025-09-14', 1.5, /months must be a whole number/],
    ['2025-09-14', -1, /months must be at least 0/],
  ])('bestQualityBy(%s, %s) throws a RangeError', (cannedOn, months, message) => {
    expect(() => bestQualityBy(cannedOn, months)).toThrow(RangeError);
    expect(() => bestQualityBy(cannedOn, months)).toThrow(message);
  });
});

describe('useBy: the last day to eat from an opened jar (worked by hand on the Gregorian calendar)', () => {
  it('counts use-within days from the day it was opened', () => {
    expect(useBy('2025-03-01', 0)).toBe('2025-03-01');
    expect(useBy('2025-03-01', 21)).toBe('2025-03-22');
    expect(useBy('2024-12-25', 30)).toBe('2025-01-24');
    expect(useBy('2024-02-20', 10)).toBe('2024-03-01');
  });

  it('does not drift across daylight-saving changes: dates are calendar days, not clock times', () => {
    expect(useBy('2025-03-08', 1)).toBe('2025-03-09');
    expect(useBy('2025-03-29', 1)).toBe('2025-03-30');
    expect(useBy('2025-10-25', 2)).toBe('2025-10-27');
    expect(useBy('2025-11-01', 2)).toBe('2025-11-03');
  });

  it('gives the same dates whatever time zone the process runs in', () => {
    const original = process.env.TZ;
    try {
      for (const zone of ['Pacific/Auckland', 'America/Los_Angeles', 'Asia/Kolkata', 'UTC']) {
        process.env.TZ = zone;
        expect(useBy('2025-03-08', 1)).toBe('2025-03-09');
        expect(bestQualityBy('2024-02-29')).toBe('2025-02-28');
        expect(daysBetween('2025-03-01', '2025-11-30')).toBe(274);
      }
    } finally {
      if (original === undefined) delete process.env.TZ;
      else process.env.TZ = original;
    }
  });

  it.each([
    ['2025-04-31', 7, /openedOn 2025-04-31 is not a real calendar date/],
    ['opened yesterday', 7, /openedOn must be a date written YYYY-MM-DD/],
    ['2025-04-01', 2.5, /useWithinDays must be a whole number/],
    ['2025-04-01', -3, /useWithinDays must be at least 0/],
    ['2025-04-01', Number.NaN, /useWithinDays must be a finite number/],
  ])('useBy(%s, %s) throws a RangeError', (openedOn, days, message) => {
    expect(() => useBy(openedOn, days)).toThrow(RangeError);
    expect(() => useBy(openedOn, days)).toThrow(message);
  });
});

describe('calendar date helpers (fast-check)', () => {
  const isoDate = fc
    .date({ min: new Date('1990-01-01T00:00:00Z'), max: new Date('2090-12-31T00:00:00Z'), noInvalidDate: true })
    .map((date) => date.toISOString().slice(0, 10));

  it('adding n days and counting the days between gives n back', () => {
    fc.assert(
      fc.property(isoDate, fc.integer({ min: -5000, max: 5000 }), (date, days) => {
        expect(daysBetween(date, addDays(date, days))).toBe(days);
      }),
    );
  });

  it('adding months keeps the day of the month or clamps it to the month end', () => {
    fc.assert(
      fc.property(isoDate, fc.integer({ min: 0, max: 60 }), (date, months) => {
        const later = addMonths(date, months);
        const day = Number(date.slice(8));
        const laterDay = Number(later.slice(8));
        expect(laterDay).toBeLessThanOrEqual(day);
        if (laterDay < day) expect(addDays(later, 1).slice(8)).toBe('01');
      }),
    );
  });
});

describe(`unsealed jars (${NCHFP})`, () => {
  it('advises refrigerating and using within several days, or reprocessing within 24 hours', () => {
    expect(UNSEALED_JAR_ADVICE).toMatch(/[Rr]efrigerate/);
    expect(UNSEALED_JAR_ADVICE).toMatch(/within several days/);
    expect(UNSEALED_JAR_ADVICE).toMatch(/reprocess it within 24 hours/);
  });
});
