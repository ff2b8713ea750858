import {
  DndContext,
  DragOverlay,
  type CollisionDetection,
  type DragEndEvent,
  type DragStartEvent,
  type KeyboardCoordinateGetter,
} from '@dnd-kit/core';
import { useEffect, useLayoutEffect, useRef, useState } from 'react';
import type { MealView, Slot, WeekView } from '@shared/schemas/week';
import { Notice } from '@/components/ui/notice';
import { useAddPairing } from '../api/add-pairing';
import { useAddRestockTodo } from '@/features/restock';
import { useClearDay } from '../api/clear-day';
import { useCreatePlanEntry } from '../api/create-plan-entry';
import { useDeletePairing } from '../api/delete-pairing';
import { useDeletePlanEntry } from '../api/delete-plan-entry';
import { useUpdatePairing } from '../api/update-pairing';
import { useUpdatePlanEntry } from '../api/update-plan-entry';
import { BoardContext, type Board } from '../board-context';
import {
  accepts,
  announcements,
  screenReaderInstructions,
  sourceLabel,
  type DragSource,
  type DropTarget,
} from '../drag';
import { nextPlace, placesByDay } from '../keyboard-targets';
import { useBoardSensors } from '../use-board-sensors';
import { useMedia } from '../use-media';
import { useTapPick } from '../use-tap-pick';
import { entriesOf, isPending } from '../week-edits';
import { DayColumn } from './day-column';
import { DayPicker } from './day-picker';
import { HeldBar } from './held-bar';
import { MealLibrary } from './meal-library';
import { ProposalPanel } from './proposal-panel';
import { ShelfRail } from './shelf-rail';
import { TapHint } from './tap-hint';

const sourceOf = (thing: { data: { current?: unknown } } | null | undefined) =>
  thing?.data.current as DragSource | undefined;
const targetOf = (thing: { data: { current?: unknown } } | null | undefined) =>
  thing?.data.current as DropTarget | undefined;

export function WeekBoard({
  hid,
  week,
  meals,
  canEdit,
  firstDay = null,
}: {
  hid: string;
  week: WeekView;
  meals: MealView[];
  canEdit: boolean;
  firstDay?: string | null;
}) {
  const [message, setMessage] = useState<string | null>(null);
  const report = (text: string) => setMessage(text);
  const refuse = (text: string) => {
    report(text);
    return false;
  };
  const start = week.start;
  const createEntry = useCreatePlanEntry(hid, start, report);
  const updateEntry = useUpdatePlanEntry(hid, start, report);
  const addPairing = useAddPairing(hid, start, report);
  const restockTodo = useAddRestockTodo(hid);
  const [restocked, setRestocked] = useState(() => new Set<string>());
  const [restockRefused, setRestockRefused] = useState(() => new Map<string, Error>());
  const wide = useMedia('(min-width: 1024px)');
  const [picked, setPicked] = useState<string | null>(firstDay);
  const selectedDay =
    week.days.find((d) => d.date === picked)?.date ??
    (week.days.some((d) => d.date === week.today) ? week.today : week.days[0].date);
  const visibleDays = wide ? week.days : week.days.filter((d) => d.date === selectedDay);
  const [dragging, setDragging] = useState<DragSource | null>(null);
  // On a phone a quick sideways swipe over the day turns to the next or previous day.
  const swipeFrom = useRef<{ x: number; y: number } | null>(null);
  const onSwipeEnd = (x: number, y: number) => {
    const from = swipeFrom.current;
    swipeFrom.current = null;
    if (!from || dragging || Math.abs(x - from.x) < 60 || Math.abs(x - from.x) < 2 * Math.abs(y - from.y)) return;
    const index = week.days.findIndex((d) => d.date === selectedDay) + (x < from.x ? 1 : -1);
    if (index >= 0 && index < week.days.length) setPicked(week.days[index].date);
  };

  // Keyboard drags go place to place; the collision check then reports that place as the one under the item.
  const keyboardPlace = useRef<string | null>(null);
  const visibleRef = useRef(visibleDays);
  useLayoutEffect(() => {
    visibleRef.current = visibleDays;
  });
  const coordinateGetter: KeyboardCoordinateGetter = (
    event,
    { context: { active, collisionRect, droppableRects } },
  ) => {
    const source = sourceOf(active);
    if (!source || !collisionRect) return undefined;
    const next = nextPlace(placesByDay(visibleRef.current, source), keyboardPlace.current, event.code);
    if (next === null) return undefined;
    event.preventDefault();
    keyboardPlace.current = next;
    const rect = droppableRects.get(next);
    if (!rect) return { x: collisionRect.left, y: collisionRect.top };
    return {
      x: rect.left + rect.width / 2 - collisionRect.width / 2,
      y: rect.top + Math.min(rect.height / 2, 28) - collisionRect.height / 2,
    };
  };
  const sensors = useBoardSensors(coordinateGetter);

  // Where the finger or mouse really is, in the viewport: slots move as the page scrolls under a drag.
  const pointer = useRef<{ x: number; y: number } | null>(null);
  useEffect(() => {
    const onPointer = (event: PointerEvent) => (pointer.current = { x: event.clientX, y: event.clientY });
    const onTouch = (event: TouchEvent) =>
      event.touches[0] && (pointer.current = { x: event.touches[0].clientX, y: event.touches[0].clientY });
    // Capture, so the position is current before the drag sensors handle the same move.
    window.addEventListener('pointermove', onPointer, { passive: true, capture: true });
    window.addEventListener('touchmove', onTouch, { passive: true, capture: true });
    return () => {
      window.removeEventListener('pointermove', onPointer, { capture: true });
      window.removeEventListener('touchmove', onTouch, { capture: true });
    };
  }, []);

  const collisionDetection: CollisionDetection = (args) => {
    const source = sourceOf(args.active);
    const droppableContainers = args.droppableContainers.filter((c) => accepts(source, targetOf(c)));
    if (!args.pointerCoordinates || !pointer.current) {
      const place = keyboardPlace.current;
      return place && droppableContainers.some((c) => c.id === place) ? [{ id: place }] : [];
    }
    const { x, y } = pointer.current;
    const under = droppableContainers.filter((c) => {
      const rect = c.node.current?.getBoundingClientRect();
      return rect !== undefined && x >= rect.left && x <= rect.right && y >= rect.top && y <= rect.bottom;
    });
    // A planned meal sits inside its slot: the meal is the more exact place.
    const hit = under.find((c) => targetOf(c)?.type === 'entry') ?? under[0];
    return hit ? [{ id: hit.id }] : [];
  };

  const onDragStart = ({ active, activatorEvent }: DragStartEvent) => {
    const source = sourceOf(active) ?? null;
    pointer.current =
      activatorEvent instanceof PointerEvent ? { x: activatorEvent.clientX, y: activatorEvent.clientY } : null;
    setDragging(source);
    tap.letGo();
    setMessage(null);
    keyboardPlace.current = source?.type === 'entry' ? source.entry.id : null;
  };

  /** Sends the change a drop asks for; false when there is nothing to send (or only a reason why not). */
  const put = (source: DragSource, target: DropTarget): boolean => {
    if (!accepts(source, target)) return false;
    if (source.type === 'product' && target.type === 'entry') {
      if (isPending(target.entry.id)) return refuse('That meal is still being saved; pair it again in a moment.');
      if (target.entry.pairings.some((p) => p.productId === source.product.id))
        return refuse(`${target.entry.title} already has ${source.product.name}. Change its portion instead.`);
      addPairing.mutate({ entryId: target.entry.id, productId: source.product.id });
      return true;
    }
    const place =
      target.type === 'slot'
        ? { date: target.date, slot: target.slot as Slot, position: undefined }
        : { date: target.entry.date, slot: target.entry.slot, position: target.entry.position };
    if (source.type === 'meal') {
      const preview = {
        title: source.meal.name,
        servings: source.meal.usualServings,
        pairings: source.meal.products.map((p, i) => ({ id: `pending-${i}`, ...p, flags: [] })),
      };
      createEntry.mutate({ ...place, mealId: source.meal.id, preview });
      return true;
    }
    if (source.type !== 'entry' || isPending(source.entry.id)) return false;
    const { entry } = source;
    const sameSlot = entry.date === place.date && entry.slot === place.slot;
    const position = place.position ?? (sameSlot ? entriesOf(week, place.date, place.slot).length - 1 : undefined);
    if (sameSlot && position === entry.position) return false;
    updateEntry.mutate({
      id: entry.id,
      patch: { date: place.date, slot: place.slot, ...(position === undefined ? {} : { position }) },
    });
    return true;
  };

  const onDragEnd = ({ active, over }: DragEndEvent) => {
    setDragging(null);
    keyboardPlace.current = null;
    const source = sourceOf(active);
    const target = targetOf(over);
    if (source && target) put(source, target);
  };

  const tap = useTapPick(put);

  const board: Board = {
    hid,
    week,
    meals,
    canEdit,
    updateEntry,
    deleteEntry: useDeletePlanEntry(hid, start, report),
    addPairing,
    updatePairing: useUpdatePairing(hid, start, report),
    deletePairing: useDeletePairing(hid, start, report),
    clearDay: useClearDay(hid, start, report),
    held: tap.held,
    hold: tap.hold,
    put: tap.put,
    restock: {
      todo: restockTodo,
      added: restocked,
      refused: restockRefused,
      add: (productId) => {
        setRestockRefused((refused) => new Map([...refused].filter(([id]) => id !== productId)));
        restockTodo.mutate(
          { productId, input: {} },
          {
            onSuccess: () => setRestocked((set) => new Set(set).add(productId)),
            // Shown beside the button pressed, with the server's next step (e.g. add a recipe first).
            onError: (error) => setRestockRefused((refused) => new Map(refused).set(productId, error)),
          },
        );
      },
    },
  };

  return (
    <BoardContext.Provider value={board}>
      <DndContext
        sensors={sensors}
        collisionDetection={collisionDetection}
        // Gentler than the default near the window's edges, so a meal is not carried past the slot it was meant for.
        autoScroll={{ acceleration: 4, threshold: { x: 0.08, y: 0.12 }, interval: 10 }}
        accessibility={{ announcements, screenReaderInstructions }}
        onDragStart={onDragStart}
        onDragEnd={onDragEnd}
        onDragCancel={() => {
          setDragging(null);
          keyboardPlace.current = null;
        }}
      >
        <div className="flex flex-col gap-4">
          {message && (
            <div className="flex items-start gap-2">
              <div className="flex-1">
                <Notice tone="past" role="alert" title="That change was not saved">
                  {message}
                </Notice>
              </div>
              <button
                type="button"
                onClick={() => setMessage(null)}
                className="min-h-11 rounded-lg px-3 font-bold text-action hover:bg-action-soft"
              >
                Dismiss
              </button>
            </div>
          )}
          {canEdit && <TapHint />}
          <ProposalPanel hid={hid} week={week} canEdit={canEdit} />
          <div className="grid gap-4 rounded-card border border-line bg-surface p-3 md:grid-cols-2">
            <MealLibrary hid={hid} meals={meals} canEdit={canEdit} />
            <ShelfRail products={week.products} />
          </div>
          {!wide && <DayPicker days={week.days} selected={selectedDay} today={week.today} onSelect={setPicked} />}
          <div
            className={wide ? 'grid grid-cols-7 gap-1' : 'flex flex-col'}
            onTouchStart={
              wide ? undefined : (e) => (swipeFrom.current = { x: e.touches[0].clientX, y: e.touches[0].clientY })
            }
            onTouchEnd={wide ? undefined : (e) => onSwipeEnd(e.changedTouches[0].clientX, e.changedTouches[0].clientY)}
          >
            {visibleDays.map((day) => (
              <DayColumn key={day.date} day={day} />
            ))}
          </div>
          <HeldBar tap={tap} />
        </div>
        <DragOverlay dropAnimation={null}>
          {dragging && (
            <div className="max-w-56 cursor-grabbing rounded-lg border-2 border-action bg-surface px-3 py-2 font-bold shadow-lg">
              {sourceLabel(dragging)}
            </div>
          )}
        </DragOverlay>
      </DndContext>
    </BoardContext.Provider>
  );
}
