import type { TapPick } from '../use-tap-pick';

/** What a tap has picked up and what to tap next, kept in sight above the bottom navigation, with Cancel. */
export function HeldBar({ tap }: { tap: TapPick }) {
  return (
    <div
      className={`sticky bottom-20 z-10 flex items-center gap-2 lg:bottom-3 ${tap.said ? 'rounded-lg border-2 border-action bg-surface px-3 py-1 shadow-lg' : ''}`}
    >
      <p role="status" aria-live="polite" className="flex-1 text-sm font-bold" data-testid="held-line">
        {tap.said}
      </p>
      {tap.held ? (
        <button
          type="button"
          onClick={() => tap.hold(null)}
          className="min-h-11 shrink-0 rounded-lg border border-line px-3 font-bold text-action hover:bg-action-soft"
        >
          Cancel
        </button>
      ) : (
        tap.said && (
          <button
            type="button"
            onClick={tap.quiet}
            aria-label="Dismiss this line"
            className="min-h-11 min-w-11 shrink-0 rounded-lg font-bold text-ink-muted hover:bg-sunken"
          >
            ×
          </button>
        )
      )}
    </div>
  );
}
