// Pure edits of a cached week, applied before the server answers and undone if it refuses.
import type { PlanEntryView, Slot, WeekView } from '@shared/schemas/week';

export function entriesOf(week: WeekView, date: string, slot: Slot): PlanEntryView[] {
  return (week.days.find((d) => d.date === date)?.entries ?? [])
    .filter((e) => e.slot === slot)
    .sort((a, b) => a.position - b.position);
}

export function findEntry(week: WeekView, id: string): PlanEntryView | undefined {
  return week.days.flatMap((d) => d.entries).find((e) => e.id === id);
}

/** Rebuilds each day from one list of entries, renumbering every slot 0, 1, 2, ... */
function withEntries(week: WeekView, entries: PlanEntryView[]): WeekView {
  return {
    ...week,
    days: week.days.map((day) => ({ ...day, entries: entries.filter((e) => e.date === day.date) })),
  };
}

function renumber(list: PlanEntryView[]): PlanEntryView[] {
  return list.map((e, position) => ({ ...e, position }));
}

export function placeEntry(
  week: WeekView,
  entry: PlanEntryView,
  date: string,
  slot: Slot,
  position?: number,
): WeekView {
  const rest = week.days.flatMap((d) => d.entries).filter((e) => e.id !== entry.id);
  const sameSlot = entry.date === date && entry.slot === slot;
  const source = sameSlot
    ? []
    : renumber(
        rest.filter((e) => e.date === entry.date && e.slot === entry.slot).sort((a, b) => a.position - b.position),
      );
  const target = rest.filter((e) => e.date === date && e.slot === slot).sort((a, b) => a.position - b.position);
  const at = Math.max(0, Math.min(position ?? target.length, target.length));
  target.splice(at, 0, { ...entry, date, slot });
  const touched = new Set([...source, ...target].map((e) => e.id));
  const others = rest.filter((e) => !touched.has(e.id));
  return withEntries(week, [...others, ...source, ...renumber(target)]);
}

export function removeEntry(week: WeekView, id: string): WeekView {
  const entry = findEntry(week, id);
  if (!entry) return week;
  const rest = week.days.flatMap((d) => d.entries).filter((e) => e.id !== id);
  const slot = renumber(
    rest.filter((e) => e.date === entry.date && e.slot === entry.slot).sort((a, b) => a.position - b.position),
  );
  const ids = new Set(slot.map((e) => e.id));
  return withEntries(week, [...rest.filter((e) => !ids.has(e.id)), ...slot]);
}

export function changeEntry(
  week: WeekView,
  id: string,
  change: Partial<Pick<PlanEntryView, 'servings' | 'title' | 'eaters' | 'pairings'>>,
): WeekView {
  return {
    ...week,
    days: week.days.map((day) => ({
      ...day,
      entries: day.entries.map((e) => (e.id === id ? { ...e, ...change } : e)),
    })),
  };
}

export function changePairing(week: WeekView, pairingId: string, change: { tbspPerServing: number } | null): WeekView {
  return {
    ...week,
    days: week.days.map((day) => ({
      ...day,
      entries: day.entries.map((e) => ({
        ...e,
        pairings:
          change === null
            ? e.pairings.filter((p) => p.id !== pairingId)
            : e.pairings.map((p) => (p.id === pairingId ? { ...p, ...change } : p)),
      })),
    })),
  };
}

export function clearDate(week: WeekView, date: string): WeekView {
  return { ...week, days: week.days.map((day) => (day.date === date ? { ...day, entries: [] } : day)) };
}

/** An id for an entry the server has not numbered yet; the refetch replaces it. */
export const pendingId = () => `pending-${Math.random().toString(36).slice(2)}`;
export const isPending = (id: string) => id.startsWith('pending-');
