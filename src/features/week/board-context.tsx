import { createContext, useContext } from 'react';
import type { MealView, WeekView } from '@shared/schemas/week';
import type { useAddPairing } from './api/add-pairing';
import type { useAddRestockTodo } from '@/features/restock';
import type { useClearDay } from './api/clear-day';
import type { useDeletePairing } from './api/delete-pairing';
import type { useDeletePlanEntry } from './api/delete-plan-entry';
import type { useUpdatePairing } from './api/update-pairing';
import type { useUpdatePlanEntry } from './api/update-plan-entry';
import type { DragSource, DropTarget, Held } from './drag';

/** What every part of the board reads: the week, who may change it, and the changes it can make. */
export interface Board {
  hid: string;
  week: WeekView;
  meals: MealView[];
  canEdit: boolean;
  updateEntry: ReturnType<typeof useUpdatePlanEntry>;
  deleteEntry: ReturnType<typeof useDeletePlanEntry>;
  addPairing: ReturnType<typeof useAddPairing>;
  updatePairing: ReturnType<typeof useUpdatePairing>;
  deletePairing: ReturnType<typeof useDeletePairing>;
  clearDay: ReturnType<typeof useClearDay>;
  /** What a tap has picked up, waiting for a second tap on a place. */
  held: Held | null;
  hold: (held: Held | null) => void;
  /** Puts a meal on a slot, a product on a planned meal or a planned meal elsewhere: what a drop, a tap or a menu does. */
  put: (source: DragSource, target: DropTarget) => void;
  restock: {
    todo: ReturnType<typeof useAddRestockTodo>;
    add: (productId: string) => void;
    added: Set<string>;
    refused: Map<string, Error>;
  };
}

export const BoardContext = createContext<Board | null>(null);

export function useBoard(): Board {
  const board = useContext(BoardContext);
  if (!board) throw new Error('useBoard must be used inside the week board');
  return board;
}

export function productName(week: WeekView, productId: string) {
  return week.products.find((p) => p.id === productId)?.name ?? 'a product no longer kept';
}

export function jarCode(week: WeekView, jarId: string | number) {
  return week.jars[String(jarId)]?.code ?? 'on the shelf';
}
