import { useId, useState, type ReactNode } from 'react';

/** A flag whose reason a tap shows inline (no hover needed): the button says what it is, the reason follows it. */
export function ReasonToggle({
  label,
  reason,
  className = '',
}: {
  label: ReactNode;
  reason: string;
  className?: string;
}) {
  const [open, setOpen] = useState(false);
  const reasonId = useId();
  return (
    <span className={`inline-flex min-w-0 max-w-full flex-col ${className}`}>
      <button
        type="button"
        className="inline-flex min-h-8 max-w-full items-center gap-1 rounded text-left font-bold underline decoration-dotted underline-offset-2 pointer-coarse:min-h-11"
        aria-expanded={open}
        aria-controls={reasonId}
        aria-describedby={reasonId}
        onClick={() => setOpen((shown) => !shown)}
      >
        <span className="min-w-0 break-words">{label}</span>
        <ReasonMark open={open} />
      </button>
      <span id={reasonId} hidden={!open} className="break-words font-normal text-ink">
        {reason}
      </span>
    </span>
  );
}

/** Drawn, not a character: a font without the circled "i" showed an empty box in its place. */
function ReasonMark({ open }: { open: boolean }) {
  return (
    <svg aria-hidden="true" viewBox="0 0 16 16" className="size-[0.85em] shrink-0" fill="none" stroke="currentColor">
      {open ? (
        <path d="M3.5 10.5 8 6l4.5 4.5" strokeWidth="2" strokeLinecap="round" strokeLinejoin="round" />
      ) : (
        <>
          <circle cx="8" cy="8" r="6.75" strokeWidth="1.5" />
          <path d="M8 7.25v4.25" strokeWidth="1.75" strokeLinecap="round" />
          <circle cx="8" cy="4.75" r="1" fill="currentColor" stroke="none" />
        </>
      )}
    </svg>
  );
}
