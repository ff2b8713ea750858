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
        <span aria-hidden="true" className="shrink-0 text-[0.7em]">
          {open ? '▲' : 'ⓘ'}
        </span>
      </button>
      <span id={reasonId} hidden={!open} className="break-words font-normal text-ink">
        {reason}
      </span>
    </span>
  );
}
