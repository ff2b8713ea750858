// What can be dragged on the week board, where it can land, and how that is said aloud.
import type { Announcements } from '@dnd-kit/core';
import type { MealView, PlanEntryView, Slot, WeekProduct } from '@shared/schemas/week';
import { SLOT_NAMES, weekdayWords } from '@shared/words';

export type DragSource =
  | { type: 'meal'; meal: MealView }
  | { type: 'product'; product: WeekProduct }
  | { type: 'entry'; entry: PlanEntryView };
export type DropTarget = { type: 'slot'; date: string; slot: Slot } | { type: 'entry'; entry: PlanEntryView };
/** What a tap picks up to put down with a second tap: a meal from the library or a product from the shelf rail. */
export type Held = Extract<DragSource, { type: 'meal' | 'product' }>;

export const SLOT_LABELS: Record<Slot, string> = SLOT_NAMES;
export const slotId = (date: string, slot: Slot) => `slot:${date}:${slot}`;
export const weekday = (date: string) => weekdayWords(date);

export function sourceLabel(source: DragSource | undefined): string {
  if (!source) return 'The item';
  return source.type === 'meal'
    ? source.meal.name
    : source.type === 'product'
      ? source.product.name
      : source.entry.title;
}

export function targetLabel(target: DropTarget | undefined): string {
  if (!target) return 'nowhere';
  if (target.type === 'slot') return `${weekday(target.date)} ${target.slot}`;
  return `${target.entry.title} on ${weekday(target.entry.date)} ${target.entry.slot}`;
}

/** Whether a dragged thing may land on a target: products pair with planned meals, meals and entries go to slots. */
export function accepts(source: DragSource | undefined, target: DropTarget | undefined): boolean {
  if (!source || !target) return false;
  if (source.type === 'product') return target.type === 'entry';
  return source.type === 'meal' || target.type !== 'entry' || target.entry.id !== source.entry.id;
}

/** The line said while something is picked up by a tap: what it is and what to tap next. */
export function heldLine(held: Held): string {
  return held.type === 'meal'
    ? `${held.meal.name} is picked. Tap a day's slot to put it there, or Cancel.`
    : `${held.product.name} is picked. Tap a planned meal to pair it, or Cancel.`;
}

/** The line said once a tap or a menu has put something down. */
export function putLine(source: Held, target: DropTarget): string {
  return source.type === 'product'
    ? `${source.product.name} is paired with ${targetLabel(target)}.`
    : `${source.meal.name} is on ${targetLabel(target)}.`;
}

const data = <T>(thing: { data: { current?: unknown } } | null | undefined) => thing?.data.current as T | undefined;

export const announcements: Announcements = {
  onDragStart: ({ active }) =>
    `Picked up ${sourceLabel(data<DragSource>(active))}. Use the arrow keys to move it, Space to drop it, Escape to cancel.`,
  onDragOver: ({ active, over }) =>
    over
      ? `${sourceLabel(data<DragSource>(active))} is over ${targetLabel(data<DropTarget>(over))}.`
      : `${sourceLabel(data<DragSource>(active))} is not over a place it can go.`,
  onDragEnd: ({ active, over }) =>
    over
      ? `${sourceLabel(data<DragSource>(active))} was dropped on ${targetLabel(data<DropTarget>(over))}.`
      : `${sourceLabel(data<DragSource>(active))} was put back.`,
  onDragCancel: ({ active }) => `Moving ${sourceLabel(data<DragSource>(active))} was canceled; nothing changed.`,
};

export const screenReaderInstructions = {
  draggable:
    'To move this, press Space or Enter. Arrow keys move between days (left and right) and between slots or meals (up and down). Press Space or Enter to drop, Escape to cancel.',
};
