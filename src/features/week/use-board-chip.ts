import { useDraggable } from '@dnd-kit/core';
import { useBoard } from './board-context';
import type { Held } from './drag';

/** A library meal or a shelf-rail product on the board: draggable when the person may edit, and whether a tap holds it. */
export function useBoardChip(source: Held) {
  const board = useBoard();
  const id = source.type === 'meal' ? source.meal.id : source.product.id;
  const drag = useDraggable({ id: `${source.type}:${id}`, data: source, disabled: !board.canEdit });
  const held = board.held;
  const picked = held?.type === source.type && (held.type === 'meal' ? held.meal.id : held.product.id) === id;
  return { board, ...drag, picked };
}
