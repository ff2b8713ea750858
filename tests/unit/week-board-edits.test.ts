import { describe, expect, it } from 'vitest';
import type { PlanEntryView, WeekView } from '../../shared/schemas/week';
import { nextPlace, placesByDay } from '../../src/features/week/keyboard-targets';
import { placeEntry, removeEntry } from '../../src/features/week/week-edits';

// Our own two-day plan; each expectation is worked by hand from "positions stay 0, 1, 2, ... in a slot".
const entry = (id: string, date: string, slot: PlanEntryView['slot'], position: number): PlanEntryView => ({
  id,
  date,
  slot,
  position,
  title: id,
  mealId: null,
  servings: 2,
  eaters: null,
  pairings: [],
});
const week = (entries: PlanEntryView[]): WeekView => ({
  start: '2031-03-03',
  end: '2031-03-09',
  today: '2031-03-01',
  weekStartsOn: 1,
  days: ['2031-03-03', '2031-03-04'].map((date) => ({ date, entries: entries.filter((e) => e.date === date) })),
  allocation: { assignments: [], openings: [], warnings: [] },
  jars: {},
  products: [],
  members: [],
});
const layout = (w: WeekView) =>
  w.days.flatMap((d) => d.entries.map((e) => `${e.date.slice(-2)} ${e.slot} ${e.position} ${e.id}`)).sort();

const plan = week([
  entry('soup', '2031-03-03', 'lunch', 0),
  entry('bread', '2031-03-03', 'lunch', 1),
  entry('stew', '2031-03-04', 'lunch', 0),
]);

describe('optimistic moves on the cached week', () => {
  it('moves across days and closes the gap it leaves', () => {
    expect(layout(placeEntry(plan, plan.days[0].entries[0], '2031-03-04', 'lunch', 0))).toEqual([
      '03 lunch 0 bread',
      '04 lunch 0 soup',
      '04 lunch 1 stew',
    ]);
  });

  it('reorders within a slot as the server does (remove, then insert)', () => {
    expect(layout(placeEntry(plan, plan.days[0].entries[0], '2031-03-03', 'lunch', 1))).toEqual([
      '03 lunch 0 bread',
      '03 lunch 1 soup',
      '04 lunch 0 stew',
    ]);
  });

  it('renumbers a slot after a removal', () => {
    expect(layout(removeEntry(plan, 'soup'))).toEqual(['03 lunch 0 bread', '04 lunch 0 stew']);
  });
});

describe('keyboard places', () => {
  it('walks a meal slot by slot down a day and day by day across, keeping the slot', () => {
    const grid = placesByDay(plan.days, {
      type: 'meal',
      meal: { id: 'm', name: 'm', tags: [], usualServings: 2, notes: '', products: [] },
    });
    const first = nextPlace(grid, null, 'ArrowRight');
    expect(first).toBe('slot:2031-03-03:breakfast');
    const lunch = nextPlace(grid, first, 'ArrowDown');
    expect(lunch).toBe('slot:2031-03-03:lunch');
    expect(nextPlace(grid, lunch, 'ArrowRight')).toBe('slot:2031-03-04:lunch');
    expect(nextPlace(grid, 'slot:2031-03-04:lunch', 'ArrowRight')).toBe('slot:2031-03-04:lunch');
  });

  it('moves a product between planned meals only', () => {
    const grid = placesByDay(plan.days, {
      type: 'product',
      product: { id: 'p', name: 'p', kind: 'jam', heat: 0, colour: 'honey', openedJars: 0, sealedJars: 1 },
    });
    expect(nextPlace(grid, null, 'ArrowDown')).toBe('soup');
    expect(nextPlace(grid, 'soup', 'ArrowDown')).toBe('bread');
    expect(nextPlace(grid, 'bread', 'ArrowRight')).toBe('stew');
  });
});
