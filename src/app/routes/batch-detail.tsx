import { Link, useLocation, useParams, useSearchParams } from 'react-router-dom';
import { can } from '@shared/roles';
import { Notice } from '@/components/ui/notice';
import { PageHeader } from '@/components/ui/page';
import { useCurrentHousehold } from '@/features/households/use-current-household';
import { useBatch } from '@/features/shelf/api/get-batches';
import { BatchDetailView } from '@/features/shelf/components/batch-detail';
import { dateWords } from '@shared/words';
import { STOCK_WORDS } from '@shared/words/stock';
import { paths } from '@shared/paths';

export function BatchDetailRoute() {
  const { hid, role } = useCurrentHousehold();
  const { batchId = '' } = useParams();
  const [params] = useSearchParams();
  const batch = useBatch(hid, batchId);
  // Said once, right after saving: the batch used more empty jars or new lids than were counted.
  const stockWarnings = ((useLocation().state as { stockWarnings?: string[] } | null)?.stockWarnings ?? []).filter(
    (w) => typeof w === 'string',
  );
  return (
    <>
      <PageHeader
        title={batch.data ? batch.data.productName : 'Batch'}
        lead={batch.data ? `Canned ${dateWords(batch.data.cannedOn)}` : undefined}
        actions={
          <Link
            to={paths.batches(hid)}
            className="inline-flex min-h-11 items-center rounded-lg px-3 font-bold text-action hover:bg-action-soft"
          >
            All batches
          </Link>
        }
      />
      {params.get('saved') && batch.data && (
        <div className="mb-5">
          <Notice tone="action" role="status" title="Batch saved">
            {batch.data.jarsSealed} sealed jars are on the shelf
            {batch.data.jarsFilled > batch.data.jarsSealed
              ? ` and ${batch.data.jarsFilled - batch.data.jarsSealed} in the fridge`
              : ''}
            . Print their labels so each jar can be scanned.
            {params.get('todoId') && (
              <>
                {' '}
                <Link to={paths.todo(hid, params.get('todoId'))} className="font-bold text-action underline">
                  Back to the to-do
                </Link>
              </>
            )}
          </Notice>
          {stockWarnings.length > 0 && (
            <div className="mt-3">
              <Notice tone="soon" title="Empty jars and lids">
                {stockWarnings.join(' ')}{' '}
                <Link to={paths.stock(hid)} className="font-bold text-action underline">
                  {STOCK_WORDS.title}
                </Link>
              </Notice>
            </div>
          )}
        </div>
      )}
      {batch.error && (
        <Notice tone="past" role="alert">
          {batch.error.message}
        </Notice>
      )}
      {batch.data && <BatchDetailView hid={hid} batch={batch.data} canCook={can(role, 'cook')} />}
    </>
  );
}
