import { ReasonToggle } from '@/components/ui/reason-toggle';
import type { JarView } from '@shared/schemas/batches';
import { DATE_NAMES, dateWords, JAR_STATE_NAMES, SEAL_TO_CHECK_NAME, UNSEALED_STATE_NAME } from '@shared/words';
import { givenWords } from '@shared/words/gifts';

export function PastBestBadge({ bestBy }: { bestBy: string }) {
  return (
    <span className="inline-flex items-center rounded-2xl border border-soon-fill bg-soon-soft px-2 py-0.5 text-sm text-soon">
      <ReasonToggle
        label={DATE_NAMES.pastBestQuality}
        reason={`${DATE_NAMES.bestQuality} ${dateWords(bestBy)}: eat these first.`}
      />
    </span>
  );
}

const STATE_STYLE: Record<JarView['state'], string> = {
  sealed: 'bg-action-soft text-action',
  opened: 'bg-info-soft text-info',
  finished: 'bg-sunken text-ink-muted',
  discarded: 'bg-sunken text-ink-muted line-through',
  given: 'bg-sunken text-ink',
};

export function JarStateBadge({ jar }: { jar: Pick<JarView, 'state' | 'unsealed'> & { seal?: JarView['seal'] } }) {
  const unsealed = jar.state === 'opened' && jar.unsealed;
  if (jar.state === 'sealed' && jar.seal === 'to-check') {
    return (
      <span className="inline-flex rounded-full border border-soon-fill bg-soon-soft px-2 py-0.5 text-sm font-bold text-soon">
        {SEAL_TO_CHECK_NAME}
      </span>
    );
  }
  // The unsealed jar always wears the warning color (honey), as on the fridge and the batch form.
  const style = unsealed ? 'border border-soon-fill bg-soon-soft text-soon' : STATE_STYLE[jar.state];
  return (
    <span className={`inline-flex rounded-full px-2 py-0.5 text-sm font-bold ${style}`}>
      {unsealed ? UNSEALED_STATE_NAME : JAR_STATE_NAMES[jar.state]}
    </span>
  );
}

/** What the jar's dates mean today: best quality for a sealed jar, use-by for an opened one. */
export function JarDates({ jar }: { jar: JarView }) {
  if (jar.state === 'sealed')
    return (
      <span className="tabular">
        {DATE_NAMES.bestQuality} {dateWords(jar.bestBy)}
      </span>
    );
  if (jar.state === 'opened')
    return (
      <span className="tabular">
        {DATE_NAMES.opened} {dateWords(jar.openedOn!)} · {DATE_NAMES.useBy.toLowerCase()} {dateWords(jar.useBy!)}
      </span>
    );
  if (jar.state === 'given') return <span>{givenWords(dateWords(jar.givenOn!), jar.givenTo)}</span>;
  if (jar.state === 'finished') return <span className="tabular">Finished {dateWords(jar.finishedOn!)}</span>;
  return <span className="tabular">Discarded {dateWords(jar.discardedOn!)}</span>;
}
