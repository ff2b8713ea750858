import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { addDays, allocateWeek, useBy, type AllocationJar, type PlannedPortion } from '@shared/domain';

// Our own household's pear butter and courgette relish; every expected value is worked by hand from the contract.
const today = '2025-06-02';
const jar = (overrides: Partial<AllocationJar> & Pick<AllocationJar, 'id'>): AllocationJar => ({
  productId: 'pear-butter',
  state: 'sealed',
  capacityTbsp: 16,
  remainingTbsp: 16,
  bestBy: '2026-05-01',
  useWithinDays: 21,
  ...overrides,
});
const portion = (id: string, date: string, tbsp: number, productId = 'pear-butter'): PlannedPortion => ({
  id,
  date,
  productId,
  tbsp,
});

describe('allocateWeek (worked by hand from the contract)', () => {
  it('draws from the opened jar first, then opens the sealed jar with the earliest best-by', () => {
    const result = allocateWeek({
      today,
      jars: [
        jar({ id: 'B', bestBy: '2026-01-10' }),
        jar({ id: 'A', state: 'opened', openedOn: '2025-05-20', remainingTbsp: 6 }),
        jar({ id: 'C', bestBy: '2025-11-03' }),
      ],
      portions: [portion('p2', '2025-06-04', 4), portion('p1', '2025-06-03', 4)],
    });
    expect(result).toEqual({
      assignments: [
        { portionId: 'p1', jarId: 'A', tbsp: 4 },
        { portionId: 'p2', jarId: 'A', tbsp: 2 },
        { portionId: 'p2', jarId: 'C', tbsp: 2 },
      ],
      openings: [{ jarId: 'C', date: '2025-06-04' }],
      warnings: [],
    });
  });

  it('ignores portions dated before today and serves one dated today', () => {
    const result = allocateWeek({
      today,
      jars: [jar({ id: 'A' })],
      portions: [portion('yesterday', '2025-06-01', 3), portion('today', today, 2)],
    });
    expect(result.assignments).toEqual([{ portionId: 'today', jarId: 'A', tbsp: 2 }]);
  });

  it('serves portions of the same day in id order', () => {
    const result = allocateWeek({
      today,
      jars: [jar({ id: 'A', state: 'opened', openedOn: today, remainingTbsp: 3 })],
      portions: [portion('p-b', '2025-06-03', 2), portion('p-a', '2025-06-03', 2)],
    });
    expect(result.assignments[0]).toEqual({ portionId: 'p-a', jarId: 'A', tbsp: 2 });
    expect(result.assignments[1]).toEqual({ portionId: 'p-b', jarId: 'A', tbsp: 1 });
  });

  it('among opened jars uses the earliest use-by first, then the lower id', () => {
    const result = allocateWeek({
      today,
      jars: [
        jar({ id: 'late', state: 'opened', openedOn: '2025-06-01', remainingTbsp: 8 }),
        jar({ id: 'soon-2', state: 'opened', openedOn: '2025-05-20', remainingTbsp: 1 }),
        jar({ id: 'soon-1', state: 'opened', openedOn: '2025-05-20', remainingTbsp: 1 }),
      ],
      portions: [portion('p1', today, 3)],
    });
    expect(result.assignments.map((assignment) => assignment.jarId)).toEqual(['soon-1', 'soon-2', 'late']);
  });

  it('opens the oldest sealed jar first even when its best-by has passed', () => {
    const result = allocateWeek({
      today,
      jars: [jar({ id: 'newer', bestBy: '2025-12-01' }), jar({ id: 'older', bestBy: '2025-01-15' })],
      portions: [portion('p1', today, 2)],
    });
    expect(result.openings).toEqual([{ jarId: 'older', date: today }]);
  });

  it('never draws from an opened jar past its use-by, and warns it will expire with food left', () => {
    // Opened 2025-05-15, 21 days: use-by 2025-06-05. 2 tbsp on 06-03 leaves 8; the 06-07 portion opens a new jar.
    const result = allocateWeek({
      today,
      jars: [jar({ id: 'A', state: 'opened', openedOn: '2025-05-15', remainingTbsp: 10 }), jar({ id: 'B' })],
      portions: [portion('p1', '2025-06-03', 2), portion('p2', '2025-06-07', 2)],
    });
    expect(result.assignments).toEqual([
      { portionId: 'p1', jarId: 'A', tbsp: 2 },
      { portionId: 'p2', jarId: 'B', tbsp: 2 },
    ]);
    expect(result.warnings).toEqual([
      { kind: 'will-expire', productId: 'pear-butter', jarId: 'A', date: '2025-06-05', tbsp: 8 },
    ]);
  });

  it('warns about a jar the plan opens when its use-by falls before the last planned date', () => {
    // Opened by the plan on 06-02 with 2 use-within days: use-by 06-04, 15 tbsp left after that day.
    const result = allocateWeek({
      today,
      jars: [jar({ id: 'J1', useWithinDays: 2, bestBy: '2025-09-01' }), jar({ id: 'J2', useWithinDays: 2 })],
      portions: [portion('p1', today, 1), portion('p2', '2025-06-09', 1)],
    });
    expect(result.openings).toEqual([
      { jarId: 'J1', date: today },
      { jarId: 'J2', date: '2025-06-09' },
    ]);
    expect(result.warnings).toEqual([
      { kind: 'will-expire', productId: 'pear-butter', jarId: 'J1', date: '2025-06-04', tbsp: 15 },
    ]);
  });

  it('includes a use-by on today and on the last planned date, but not after it', () => {
    const result = allocateWeek({
      today,
      jars: [
        jar({ id: 'ends-today', state: 'opened', openedOn: '2025-05-12', remainingTbsp: 4 }),
        jar({ id: 'ends-last-day', state: 'opened', openedOn: '2025-05-15', remainingTbsp: 4 }),
        jar({ id: 'ends-after', state: 'opened', openedOn: '2025-05-16', remainingTbsp: 4 }),
      ],
      portions: [portion('p1', '2025-06-05', 0, 'courgette-relish')],
    });
    expect(
      result.warnings.map((warning) => [warning.kind, 'jarId' in warning ? warning.jarId : null, warning.date]),
    ).toEqual([
      ['will-expire', 'ends-today', '2025-06-02'],
      ['will-expire', 'ends-last-day', '2025-06-05'],
    ]);
  });

  it('reports a shortfall with a null jar and a short warning, after drawing what there is', () => {
    const result = allocateWeek({
      today,
      jars: [jar({ id: 'A', remainingTbsp: 4 }), jar({ id: 'R', productId: 'courgette-relish' })],
      portions: [portion('p1', '2025-06-03', 10)],
    });
    expect(result.assignments).toEqual([
      { portionId: 'p1', jarId: 'A', tbsp: 4 },
      { portionId: 'p1', jarId: null, tbsp: 6 },
    ]);
    expect(result.warnings).toEqual([
      { kind: 'short', productId: 'pear-butter', date: '2025-06-03', tbsp: 6, portionId: 'p1' },
    ]);
  });

  it('skips empty jars and jars already finished or discarded', () => {
    const result = allocateWeek({
      today,
      jars: [
        jar({ id: 'empty', remainingTbsp: 0, bestBy: '2025-01-01' }),
        { ...jar({ id: 'gone', remainingTbsp: 0 }), state: 'finished' as never },
        jar({ id: 'full' }),
      ],
      portions: [portion('p1', today, 1)],
    });
    expect(result.assignments).toEqual([{ portionId: 'p1', jarId: 'full', tbsp: 1 }]);
  });
});

describe('allocateWeek refuses malformed input with a RangeError', () => {
  it.each<[string, AllocationJar[], PlannedPortion[], RegExp]>([
    [
      'an opened jar without openedOn',
      [jar({ id: 'A', state: 'opened' })],
      [],
      /jars\[0\] is opened but has no openedOn date/,
    ],
    ['more left than the jar holds', [jar({ id: 'A', remainingTbsp: 20 })], [], /more than the jar holds/],
    ['a part day of use-within', [jar({ id: 'A', useWithinDays: 1.5 })], [], /useWithinDays must be a whole number/],
    [
      'an impossible best-by',
      [jar({ id: 'A', bestBy: '2025-02-30' })],
      [],
      /bestBy 2025-02-30 is not a real calendar date/,
    ],
    ['an unknown state', [jar({ id: 'A', state: 'cracked' as never })], [], /state must be one of/],
    ['the same jar twice', [jar({ id: 'A' }), jar({ id: 'A' })], [], /jar id A appears more than once/],
    ['a negative portion', [], [portion('p1', today, -2)], /portions\[0\].tbsp must not be negative/],
    ['a portion with no real date', [], [portion('p1', '2025-06-31', 2)], /not a real calendar date/],
  ])('%s', (_, jars, portions, message) => {
    expect(() => allocateWeek({ today, jars, portions })).toThrow(RangeError);
    expect(() => allocateWeek({ today, jars, portions })).toThrow(message);
  });

  it('an impossible today', () => {
    expect(() => allocateWeek({ today: '2025-6-2', jars: [], portions: [] })).toThrow(
      /today must be a date written YYYY-MM-DD/,
    );
  });
});

describe('allocateWeek properties (fast-check)', () => {
  const products = ['pear-butter', 'courgette-relish'];
  const halfTbsp = (max: number) => fc.integer({ min: 0, max: max * 2 }).map((halves) => halves / 2);
  const jarArbitrary = fc
    .record({
      productId: fc.constantFrom(...products),
      opened: fc.boolean(),
      capacityTbsp: fc.constantFrom(8, 16, 32),
      fill: fc.double({ min: 0, max: 1, noNaN: true }),
      bestByOffset: fc.integer({ min: -120, max: 400 }),
      openedAgo: fc.integer({ min: 0, max: 40 }),
      useWithinDays: fc.integer({ min: 0, max: 30 }),
    })
    .map((drawn) => ({
      productId: drawn.productId,
      state: drawn.opened ? ('opened' as const) : ('sealed' as const),
      capacityTbsp: drawn.capacityTbsp,
      remainingTbsp: Math.floor(drawn.fill * drawn.capacityTbsp * 2) / 2,
      bestBy: addDays(today, drawn.bestByOffset),
      openedOn: drawn.opened ? addDays(today, -drawn.openedAgo) : undefined,
      useWithinDays: drawn.useWithinDays,
    }));
  const portionArbitrary = fc.record({
    productId: fc.constantFrom(...products),
    dayOffset: fc.integer({ min: -3, max: 10 }),
    tbsp: halfTbsp(20),
  });
  const week = fc
    .tuple(fc.array(jarArbitrary, { maxLength: 8 }), fc.array(portionArbitrary, { maxLength: 15 }))
    .map(([jars, portions]) => ({
      today,
      jars: jars.map((drawn, index) => ({ id: `jar-${index}`, ...drawn })),
      portions: portions.map((drawn, index) => ({
        id: `portion-${index}`,
        productId: drawn.productId,
        date: addDays(today, drawn.dayOffset),
        tbsp: drawn.tbsp,
      })),
    }));

  it('never assigns more than a jar holds', () => {
    fc.assert(
      fc.property(week, (input) => {
        const { assignments } = allocateWeek(input);
        for (const shelfJar of input.jars) {
          const drawn = assignments.filter((a) => a.jarId === shelfJar.id).reduce((sum, a) => sum + a.tbsp, 0);
          expect(drawn).toBeLessThanOrEqual(shelfJar.remainingTbsp + 1e-9);
          expect(drawn).toBeLessThanOrEqual(shelfJar.capacityTbsp + 1e-9);
        }
      }),
    );
  });

  it('never uses a jar past its use-by, nor a sealed jar before the plan opens it', () => {
    fc.assert(
      fc.property(week, (input) => {
        const { assignments, openings } = allocateWeek(input);
        for (const assignment of assignments) {
          if (assignment.jarId === null) continue;
          const shelfJar = input.jars.find((candidate) => candidate.id === assignment.jarId)!;
          const served = input.portions.find((candidate) => candidate.id === assignment.portionId)!;
          expect(served.productId).toBe(shelfJar.productId);
          const openedOn = shelfJar.openedOn ?? openings.find((opening) => opening.jarId === shelfJar.id)!.date;
          expect(served.date >= openedOn || shelfJar.state === 'opened').toBe(true);
          expect(served.date <= useBy(openedOn, shelfJar.useWithinDays)).toBe(true);
        }
        for (const opening of openings) {
          expect(input.jars.find((candidate) => candidate.id === opening.jarId)!.state).toBe('sealed');
        }
        expect(new Set(openings.map((opening) => opening.jarId)).size).toBe(openings.length);
      }),
    );
  });

  it('assigned plus short equals what was planned, for every portion from today on', () => {
    fc.assert(
      fc.property(week, (input) => {
        const { assignments, warnings } = allocateWeek(input);
        for (const planned of input.portions) {
          const mine = assignments.filter((assignment) => assignment.portionId === planned.id);
          const total = mine.reduce((sum, assignment) => sum + assignment.tbsp, 0);
          expect(total).toBeCloseTo(planned.date >= today ? planned.tbsp : 0, 9);
          const short = mine.filter((assignment) => assignment.jarId === null).reduce((sum, a) => sum + a.tbsp, 0);
          const warned = warnings
            .filter((w) => w.kind === 'short' && w.portionId === planned.id)
            .reduce((sum, w) => sum + w.tbsp, 0);
          expect(warned).toBeCloseTo(short, 9);
        }
      }),
    );
  });
});
