import { useState } from 'react';

/** A small number box that saves when it loses focus or on Enter, not on every keystroke. */
export function NumberCommit({
  label,
  value,
  min,
  max,
  step = 1,
  onCommit,
}: {
  label: string;
  value: number;
  min: number;
  max: number;
  step?: number;
  onCommit: (value: number) => void;
}) {
  const [draft, setDraft] = useState(String(value));
  const [seen, setSeen] = useState(value);
  if (seen !== value) {
    setSeen(value);
    setDraft(String(value));
  }
  const commit = () => {
    const next = Number(draft);
    if (Number.isFinite(next) && next >= min && next <= max && next !== value) onCommit(next);
    else setDraft(String(value));
  };
  return (
    <input
      type="number"
      inputMode="decimal"
      aria-label={label}
      className="tabular min-h-8 w-12 rounded border border-line bg-surface px-1 text-sm text-ink pointer-coarse:min-h-11 pointer-coarse:w-16"
      value={draft}
      min={min}
      max={max}
      step={step}
      onChange={(e) => setDraft(e.target.value)}
      onBlur={commit}
      onKeyDown={(e) => {
        if (e.key === 'Enter') commit();
      }}
    />
  );
}
