import { useEffect, useState } from 'react';
import { heldLine, putLine, sourceLabel, type DragSource, type DropTarget, type Held } from './drag';

/**
 * The board without dragging: a tap picks a meal or a product up, a tap on a place (or a choice in a "Put on…"
 * menu) puts it down there through the same change a drop sends. `said` is the line that tells what is picked
 * and what to tap next, then what happened.
 */
export function useTapPick(put: (source: DragSource, target: DropTarget) => boolean) {
  const [held, setHeld] = useState<Held | null>(null);
  const [said, setSaid] = useState('');
  const putBack = (what: Held) => `Nothing is picked; ${sourceLabel(what)} stayed where it was.`;
  const hold = (next: Held | null) => {
    setHeld(next);
    setSaid(next ? heldLine(next) : held ? putBack(held) : '');
  };
  useEffect(() => {
    if (!held) return;
    const onKey = (event: KeyboardEvent) => {
      if (event.key !== 'Escape') return;
      setHeld(null);
      setSaid(putBack(held));
    };
    window.addEventListener('keydown', onKey);
    return () => window.removeEventListener('keydown', onKey);
  }, [held]);
  return {
    held,
    said,
    hold,
    /** Sends the change; a meal or product put down this way is no longer held. */
    put: (source: DragSource, target: DropTarget) => {
      if (!put(source, target) || source.type === 'entry') return;
      setHeld(null);
      setSaid(putLine(source, target));
    },
    /** A drag started: whatever a tap held is let go without a word, the drag speaks for itself. */
    letGo: () => setHeld(null),
    quiet: () => setSaid(''),
  };
}

export type TapPick = ReturnType<typeof useTapPick>;
