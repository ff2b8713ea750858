import { SLOTS } from '@shared/choices';
import type { MealView, PlanEntryView, WeekView } from '@shared/schemas/week';

/** Whether everyone eating the meal keeps to a heat at least the product's (diet flags come from the server). */
function heatSuits(week: WeekView, entry: PlanEntryView, heat: number): boolean {
  const eaters = entry.eaters === null ? week.members : week.members.filter((m) => entry.eaters!.includes(m.userId));
  return eaters.every((eater) => eater.heatTolerance >= heat);
}

/**
 * The first planned meal from today to a jar's use-by, in day and slot order, that suits the product: the meal
 * usually has it, or already has a preserve of the same kind (a relish where a relish goes, not ketchup on yogurt).
 * It must not pair the product yet, be too hot for anyone at it, or be a meal the product is flagged on this week.
 */
export function nextMealFor(week: WeekView, meals: MealView[], productId: string, useBy: string): PlanEntryView | null {
  const product = week.products.find((p) => p.id === productId);
  if (!product) return null;
  const kindOf = new Map(week.products.map((p) => [p.id, p.kind]));
  const usualMeals = new Set(
    meals.filter((meal) => meal.products.some((p) => p.productId === productId)).map((meal) => meal.id),
  );
  const flaggedTitles = new Set(
    week.days.flatMap((d) =>
      d.entries
        .filter((e) => e.pairings.some((p) => p.productId === productId && p.flags.length > 0))
        .map((e) => e.title),
    ),
  );
  const suits = (entry: PlanEntryView) =>
    (entry.mealId !== null && usualMeals.has(entry.mealId)) ||
    entry.pairings.some((p) => kindOf.get(p.productId) === product.kind);
  return (
    week.days
      .filter((day) => day.date >= week.today && day.date <= useBy)
      .flatMap((day) =>
        [...day.entries].sort((a, b) => SLOTS.indexOf(a.slot) - SLOTS.indexOf(b.slot) || a.position - b.position),
      )
      .find(
        (entry) =>
          suits(entry) &&
          !entry.pairings.some((p) => p.productId === productId) &&
          !flaggedTitles.has(entry.title) &&
          heatSuits(week, entry, product.heat),
      ) ?? null
  );
}
