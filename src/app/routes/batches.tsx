import { useState } from 'react';
import { Link } from 'react-router-dom';
import { can } from '@shared/roles';
import { Notice } from '@/components/ui/notice';
import { Card, EmptyState, PageHeader } from '@/components/ui/page';
import { useCurrentHousehold } from '@/features/households/use-current-household';
import { useBatches } from '@/features/shelf/api/get-batches';
import { BatchLog } from '@/features/shelf/components/batch-log';
import { CsvImport } from '@/features/shelf/components/csv-import';
import { paths } from '@shared/paths';

export function BatchesRoute() {
  const { hid, role } = useCurrentHousehold();
  const batches = useBatches(hid);
  const [importing, setImporting] = useState(false);
  const canCook = can(role, 'cook');
  return (
    <>
      <PageHeader
        title="Batches"
        lead="Each canning session: what went in the jars, how it was processed, how many sealed."
        actions={
          canCook && (
            <>
              <button
                type="button"
                aria-expanded={importing}
                onClick={() => setImporting((open) => !open)}
                className="min-h-11 rounded-lg border border-line bg-surface px-4 font-bold hover:bg-sunken"
              >
                Import CSV
              </button>
              <Link
                to={paths.newBatch(hid)}
                className="inline-flex min-h-11 items-center rounded-lg bg-action px-4 font-bold text-white hover:bg-action-strong"
              >
                Record a batch
              </Link>
            </>
          )
        }
      />
      {importing && (
        <Card className="mb-5">
          <h2 className="mb-2 text-xl">Import batches from a CSV file</h2>
          <CsvImport hid={hid} />
        </Card>
      )}
      {batches.error && (
        <Notice tone="past" role="alert">
          {batches.error.message}
        </Notice>
      )}
      {batches.isPending ? (
        <p className="text-ink-muted">Reading the log…</p>
      ) : batches.data?.length === 0 ? (
        <EmptyState
          title="No batches yet"
          action={
            canCook ? (
              <Link to={paths.newBatch(hid)} className="font-bold text-action underline">
                Record your first batch
              </Link>
            ) : undefined
          }
        >
          Your first batch will show its processing plan for your altitude here.
        </EmptyState>
      ) : (
        <BatchLog hid={hid} batches={batches.data ?? []} />
      )}
    </>
  );
}
