import { SLOTS } from '@shared/choices';
import type { PlanEntryView, WeekView } from '@shared/schemas/week';

/** Whether everyone eating the meal keeps to a heat at least the product's (diet flags come from the server). */
function heatSuits(week: WeekView, entry: PlanEntryView, heat: number): boolean {
  const eaters = entry.eaters === null ? week.members : week.members.filter((m) => entry.eaters!.includes(m.userId));
  return eaters.every((eater) => eater.heatTolerance >= heat);
}

/**
 * The first planned meal from today to a jar's use-by, in day and slot order, that does not pair the product yet,
 * is not too hot for anyone at it, and is not a meal the product is already flagged on elsewhere this week.
 */
export function nextMealFor(week: WeekView, productId: string, useBy: string): PlanEntryView | null {
  const heat = week.products.find((p) => p.id === productId)?.heat ?? 0;
  const flaggedTitles = new Set(week.days.flatMap((d) => d.entries.filter((e) => e.pairings.some((p) => p.productId === productId && p.flags.length > 0)).map((e) => e.title)));
  const candidates = week.days
    .filter((day) => day.date >= week.today && day.date <= useBy)
    .flatMap((day) => [...day.entries].sort((a, b) => SLOTS.indexOf(a.slot) - SLOTS.indexOf(b.slot) || a.position - b.position))
    .filter((entry) => !entry.pairings.some((p) => p.productId === productId) && !flaggedTitles.has(entry.title) && heatSuits(week, entry, heat));
  return candidates[0] ?? null;
}
