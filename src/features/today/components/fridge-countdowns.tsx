import type { TodayFridgeJar } from '@shared/schemas/today';
import { shortDay } from '@shared/day-words';

function countdown(daysLeft: number) {
  if (daysLeft < 0) return { text: `past use-by ${-daysLeft} ${daysLeft === -1 ? 'day' : 'days'}`, tone: 'bg-past-soft text-past' };
  if (daysLeft === 0) return { text: 'use today', tone: 'bg-soon-soft text-soon' };
  if (daysLeft <= 3) return { text: `${daysLeft} ${daysLeft === 1 ? 'day' : 'days'} left`, tone: 'bg-soon-soft text-soon' };
  return { text: `${daysLeft} days left`, tone: 'bg-info-soft text-info' };
}

/** The opened jars to finish first. */
export function FridgeCountdowns({ jars }: { jars: TodayFridgeJar[] }) {
  if (jars.length === 0) return <p className="text-ink-muted">No opened jars in the fridge.</p>;
  return (
    <ul className="divide-y divide-line">
      {jars.map((jar) => {
        const { text, tone } = countdown(jar.daysLeft);
        return (
          <li key={jar.jarId} className="flex items-center justify-between gap-3 py-2">
            <span>
              <span className="font-bold">{jar.productName}</span>
              <span className="block text-sm text-ink-muted">
                Jar {jar.code} · use by {shortDay(jar.useBy)}
              </span>
            </span>
            <span className={`shrink-0 rounded-full px-3 py-1 text-sm font-bold tabular ${tone}`}>{text}</span>
          </li>
        );
      })}
    </ul>
  );
}
