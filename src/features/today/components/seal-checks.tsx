import { Link } from 'react-router-dom';
import type { SealCheckView } from '@shared/schemas/batches';
import { clockWords, count } from '@shared/words';
import { sealCheckTimes } from '@/features/shelf';
import { paths } from '@shared/paths';
import { useUnits } from '@/lib/units';

/** Batches cooling after processing, and those ready for their seal check. */

export function SealChecks({ hid, checks }: { hid: string; checks: SealCheckView[] }) {
  const units = useUnits();
  return (
    <ul className="divide-y divide-line">
      {checks.map((check) => {
        const { ready } = sealCheckTimes(check);
        return (
          <li key={check.batchId} className="flex flex-wrap items-center justify-between gap-3 py-2">
            <span>
              <span className="font-bold">{check.productName}</span>
              <span className="block text-sm text-ink-muted">
                {count(check.jarIds.length, 'jar')}, {units.jarSize(check.jarSize)} ·{' '}
                {ready ? 'cooled 12 hours' : `check from ${clockWords(check.checkFrom, check.timeZone)}`}
              </span>
            </span>
            <Link
              to={paths.batch(hid, check.batchId)}
              className={`inline-flex min-h-11 items-center rounded-lg px-4 font-bold ${ready ? 'bg-action text-white hover:bg-action-strong' : 'border border-line hover:bg-sunken'}`}
            >
              {ready ? 'Check the seals' : 'See the batch'}
            </Link>
          </li>
        );
      })}
    </ul>
  );
}
