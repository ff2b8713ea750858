import type { SealCheckView } from './batches';
import type { RestockSuggestionView } from './restock';

/** The plan slots, as the week stores them. */
type Slot = 'breakfast' | 'lunch' | 'dinner' | 'snack';

/** One planned portion of today, and the jar it comes from. */
export interface TodayUse {
  portionId: string;
  slot: Slot;
  mealTitle: string;
  productId: string;
  productName: string;
  tbsp: number;
  /** null where the shelf cannot cover it. */
  jarId: string | null;
  jarCode: string | null;
  /** Where that jar is kept (null: no place named, or no jar). */
  jarPlaceName: string | null;
  /** The same in words ("in the Pantry"), null without a place. */
  jarPlaceWords: string | null;
  /** Days left before the use-by of the opened jar it draws from; null for a sealed jar or none. */
  openedJarDaysLeft: number | null;
  /** The jar has to be opened today for this portion. */
  opensToday: boolean;
}

export interface TodayFridgeJar {
  jarId: string;
  code: string;
  productName: string;
  openedOn: string;
  useBy: string;
  daysLeft: number;
  remainingTbsp: number;
  capacityTbsp: number;
}

export interface TodayTodo {
  id: string;
  title: string;
  dueOn: string | null;
  kind: 'plain' | 'restock';
}

export interface TodayView {
  today: string;
  use: TodayUse[];
  /** Tablespoons planned today that no jar on the shelf covers, by product name. */
  short: { productName: string; tbsp: number }[];
  fridge: TodayFridgeJar[];
  fridgeCount: number;
  restock: RestockSuggestionView[];
  myTodos: TodayTodo[];
  openTodoCount: number;
  /** Batches whose jars are cooling or ready for their seal check. */
  sealChecks: SealCheckView[];
}
