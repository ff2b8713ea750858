import { Link } from 'react-router-dom';
import type { BatchView } from '@shared/schemas/batches';
import { dateWords, METHOD_NAMES, minutesWords } from '@shared/words';
import { CautionLine } from '@/components/ui/caution-line';
import { paths } from '@shared/paths';
import { useUnits } from '@/lib/units';

export function BatchLog({ hid, batches }: { hid: string; batches: BatchView[] }) {
  const units = useUnits();
  return (
    <div className="flex flex-col gap-3">
      <CautionLine about="canning" />
      <ul className="flex flex-col gap-3">
        {batches.map((batch) => (
          <li key={batch.id}>
            <Link
              to={paths.batch(hid, batch.id)}
              className="flex flex-wrap items-center justify-between gap-3 rounded-card border border-line bg-surface p-4 hover:bg-sunken/60"
            >
              <div>
                <p className="text-lg font-bold">{batch.productName}</p>
                <p className="tabular text-ink-muted">
                  {dateWords(batch.cannedOn)} · {batch.jarsFilled} {units.jarSize(batch.jarSize)} jars ·{' '}
                  {METHOD_NAMES[batch.method].toLowerCase()}
                  {batch.minutes !== null ? `, ${minutesWords(batch.minutes)}` : ''}
                  {batch.pressurePsi !== null ? ` at ${units.pressure(batch.pressurePsi, true)}` : ''}
                </p>
              </div>
              <p className="tabular flex flex-wrap gap-3 text-[0.95rem]">
                <span>
                  <b>{batch.jarCounts.sealed}</b> on the shelf
                </span>
                <span>
                  <b>{batch.jarCounts.opened}</b> opened
                </span>
                <span className="text-ink-muted">{batch.jarCounts.finished} finished</span>
                {batch.jarsFilled > batch.jarsSealed && (
                  <span className="font-bold text-soon">{batch.jarsFilled - batch.jarsSealed} did not seal</span>
                )}
              </p>
            </Link>
          </li>
        ))}
      </ul>
    </div>
  );
}
