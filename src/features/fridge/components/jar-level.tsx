import { useId } from 'react';

/** A jar drawn as a rounded shape whose fill shows how much is left. */
export function JarLevel({ fraction, tone }: { fraction: number; tone: 'info' | 'soon' | 'past' }) {
  const clipId = useId();
  const level = Math.max(0, Math.min(1, fraction));
  const fillHeight = 34 * level;
  const fill = { info: 'fill-info/70', soon: 'fill-soon-fill', past: 'fill-past/70' }[tone];
  return (
    <svg width="40" height="48" viewBox="0 0 40 48" aria-hidden="true" className="shrink-0">
      <defs>
        <clipPath id={clipId}>
          <rect x="4" y="9" width="32" height="36" rx="8" />
        </clipPath>
      </defs>
      <rect x="10" y="2" width="20" height="7" rx="2" className="fill-ink-muted" />
      <rect x="4" y="9" width="32" height="36" rx="8" className="fill-surface" />
      <rect x="4" y={45 - fillHeight - 1} width="32" height={fillHeight + 1} className={fill} clipPath={`url(#${clipId})`} />
      <rect x="4" y="9" width="32" height="36" rx="8" className="fill-none stroke-ink" strokeWidth="2" />
    </svg>
  );
}
