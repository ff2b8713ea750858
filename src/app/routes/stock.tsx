import { Link } from 'react-router-dom';
import { can } from '@shared/roles';
import { paths } from '@shared/paths';
import { STOCK_WORDS } from '@shared/words/stock';
import { Notice } from '@/components/ui/notice';
import { PageHeader } from '@/components/ui/page';
import { useCurrentHousehold } from '@/features/households/use-current-household';
import { useStock } from '@/features/stock';
import { StockCounts } from '@/features/stock/components/stock-counts';
import { StockHistory } from '@/features/stock/components/stock-history';

export function StockRoute() {
  const { hid, role } = useCurrentHousehold();
  const stock = useStock(hid);
  return (
    <>
      <PageHeader
        title={STOCK_WORDS.title}
        lead={STOCK_WORDS.intro}
        actions={
          <Link
            to={paths.shelf(hid)}
            className="inline-flex min-h-11 items-center rounded-lg border border-line bg-surface px-4 font-bold text-ink hover:bg-sunken"
          >
            Back to the shelf
          </Link>
        }
      />
      {stock.error && (
        <Notice tone="past" role="alert" title="The stock could not load.">
          {stock.error.message}
        </Notice>
      )}
      {stock.isPending ? (
        <p className="text-ink-muted">Counting the cupboard…</p>
      ) : stock.data ? (
        <div className="grid items-start gap-5 lg:grid-cols-2">
          <StockCounts hid={hid} stock={stock.data} canCorrect={can(role, 'cook')} />
          <StockHistory history={stock.data.history} />
        </div>
      ) : null}
    </>
  );
}
