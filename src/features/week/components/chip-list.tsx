import { useState, type ReactNode } from 'react';
import { useBoard } from '../board-context';
import { sourceLabel, type Held } from '../drag';
import { PutOnMenu } from './put-on-menu';

/** How many chips a phone shows before "Show all": enough to choose from without pushing the week off the screen. */
const FOLDED = 4;

const heldId = (held: Held) => (held.type === 'meal' ? `meal-${held.meal.id}` : `product-${held.product.id}`);
export const putOnButtonId = (held: Held) => `put-on-${heldId(held)}`;

/**
 * The chips of the meal library or of the shelf rail: wrapped in rows (a phone shows the first few and a
 * "Show all"), each with its "Put on…" menu, which opens under the list.
 */
export function ChipList<T>({
  id,
  things,
  noun,
  sourceOf,
  chip,
}: {
  id: string;
  things: T[];
  noun: string;
  sourceOf: (thing: T) => Held;
  chip: (thing: T, putOn: ReactNode) => ReactNode;
}) {
  const board = useBoard();
  const [expanded, setExpanded] = useState(false);
  const [menuFor, setMenuFor] = useState<Held | null>(null);
  const menuId = `${id}-put-on`;
  const closeMenu = () => {
    const trigger = menuFor && document.getElementById(putOnButtonId(menuFor));
    setMenuFor(null);
    trigger?.focus();
  };
  return (
    <>
      <ul className="grid grid-cols-1 gap-1.5 sm:grid-cols-2 md:max-h-72 md:grid-cols-[repeat(auto-fill,minmax(13rem,1fr))] md:overflow-y-auto md:pr-1">
        {things.map((thing, index) => {
          const source = sourceOf(thing);
          const open = menuFor !== null && heldId(menuFor) === heldId(source);
          const putOn = board.canEdit && (
            <button
              type="button"
              id={putOnButtonId(source)}
              aria-expanded={open}
              aria-controls={open ? menuId : undefined}
              onClick={() => (open ? closeMenu() : setMenuFor(source))}
              className={`min-h-11 shrink-0 rounded-lg border px-2 text-xs font-bold text-action hover:bg-action-soft ${open ? 'border-action bg-action-soft' : 'border-line bg-surface'}`}
            >
              Put on…<span className="sr-only"> {sourceLabel(source)}</span>
            </button>
          );
          return (
            <li
              key={heldId(source)}
              className={`flex min-w-0 gap-1 ${index >= FOLDED && !expanded ? 'max-md:hidden' : ''}`}
            >
              {chip(thing, putOn)}
            </li>
          );
        })}
      </ul>
      {things.length > FOLDED && (
        <button
          type="button"
          onClick={() => setExpanded(!expanded)}
          className="min-h-11 self-start rounded-lg px-3 font-bold text-action hover:bg-action-soft md:hidden"
        >
          {expanded ? `Show fewer ${noun}` : `Show all ${things.length} ${noun}`}
        </button>
      )}
      {menuFor && <PutOnMenu key={heldId(menuFor)} id={menuId} source={menuFor} onClose={closeMenu} />}
    </>
  );
}
