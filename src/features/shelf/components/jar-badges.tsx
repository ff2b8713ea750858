import type { JarView } from '@shared/schemas/batches';
import { longDate } from '../format';

export function PastBestBadge({ bestBy }: { bestBy: string }) {
  return (
    <span className="inline-flex items-center rounded-full border border-soon-fill bg-soon-soft px-2 py-0.5 text-sm font-bold text-soon" title={`Best quality until ${longDate(bestBy)}`}>
      Past best quality
    </span>
  );
}

const STATE_STYLE: Record<JarView['state'], string> = {
  sealed: 'bg-action-soft text-action',
  opened: 'bg-info-soft text-info',
  finished: 'bg-sunken text-ink-muted',
  discarded: 'bg-sunken text-ink-muted line-through',
};

export function JarStateBadge({ jar }: { jar: Pick<JarView, 'state' | 'unsealed'> }) {
  const label = jar.state === 'opened' && jar.unsealed ? 'in the fridge (did not seal)' : jar.state === 'opened' ? 'opened, in the fridge' : jar.state;
  return <span className={`inline-flex rounded-full px-2 py-0.5 text-sm font-bold ${STATE_STYLE[jar.state]}`}>{label}</span>;
}

/** What the jar's dates mean today: best quality for a sealed jar, use-by for an opened one. */
export function JarDates({ jar }: { jar: JarView }) {
  if (jar.state === 'sealed') return <span className="tabular">Best quality until {longDate(jar.bestBy)}</span>;
  if (jar.state === 'opened') return <span className="tabular">Opened {longDate(jar.openedOn!)} · use by {longDate(jar.useBy!)}</span>;
  if (jar.state === 'finished') return <span className="tabular">Finished {longDate(jar.finishedOn!)}</span>;
  return <span className="tabular">Discarded {longDate(jar.discardedOn!)}</span>;
}
