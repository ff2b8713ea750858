import { useId } from 'react';

export type JarFill = 'info' | 'soon' | 'past' | 'preserve';
export type JarLid = 'sealed' | 'opened' | 'muted';

const FILLS: Record<JarFill, string> = {
  info: 'fill-info/70',
  soon: 'fill-soon-fill',
  past: 'fill-past/70',
  preserve: 'fill-soon-fill/70',
};
const LIDS: Record<JarLid, string> = { sealed: 'fill-action', opened: 'fill-info', muted: 'fill-ink-muted' };

/**
 * Larderly's one jar drawing: a lid over a rounded body filled from the bottom to `level` (0 to 1). The empty
 * state, the fridge's "how much is left" and the week's shelf rail all draw it, at their own `width`.
 */
export function JarDrawing({
  level,
  fill = 'preserve',
  lid = 'sealed',
  width = 40,
}: {
  level: number;
  fill?: JarFill;
  lid?: JarLid;
  width?: number;
}) {
  const clipId = useId();
  const height = 34 * Math.max(0, Math.min(1, level));
  // About two screen pixels of outline at any size (the drawing is 40 units wide).
  const stroke = Math.max(2, 64 / width);
  return (
    <svg width={width} height={(width * 48) / 40} viewBox="0 0 40 48" aria-hidden="true" className="shrink-0">
      <defs>
        <clipPath id={clipId}>
          <rect x="4" y="9" width="32" height="36" rx="8" />
        </clipPath>
      </defs>
      <rect x="10" y="2" width="20" height="7" rx="2" className={LIDS[lid]} />
      <rect x="4" y="9" width="32" height="36" rx="8" className="fill-surface" />
      <rect
        x="4"
        y={45 - height - 1}
        width="32"
        height={height + 1}
        className={FILLS[fill]}
        clipPath={`url(#${clipId})`}
      />
      <rect x="4" y="9" width="32" height="36" rx="8" className="fill-none stroke-ink" strokeWidth={stroke} />
    </svg>
  );
}
