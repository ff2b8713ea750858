import { useMemo, useState } from 'react';
import { Link, useSearchParams } from 'react-router-dom';
import { can } from '@shared/roles';
import { giftsThisYearWords } from '@shared/words/gifts';
import { TextField } from '@/components/ui/field';
import { CautionLine } from '@/components/ui/caution-line';
import { Notice } from '@/components/ui/notice';
import { EmptyState, PageHeader } from '@/components/ui/page';
import { useCurrentHousehold } from '@/features/households/use-current-household';
import { useJars } from '@/features/shelf/api/get-jars';
import { useGifts } from '@/features/shelf/api/give-jar';
import { useProducts } from '@/features/shelf/api/get-products';
import { ShelfCards } from '@/features/shelf/components/shelf-cards';
import { ShelfTable } from '@/features/shelf/components/shelf-table';
import { searchShelf, shelfBatchRows, shelfProductGroups } from '@/features/shelf/shelf-rows';
import { paths } from '@shared/paths';
import { STOCK_WORDS } from '@shared/words/stock';

const VIEWS = [
  { id: 'cards', label: 'By product' },
  { id: 'table', label: 'Table' },
] as const;

const linkButton =
  'inline-flex min-h-11 items-center rounded-lg border border-line bg-surface px-4 font-bold text-ink hover:bg-sunken';

export function ShelfRoute() {
  const { hid, role } = useCurrentHousehold();
  const jars = useJars(hid);
  const products = useProducts(hid);
  const gifts = useGifts(hid);
  const givenByProduct = useMemo(
    () => new Map((gifts.data?.byProduct ?? []).map((entry) => [entry.productId, entry.jars])),
    [gifts.data],
  );
  const [params, setParams] = useSearchParams();
  const view = params.get('view') === 'table' ? 'table' : 'cards';
  const [text, setText] = useState('');

  const rows = useMemo(() => shelfBatchRows(jars.data ?? [], products.data ?? []), [jars.data, products.data]);
  const groups = useMemo(
    () => shelfProductGroups(jars.data ?? [], products.data ?? [], rows),
    [jars.data, products.data, rows],
  );
  const found = useMemo(() => searchShelf(rows, products.data ?? [], text), [rows, products.data, text]);
  const shownRows = found ? rows.filter((r) => found.batchIds.has(r.batchId)) : rows;
  const shownGroups = found ? groups.filter((g) => found.productIds.has(g.product.id)) : groups;
  const sealedCount = rows.reduce((sum, row) => sum + row.sealed, 0);
  const canCook = can(role, 'cook');

  return (
    <>
      <PageHeader
        title="Shelf"
        lead={
          jars.data
            ? `${sealedCount} sealed jars in ${rows.length} batches. Eat the oldest first, within their year of best quality.${gifts.data && gifts.data.jars > 0 ? ` ${giftsThisYearWords(gifts.data.jars, gifts.data.year)}` : ''}`
            : 'Every sealed jar, by product and batch, oldest first.'
        }
        actions={
          <>
            <Link to={paths.stock(hid)} className={linkButton}>
              {STOCK_WORDS.shopLink}
            </Link>
            <a href={`/api/households/${hid}/shelf.csv`} download className={linkButton}>
              Export CSV
            </a>
            {canCook && (
              <Link
                to={paths.newProduct(hid)}
                className="inline-flex min-h-11 items-center rounded-lg bg-action px-4 font-bold text-white hover:bg-action-strong"
              >
                New product
              </Link>
            )}
          </>
        }
      />
      {(jars.error || products.error) && (
        <Notice tone="past" role="alert" title="The shelf could not load.">
          {(jars.error ?? products.error)?.message}
        </Notice>
      )}
      {jars.isPending || products.isPending ? (
        <p className="text-ink-muted">Counting jars…</p>
      ) : products.data?.length === 0 ? (
        <EmptyState
          title="The shelf is empty"
          action={
            canCook ? (
              <Link to={paths.newProduct(hid)} className="font-bold text-action underline">
                Add your first product
              </Link>
            ) : undefined
          }
        >
          Add the preserves your household makes, then record a batch: its sealed jars line up here, oldest first.
        </EmptyState>
      ) : (
        <div className="flex flex-col gap-4">
          <CautionLine about="best-quality" />
          <div className="flex flex-wrap items-end justify-between gap-3">
            <div className="w-full sm:w-96">
              <TextField
                label="Search the shelf"
                type="search"
                placeholder="Product, kind, batch note…"
                value={text}
                onChange={(e) => setText(e.target.value)}
                hint="Finds near matches too: “chutny” finds the chutney."
              />
            </div>
            <div role="group" aria-label="Show the shelf" className="flex rounded-lg border border-line bg-surface p-1">
              {VIEWS.map((option) => (
                <button
                  key={option.id}
                  type="button"
                  aria-pressed={view === option.id}
                  onClick={() => setParams(option.id === 'cards' ? {} : { view: option.id }, { replace: true })}
                  className={`min-h-11 rounded-md px-4 font-bold ${view === option.id ? 'bg-action text-white' : 'text-ink hover:bg-sunken'}`}
                >
                  {option.label}
                </button>
              ))}
            </div>
          </div>
          {found && shownGroups.length === 0 && (
            <p className="text-ink-muted">Nothing on the shelf matches “{text}”.</p>
          )}
          {view === 'table' ? (
            <ShelfTable hid={hid} rows={shownRows} />
          ) : (
            <ShelfCards
              hid={hid}
              groups={shownGroups}
              canHandleJars={can(role, 'handleJars')}
              canCook={canCook}
              givenThisYear={givenByProduct}
            />
          )}
        </div>
      )}
    </>
  );
}
