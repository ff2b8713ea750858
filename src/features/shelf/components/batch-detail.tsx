import { Link } from 'react-router-dom';
import type { BatchDetail } from '@shared/schemas/batches';
import { clockWords, count, dateWords, METHOD_NAMES, minutesWords } from '@shared/words';
import { placeMoveWords } from '@shared/words/shelf-places';
import { MOUTH_LABELS } from '@shared/words/stock';
import { CautionLine } from '@/components/ui/caution-line';
import { Card } from '@/components/ui/page';
import { BatchPhoto } from './batch-photo';
import { SealCheckPanel } from './seal-check-panel';
import { JarActions } from './jar-actions';
import { MoveJarsForm } from './move-jar';
import { JarDates, JarStateBadge, PastBestBadge } from './jar-badges';
import { paths } from '@shared/paths';
import { useUnits } from '@/lib/units';

const EVENT_WORDS: Record<string, string> = {
  filled: 'filled',
  unsealed: 'did not seal; put in the fridge',
  'seal-checked': 'seal checked: sealed',
  reprocessed: 'did not seal; reprocessed with a new lid',
  opened: 'opened',
  finished: 'finished',
  discarded: 'discarded',
  given: 'given away',
  restored: 'put back (the change before was undone)',
  moved: 'moved',
};

export function BatchDetailView({ hid, batch, canCook }: { hid: string; batch: BatchDetail; canCook: boolean }) {
  const units = useUnits();
  const processing =
    batch.pressurePsi !== null
      ? `${minutesWords(batch.minutes!)} at ${units.pressure(batch.pressurePsi)}`
      : batch.minutes !== null
        ? minutesWords(batch.minutes)
        : 'time not recorded';
  return (
    <div className="grid gap-5 lg:grid-cols-[3fr_2fr]">
      <div className="flex flex-col gap-5">
        <SealCheckPanel hid={hid} batch={batch} canCook={canCook} />
        <Card>
          <dl className="grid grid-cols-[auto_1fr] gap-x-4 gap-y-1">
            <dt className="text-ink-muted">Canned</dt>
            <dd className="tabular">{dateWords(batch.cannedOn)}</dd>
            <dt className="text-ink-muted">Jars</dt>
            <dd className="tabular">
              {batch.jarsFilled} {units.jarSize(batch.jarSize)} filled,{' '}
              {batch.sealCheck
                ? `${batch.jarsFilled - batch.jars.filter((j) => j.state === 'opened' && j.unsealed).length - batch.sealCheck.jarIds.length} sealed, ${batch.sealCheck.jarIds.length} to check`
                : `${batch.jarsSealed} sealed`}
            </dd>
            <dt className="text-ink-muted">Lids</dt>
            <dd>{MOUTH_LABELS[batch.mouth]}</dd>
            <dt className="text-ink-muted">Processing</dt>
            <dd>
              {METHOD_NAMES[batch.method]}, {processing} at {units.altitude(batch.altitudeFt)}
            </dd>
            {batch.headspaceInches !== null && (
              <>
                <dt className="text-ink-muted">Headspace</dt>
                <dd>{units.headspace(batch.headspaceInches)}</dd>
              </>
            )}
            <dt className="text-ink-muted">Recipe</dt>
            <dd>
              {batch.recipeId ? (
                <Link
                  to={paths.recipe(hid, batch.recipeId)}
                  className="font-bold text-action underline underline-offset-4"
                >
                  {batch.recipeName}
                </Link>
              ) : (
                'not recorded'
              )}
            </dd>
          </dl>
          {batch.processings.length > 0 && (
            <>
              <h3 className="mt-3 font-bold">Processings</h3>
              <ol className="flex flex-col gap-1 text-[0.95rem]">
                {batch.processings.map((p) => (
                  <li key={p.id} className="tabular">
                    {p.number === 1 ? 'First' : 'Reprocess'}: {count(p.jars, 'jar')},{' '}
                    {clockWords(p.processedAt, batch.timeZone)}, {METHOD_NAMES[p.method]}
                    {p.minutes !== null ? `, ${minutesWords(p.minutes)}` : ''}
                    {p.pressurePsi !== null ? ` at ${units.pressure(p.pressurePsi)}` : ''} at{' '}
                    {units.altitude(p.altitudeFt)}
                    {p.number > 1 ? ', new lids' : ''}
                    {p.who ? ` by ${p.who}` : ''}
                  </li>
                ))}
              </ol>
            </>
          )}
          <div className="mt-3">
            <CautionLine about="canning" />
          </div>
          {batch.notes && <p className="mt-3 whitespace-pre-line">{batch.notes}</p>}
        </Card>
        <Card>
          <div className="mb-2 flex flex-wrap items-center justify-between gap-2">
            <h2 className="text-xl">Jars</h2>
            <Link
              to={paths.batchLabels(hid, batch.id)}
              className="inline-flex min-h-11 items-center rounded-lg border border-line px-4 font-bold hover:bg-sunken"
            >
              Print labels
            </Link>
          </div>
          <ul className="divide-y divide-line">
            {batch.jars.map((jar) => (
              <li key={jar.id} className="flex flex-wrap items-center justify-between gap-3 py-3">
                <div className="flex flex-col gap-1">
                  <p className="flex flex-wrap items-center gap-2">
                    <Link
                      to={paths.jar(jar.code)}
                      className="font-mono text-lg font-bold tracking-wider text-action underline underline-offset-4"
                    >
                      {jar.code}
                    </Link>
                    <JarStateBadge jar={jar} />
                    {jar.pastBestQuality && <PastBestBadge bestBy={jar.bestBy} />}
                  </p>
                  <p className="text-sm text-ink-muted">
                    <JarDates jar={jar} />
                    {jar.placeName && jar.state === 'sealed' ? ` · ${jar.placeName}` : ''}
                  </p>
                </div>
                <JarActions hid={hid} jar={jar} />
              </li>
            ))}
          </ul>
          <div className="mt-3">
            <MoveJarsForm hid={hid} jars={batch.jars} buttonLabel="Move these jars" />
          </div>
        </Card>
      </div>
      <div className="flex flex-col gap-5">
        <Card>
          <h2 className="mb-2 text-xl">Photo</h2>
          <BatchPhoto hid={hid} batch={batch} canUpload={canCook} />
        </Card>
        <Card>
          <h2 className="mb-2 text-xl">History</h2>
          <ol className="flex flex-col gap-1 text-[0.95rem]">
            {batch.history.map((event) => (
              <li key={event.id} className="tabular">
                <span className="text-ink-muted">{dateWords(event.happenedOn)}</span> · jar{' '}
                <span className="font-mono">{event.jarCode}</span>{' '}
                {event.placeMove ? placeMoveWords(event.placeMove) : (EVENT_WORDS[event.kind] ?? event.kind)}
                {event.kind === 'given' && event.givenTo ? ` to ${event.givenTo}` : ''}
                {event.who ? ` by ${event.who}` : ''}
              </li>
            ))}
          </ol>
        </Card>
      </div>
    </div>
  );
}
