import { useState } from 'react';

const SEEN = 'larderly.week.tap-hint-seen';

function seenBefore() {
  try {
    return localStorage.getItem(SEEN) === '1';
  } catch {
    return false;
  }
}

/** Says once how the board is used without dragging; gone for good when dismissed. */
export function TapHint() {
  const [shown, setShown] = useState(() => !seenBefore());
  if (!shown) return null;
  const dismiss = () => {
    setShown(false);
    try {
      localStorage.setItem(SEEN, '1');
    } catch {
      // A browser that keeps no storage shows the line again next time; nothing else depends on it.
    }
  };
  return (
    <div
      className="flex items-center gap-2 rounded-lg border border-info/40 bg-info-soft px-3 py-1 text-sm"
      data-testid="tap-hint"
    >
      <p className="flex-1">Tap a meal, then tap a day to put it on. Or press and hold to drag.</p>
      <button
        type="button"
        onClick={dismiss}
        className="min-h-11 shrink-0 rounded-lg px-3 font-bold text-action hover:bg-action-soft"
      >
        Got it
      </button>
    </div>
  );
}
