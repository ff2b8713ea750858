import { readFileSync, readdirSync } from 'node:fs';
import { fileURLToPath } from 'node:url';
import { describe, expect, it } from 'vitest';
import {
  countdown,
  dateWords,
  headspaceWords,
  heatWords,
  inCanner,
  INGREDIENT_ROLE_NAMES,
  INGREDIENT_UNIT_NAMES,
  jarSizeWords,
  labelDateWords,
  METHOD_NAMES,
  monthDayWords,
  monthWords,
  pressureWords,
  weekdayWords,
} from '@shared/words';

describe('one date formatter', () => {
  // Library: date-fns 4 with its en-US locale; 2026-06-09 is a Tuesday (checked against any calendar).
  it('writes a date as "Tue, Jun 9" within the year, with the year otherwise', () => {
    expect(dateWords('2026-06-09', 2026)).toBe('Tue, Jun 9');
    expect(dateWords('2027-08-31', 2026)).toBe('Tue, Aug 31, 2027');
    expect(monthDayWords('2026-12-07')).toBe('Dec 7');
    expect(weekdayWords('2026-12-07')).toBe('Monday');
    expect(weekdayWords('2026-12-07', true)).toBe('M');
    expect(monthWords('2026-09')).toBe('Sep');
  });

  it('refuses what is not a date, as the platform does ("Invalid time value"), naming the value', () => {
    for (const bad of ['next spring', '2026-02-30', '2026-13-01', '2026-6-9', ''])
      expect(() => dateWords(bad)).toThrow(new RangeError(`Invalid time value: "${bad}" is not a date (YYYY-MM-DD)`));
    expect(() => monthWords('soon')).toThrow(RangeError);
    expect(dateWords('2028-02-29', 2028)).toBe('Tue, Feb 29');
  });

  // Reference: ECMA-402 Intl.DateTimeFormat with Node's ICU (CLDR en-US), the platform's own formatter: every day of
  // three years (a leap year among them) reads the same in both.
  it("writes every date as the platform's en-US Intl formatter does", () => {
    const intl = (options: Intl.DateTimeFormatOptions, at: Date) =>
      new Intl.DateTimeFormat('en-US', options).format(at);
    const differ: string[] = [];
    for (let at = new Date(2027, 0, 1); at.getFullYear() < 2030; at.setDate(at.getDate() + 1)) {
      const iso = `${at.getFullYear()}-${String(at.getMonth() + 1).padStart(2, '0')}-${String(at.getDate()).padStart(2, '0')}`;
      const pairs: [string, string][] = [
        [
          dateWords(iso, 2028),
          intl(
            {
              weekday: 'short',
              month: 'short',
              day: 'numeric',
              ...(at.getFullYear() === 2028 ? {} : { year: 'numeric' }),
            },
            at,
          ),
        ],
        [labelDateWords(iso), intl({ month: 'short', day: 'numeric', year: 'numeric' }, at)],
        [monthDayWords(iso), intl({ month: 'short', day: 'numeric' }, at)],
        [weekdayWords(iso), intl({ weekday: 'long' }, at)],
        [weekdayWords(iso, true), intl({ weekday: 'narrow' }, at)],
        [monthWords(iso.slice(0, 7)), intl({ month: 'short' }, at)],
      ];
      for (const [ours, platform] of pairs) if (ours !== platform) differ.push(`${iso}: ${ours} / ${platform}`);
    }
    expect(differ).toEqual([]);
  });
});

describe('one unit formatter', () => {
  // Common practice: the trade reads "pounds of pressure" (USDA Complete Guide, Guide 1, says "pounds pressure" in tables; "lb" on a gauge).
  it('says pressure as pounds of pressure, or lb where space is short', () => {
    expect(pressureWords(11)).toBe('11 pounds of pressure');
    expect(pressureWords(15, true)).toBe('15 lb');
  });

  // Published: USDA Complete Guide, Guide 1 glossary and recipes write headspace as fractions of an inch (1/4, 1/2, 1).
  it('writes headspace as the fractions the Guide uses', () => {
    expect(headspaceWords(0.25)).toBe('1/4 inch');
    expect(headspaceWords(0.5)).toBe('1/2 inch');
    expect(headspaceWords(1)).toBe('1 inch');
    expect(headspaceWords(1.25)).toBe('1 1/4 inches');
  });

  // Published: NIST Handbook 44, Appendix C names the US customary units (fluid ounce, teaspoon, tablespoon, cup,
  // pint, quart, gallon; pound and ounce avoirdupois); NIST SP 811 gives the US spelling of liter and milliliter.
  it('spells out every ingredient unit as the handbooks name it, the weight ounce apart from the fluid ounce', () => {
    expect(INGREDIENT_UNIT_NAMES).toEqual({
      tsp: 'teaspoons',
      tbsp: 'tablespoons',
      'fl-oz': 'fluid ounces',
      cup: 'cups',
      pint: 'pints',
      quart: 'quarts',
      gallon: 'gallons',
      ml: 'milliliters',
      l: 'liters',
      lb: 'pounds',
      oz: 'ounces (weight)',
      g: 'grams',
      kg: 'kilograms',
      each: 'each (whole items)',
    });
  });

  // Common practice: scaling keeps the acid (vinegar, lemon juice) to the produce at the tested ratio, so the role
  // names say which ingredients count as each.
  it('names each ingredient role with what belongs in it', () => {
    expect(INGREDIENT_ROLE_NAMES.produce).toBe('Produce (fruit, vegetables)');
    expect(INGREDIENT_ROLE_NAMES.acid).toBe('Acid (vinegar, lemon juice)');
    expect(Object.values(INGREDIENT_ROLE_NAMES).every((name) => /^[A-Z]/.test(name))).toBe(true);
  });

  it('names jar sizes as a cook says them', () => {
    expect(jarSizeWords('twelve-ounce')).toBe('12-ounce');
    expect(jarSizeWords('pint-and-half')).toBe('pint-and-a-half');
  });
});

describe('one name for each thing', () => {
  it('names every canner once, and puts it in a sentence in lower case', () => {
    expect(METHOD_NAMES['pressure-dial']).toBe('Pressure canner, dial gauge');
    expect(inCanner('boiling-water')).toBe('in a boiling-water canner');
  });

  it('says the heat scale one way', () => {
    expect(heatWords(3)).toBe('heat 3 of 5, hot');
    expect(heatWords(0, true)).toBe('0 of 5: no heat');
  });

  it('counts down an opened jar in one set of words and tones', () => {
    expect(countdown(-2)).toEqual({ text: 'Past use-by by 2 days', tone: 'past' });
    expect(countdown(0)).toEqual({ text: 'Use today', tone: 'soon' });
    expect(countdown(1)).toEqual({ text: '1 day left', tone: 'soon' });
    expect(countdown(9)).toEqual({ text: '9 days left', tone: 'info' });
  });
});

// The client's first screen imports these words, and e-mails import them on the server: they stay light and pure.
describe('shared/words stays pure', () => {
  const folder = fileURLToPath(new URL('../../shared/words/', import.meta.url));
  const files = readdirSync(folder).filter((file) => file.endsWith('.ts'));
  it.each(files)('%s imports only its neighbors, the domain or date-fns', (file) => {
    const specifiers = [...readFileSync(folder + file, 'utf8').matchAll(/\bfrom\s+['"]([^'"]+)['"]/g)].map(
      (m) => m[1]!,
    );
    for (const specifier of specifiers)
      expect(
        specifier.startsWith('./') || specifier.startsWith('../domain') || specifier === 'date-fns',
        `${file}: ${specifier}`,
      ).toBe(true);
  });
});
