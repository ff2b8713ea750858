import { createContext, useCallback, useContext, useEffect, useRef, useState, type ReactNode } from 'react';

/** Long enough to read a sentence and reach the button (WCAG 2.2.1: it also waits while pointed at or focused). */
export const UNDO_SECONDS = 10;

export interface UndoOffer {
  /** What just happened, in words: which jar, where it went. */
  message: string;
  /** Reverses it on the server and says what is true now; a refusal's message is shown in the toast. */
  undo: () => Promise<string>;
}

type Toast = UndoOffer & { id: number; phase: 'offered' | 'undoing' | 'undone' | 'failed'; outcome?: string };

const UndoContext = createContext<(offer: UndoOffer) => void>(() => {});

/** Offer an undo for a one-tap action; the newest offer replaces the one before. */
export const useUndoToast = () => useContext(UndoContext);

const isTyping = (target: EventTarget | null) =>
  target instanceof HTMLElement && (target.isContentEditable || /^(INPUT|TEXTAREA|SELECT)$/.test(target.tagName));

export function UndoToastProvider({ children }: { children: ReactNode }) {
  const [toast, setToast] = useState<Toast | null>(null);
  const [held, setHeld] = useState(false);
  const undoButton = useRef<HTMLButtonElement>(null);
  const nextId = useRef(0);

  const offer = useCallback((next: UndoOffer) => {
    nextId.current += 1;
    setToast({ ...next, id: nextId.current, phase: 'offered' });
  }, []);

  const runUndo = useCallback(async () => {
    if (!toast || toast.phase !== 'offered') return;
    const { id } = toast;
    setToast({ ...toast, phase: 'undoing' });
    try {
      const outcome = await toast.undo();
      setToast((current) => (current?.id === id ? { ...current, phase: 'undone', outcome } : current));
    } catch (error) {
      setToast((current) =>
        current?.id === id
          ? { ...current, phase: 'failed', outcome: `Could not undo: ${(error as Error).message}` }
          : current,
      );
    }
  }, [toast]);

  // The countdown stops while the toast is pointed at or holds focus, and starts again when let go.
  useEffect(() => {
    if (!toast || held || toast.phase === 'undoing') return;
    const seconds = toast.phase === 'undone' ? 4 : UNDO_SECONDS;
    const timer = window.setTimeout(
      () => setToast((current) => (current?.id === toast.id ? null : current)),
      seconds * 1000,
    );
    return () => window.clearTimeout(timer);
  }, [toast, held]);

  // The button that acted may have gone with its card; a keyboard user then lands on Undo, not on the page's top.
  useEffect(() => {
    if (toast?.phase !== 'offered') return;
    const frame = window.requestAnimationFrame(() => {
      if (document.activeElement === document.body || document.activeElement === null) undoButton.current?.focus();
    });
    return () => window.cancelAnimationFrame(frame);
  }, [toast?.id, toast?.phase]);

  // Ctrl+Z (or Cmd+Z) undoes the last action from anywhere but a text field.
  useEffect(() => {
    if (toast?.phase !== 'offered') return;
    const onKey = (event: KeyboardEvent) => {
      if (
        (event.ctrlKey || event.metaKey) &&
        event.key.toLowerCase() === 'z' &&
        !event.shiftKey &&
        !isTyping(event.target)
      ) {
        event.preventDefault();
        void runUndo();
      }
    };
    window.addEventListener('keydown', onKey);
    return () => window.removeEventListener('keydown', onKey);
  }, [toast?.phase, runUndo]);

  const words = !toast
    ? ''
    : toast.phase === 'undone' || toast.phase === 'failed'
      ? toast.outcome
      : toast.phase === 'undoing'
        ? 'Undoing…'
        : toast.message;

  return (
    <UndoContext.Provider value={offer}>
      {children}
      {/* Always in the page, so screen readers hear each message as it changes. */}
      <div
        className="pointer-events-none fixed inset-x-0 bottom-20 z-40 flex justify-center px-3 lg:bottom-6"
        role="status"
        aria-live="polite"
        aria-atomic="true"
      >
        {toast && (
          <div
            key={toast.id}
            data-testid="undo-toast"
            className="pointer-events-auto flex w-full max-w-md items-center gap-2 rounded-card bg-ink py-2 pl-4 pr-2 text-paper shadow-lg motion-safe:transition motion-safe:duration-200 motion-safe:starting:translate-y-3 motion-safe:starting:opacity-0"
            onPointerEnter={() => setHeld(true)}
            onPointerLeave={() => setHeld(false)}
            onFocus={() => setHeld(true)}
            onBlur={() => setHeld(false)}
          >
            <p className={`min-w-0 flex-1 text-[0.95rem] leading-snug ${toast.phase === 'failed' ? 'font-bold' : ''}`}>
              {words}
            </p>
            {toast.phase === 'offered' && (
              <button
                ref={undoButton}
                type="button"
                onClick={() => void runUndo()}
                aria-keyshortcuts="Control+Z"
                className="min-h-11 shrink-0 rounded-lg px-3 font-bold text-action-soft underline underline-offset-4 hover:bg-white/10"
              >
                Undo
              </button>
            )}
            <button
              type="button"
              onClick={() => setToast(null)}
              aria-label="Dismiss"
              className="grid min-h-11 min-w-11 shrink-0 place-items-center rounded-lg text-lg text-paper/80 hover:bg-white/10"
            >
              ×
            </button>
          </div>
        )}
      </div>
    </UndoContext.Provider>
  );
}
