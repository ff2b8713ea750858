import { countdown } from '@shared/words';

const TONE_BADGE = {
  info: 'bg-info-soft text-info',
  soon: 'bg-soon-soft text-soon',
  past: 'bg-past-soft text-past',
} as const;

/** An opened jar's days left, in the same words and colors on the fridge, Today and the jar's page. */
export function CountdownBadge({ daysLeft }: { daysLeft: number }) {
  const { text, tone } = countdown(daysLeft);
  return (
    <span className={`shrink-0 rounded-full px-3 py-1 text-sm font-bold tabular ${TONE_BADGE[tone]}`}>{text}</span>
  );
}
