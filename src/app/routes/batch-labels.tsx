import { Link, useParams, useSearchParams } from 'react-router-dom';
import { Button } from '@/components/ui/button';
import { CautionLine } from '@/components/ui/caution-line';
import { Notice } from '@/components/ui/notice';
import { useBatch } from '@/features/shelf/api/get-batches';
import { LabelSheet, type Paper } from '@/features/shelf/components/label-sheet';
import { dateWords } from '@shared/words';
import { paths } from '@shared/paths';

/** A page of its own, outside the app's navigation, so it prints as nothing but labels. */
export function BatchLabelsRoute() {
  const { hid = '', batchId = '' } = useParams();
  const [params, setParams] = useSearchParams();
  const paper: Paper = params.get('paper') === 'letter' ? 'letter' : 'a4';
  const batch = useBatch(hid, batchId);
  return (
    <main className="mx-auto max-w-5xl p-4 print:max-w-none print:p-0">
      <div className="mb-4 flex flex-wrap items-end justify-between gap-3 print:hidden">
        <div>
          <h1 className="text-2xl">
            Labels{batch.data ? `: ${batch.data.productName}, ${dateWords(batch.data.cannedOn)}` : ''}
          </h1>
          <p className="text-ink-muted">
            One label a jar. Scanning a label opens the jar’s page to mark it opened, finished or discarded.
          </p>
          <CautionLine about="best-quality" />
        </div>
        <div className="flex flex-wrap items-center gap-2">
          <div role="group" aria-label="Paper" className="flex rounded-lg border border-line bg-surface p-1">
            {(['a4', 'letter'] as const).map((option) => (
              <button
                key={option}
                type="button"
                aria-pressed={paper === option}
                onClick={() => setParams({ paper: option }, { replace: true })}
                className={`min-h-11 rounded-md px-4 font-bold ${paper === option ? 'bg-action text-white' : 'hover:bg-sunken'}`}
              >
                {option === 'a4' ? 'A4' : 'US Letter'}
              </button>
            ))}
          </div>
          <Button onClick={() => window.print()}>Print</Button>
          <Link
            to={paths.batch(hid, batchId)}
            className="inline-flex min-h-11 items-center rounded-lg px-3 font-bold text-action hover:bg-action-soft"
          >
            Back to the batch
          </Link>
        </div>
      </div>
      {batch.error && (
        <Notice tone="past" role="alert">
          {batch.error.message}
        </Notice>
      )}
      {batch.data && <LabelSheet batch={batch.data} paper={paper} />}
    </main>
  );
}
