// Keyboard moves jump from place to place on the board instead of by pixels: left and right between
// days, up and down between slots (for meals) or planned meals (for products and entries).
import { SLOTS, type Slot } from '@shared/choices';
import type { WeekDay } from '@shared/schemas/week';
import { slotId, type DragSource } from './drag';

export interface Place {
  id: string;
  slot: Slot;
}

/** For each visible day, the places a dragged thing can land, top to bottom. */
export function placesByDay(days: WeekDay[], source: DragSource): Place[][] {
  return days.map((day) =>
    SLOTS.flatMap((slot) => {
      const entries = day.entries
        .filter((e) => e.slot === slot)
        .sort((a, b) => a.position - b.position)
        .map((e) => ({ id: e.id, slot }));
      if (source.type === 'meal') return [{ id: slotId(day.date, slot), slot }];
      if (source.type === 'product') return entries;
      return [...entries, { id: slotId(day.date, slot), slot }];
    }),
  );
}

/** The next place for an arrow key, or null to stay; with no place yet, the first one. */
export function nextPlace(grid: Place[][], current: string | null, key: string): string | null {
  const firstDay = grid.findIndex((places) => places.length > 0);
  if (firstDay < 0) return null;
  const day = current === null ? -1 : grid.findIndex((places) => places.some((p) => p.id === current));
  if (day < 0) return grid[firstDay][0].id;
  const places = grid[day];
  const index = places.findIndex((p) => p.id === current);
  if (key === 'ArrowDown') return places[Math.min(index + 1, places.length - 1)].id;
  if (key === 'ArrowUp') return places[Math.max(index - 1, 0)].id;
  if (key !== 'ArrowLeft' && key !== 'ArrowRight') return null;
  const step = key === 'ArrowRight' ? 1 : -1;
  for (let d = day + step; d >= 0 && d < grid.length; d += step) {
    if (grid[d].length === 0) continue;
    // Keep to the same slot where the next day has it; otherwise its first place.
    const sameSlot = grid[d].filter((p) => p.slot === places[index].slot);
    return (sameSlot.at(-1) ?? grid[d][0]).id;
  }
  return current;
}
