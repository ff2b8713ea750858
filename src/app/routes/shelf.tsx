import { lazy, Suspense, useDeferredValue, useMemo, useState } from 'react';
import { Link, useSearchParams } from 'react-router-dom';
import { can } from '@shared/roles';
import { giftsThisYearWords } from '@shared/words/gifts';
import { SelectField, TextField } from '@/components/ui/field';
import { CautionLine } from '@/components/ui/caution-line';
import { Notice } from '@/components/ui/notice';
import { EmptyState, PageHeader } from '@/components/ui/page';
import { useCurrentHousehold } from '@/features/households/use-current-household';
import { useJars } from '@/features/shelf/api/get-jars';
import { usePlaces } from '@/features/shelf/api/get-places';
import { useGifts } from '@/features/shelf/api/give-jar';
import { useProducts } from '@/features/shelf/api/get-products';
import { ShelfCards } from '@/features/shelf/components/shelf-cards';
import { shelfBatchRows, shelfProductGroups } from '@/features/shelf/shelf-rows';
import type { searchShelf } from '@/features/shelf/shelf-search';
import { paths } from '@shared/paths';
import { PLACE_WORDS } from '@shared/words/shelf-places';
import { STOCK_WORDS } from '@shared/words/stock';

const VIEWS = [
  { id: 'cards', label: 'By product' },
  { id: 'table', label: 'Table' },
] as const;

// The table (TanStack Table) and the fuzzy search (Fuse) wait for the tap that needs them: the first view is the cards.
const ShelfTable = lazy(() =>
  import('@/features/shelf/components/shelf-table').then((module) => ({ default: module.ShelfTable })),
);

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
  const places = usePlaces(hid);
  const view = params.get('view') === 'table' ? 'table' : 'cards';
  // The place filter lives in the address with the view, so a shared link shows the same shelf: '' every place, 'none'.
  const place = params.get('place') ?? '';
  const [text, setText] = useState('');
  // The jars are drawn in a render of their own just after the first: the header and the caution show first.
  const drawJars = useDeferredValue(true, false);
  const [search, setSearch] = useState<typeof searchShelf | null>(null);
  const loadSearch = () => {
    if (!search) void import('@/features/shelf/shelf-search').then((module) => setSearch(() => module.searchShelf));
  };
  const setParam = (key: string, value: string) => {
    const next = new URLSearchParams(params);
    if (value) next.set(key, value);
    else next.delete(key);
    setParams(next, { replace: true });
  };

  const placed = useMemo(
    () =>
      place === ''
        ? (jars.data ?? [])
        : // An opened jar lives in the fridge, whatever shelf it came from: one place shows its sealed jars.
          (jars.data ?? []).filter((jar) => jar.state === 'sealed' && (jar.placeId ?? 'none') === place),
    [jars.data, place],
  );
  const rows = useMemo(() => shelfBatchRows(placed, products.data ?? []), [placed, products.data]);
  const groups = useMemo(() => {
    const all = shelfProductGroups(placed, products.data ?? [], rows);
    // In one place, only the products kept there.
    return place === '' ? all : all.filter((group) => group.sealed > 0);
  }, [placed, products.data, rows, place]);
  const found = useMemo(
    () => (search ? search(rows, products.data ?? [], text) : null),
    [search, rows, products.data, text],
  );
  const shownRows = found ? rows.filter((r) => found.batchIds.has(r.batchId)) : rows;
  const shownGroups = found ? groups.filter((g) => found.productIds.has(g.product.id)) : groups;
  const sealedCount = rows.reduce((sum, row) => sum + row.sealed, 0);
  const canCook = can(role, 'cook');
  // The jars counted, with this year's gifts: the header's line and the caution show from then on.
  const counted = Boolean(jars.data) && !gifts.isPending;

  return (
    <>
      <PageHeader
        title="Shelf"
        lead={
          counted
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
      {/* The caution is the same for every shelf: it shows with the header's own line (so neither moves the other),
          above where the jars will be, and not for a shelf with nothing on it. */}
      {counted && products.data?.length !== 0 && (
        <div className="mb-4">
          <CautionLine about="best-quality" />
        </div>
      )}
      {/* The header's line, the place filter and the jars come together, so nothing moves once they show. */}
      {jars.isPending || products.isPending || gifts.isPending || places.isPending || !drawJars ? (
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
          <div className="flex flex-wrap items-end justify-between gap-3">
            {(places.data?.length ?? 0) > 0 && (
              <div className="w-full sm:w-56">
                <SelectField label={PLACE_WORDS.name} value={place} onChange={(e) => setParam('place', e.target.value)}>
                  <option value="">{PLACE_WORDS.everywhere}</option>
                  {places.data!.map((p) => (
                    <option key={p.id} value={p.id}>
                      {p.name}
                    </option>
                  ))}
                  <option value="none">{PLACE_WORDS.noneOnShelf}</option>
                </SelectField>
              </div>
            )}
            <div className="w-full sm:w-96">
              <TextField
                label="Search the shelf"
                type="search"
                placeholder="Product, kind, batch note…"
                value={text}
                onFocus={loadSearch}
                onChange={(e) => {
                  loadSearch();
                  setText(e.target.value);
                }}
                hint="Finds near matches too: “chutny” finds the chutney."
              />
            </div>
            <div role="group" aria-label="Show the shelf" className="flex rounded-lg border border-line bg-surface p-1">
              {VIEWS.map((option) => (
                <button
                  key={option.id}
                  type="button"
                  aria-pressed={view === option.id}
                  onClick={() => setParam('view', option.id === 'cards' ? '' : option.id)}
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
            <Suspense fallback={<p className="text-ink-muted">Setting the table…</p>}>
              <ShelfTable hid={hid} rows={shownRows} />
            </Suspense>
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
