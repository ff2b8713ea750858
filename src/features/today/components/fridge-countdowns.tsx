import { Link } from 'react-router-dom';
import type { TodayFridgeJar } from '@shared/schemas/today';
import { dateWords } from '@shared/words';
import { CautionLine } from '@/components/ui/caution-line';
import { CountdownBadge } from '@/components/ui/countdown-badge';
import { paths } from '@shared/paths';

/** The opened jars to finish first. */
export function FridgeCountdowns({ jars }: { jars: TodayFridgeJar[] }) {
  if (jars.length === 0) return <p className="text-ink-muted">No opened jars in the fridge.</p>;
  return (
    <>
      <ul className="divide-y divide-line">
        {jars.map((jar) => {
          return (
            <li key={jar.jarId} className="flex items-center justify-between gap-3 py-2">
              <span>
                <span className="font-bold">{jar.productName}</span>
                <span className="block text-sm text-ink-muted">
                  <Link to={paths.jar(jar.code)} className="font-bold text-action underline underline-offset-4">
                    Jar {jar.code}
                  </Link>{' '}
                  · use by {dateWords(jar.useBy)}
                </span>
              </span>
              <CountdownBadge daysLeft={jar.daysLeft} />
            </li>
          );
        })}
      </ul>
      <CautionLine about="use-by" />
    </>
  );
}
