import {
  createColumnHelper,
  flexRender,
  getCoreRowModel,
  getFilteredRowModel,
  getSortedRowModel,
  useReactTable,
  type SortingState,
} from '@tanstack/react-table';
import { useMemo, useState } from 'react';
import { Link } from 'react-router-dom';
import { DATE_NAMES, dateWords, PRODUCT_KIND_NAMES } from '@shared/words';
import { PLACE_WORDS } from '@shared/words/shelf-places';
import type { ProductKind } from '@shared/domain';
import { CheckboxField, SelectField } from '@/components/ui/field';
import type { ShelfBatchRow } from '../shelf-rows';
import { PastBestBadge } from './jar-badges';
import { ColourDot } from './colour-dot';
import { paths } from '@shared/paths';
import { useUnits } from '@/lib/units';

const column = createColumnHelper<ShelfBatchRow>();
const HIDDEN_COLUMNS = { pastBestQuality: false };

export function ShelfTable({ hid, rows }: { hid: string; rows: ShelfBatchRow[] }) {
  const units = useUnits();
  const [sorting, setSorting] = useState<SortingState>([{ id: 'bestBy', desc: false }]);
  const [kind, setKind] = useState('');
  const [pastOnly, setPastOnly] = useState(false);
  // Stable references: the table re-renders forever when its columns or state are new on every render.
  const columns = useMemo(
    () => [
      column.accessor('productName', {
        header: 'Product',
        cell: (info) => (
          <Link
            to={paths.batch(hid, info.row.original.batchId)}
            className="flex min-h-11 items-center gap-2 font-bold text-action underline-offset-4 hover:underline"
          >
            <ColourDot colour={info.row.original.productColour} />
            {info.getValue()}
          </Link>
        ),
      }),
      column.accessor('productKind', {
        header: 'Kind',
        cell: (info) => PRODUCT_KIND_NAMES[info.getValue() as ProductKind],
        filterFn: 'equals',
      }),
      column.accessor('cannedOn', {
        header: 'Canned',
        cell: (info) => <span className="tabular whitespace-nowrap">{dateWords(info.getValue())}</span>,
      }),
      column.accessor('jarSize', {
        header: 'Jar size',
        cell: (info) => <span className="whitespace-nowrap">{units.jarSize(info.getValue())}</span>,
      }),
      column.accessor('sealed', {
        header: 'Sealed',
        cell: (info) => <span className="tabular font-bold">{info.getValue()}</span>,
      }),
      column.accessor('bestBy', {
        header: DATE_NAMES.bestQuality,
        cell: (info) => (
          <span className="flex flex-wrap items-center gap-2">
            <span className="tabular">{dateWords(info.getValue())}</span>
            {info.row.original.pastBestQuality && <PastBestBadge bestBy={info.getValue()} />}
          </span>
        ),
      }),
      column.accessor('pastBestQuality', { header: 'Past best', enableSorting: false, filterFn: 'equals' }),
      column.accessor('places', {
        header: PLACE_WORDS.name,
        cell: (info) => <span className="whitespace-nowrap">{info.getValue()}</span>,
      }),
      column.accessor('notes', {
        header: 'Notes',
        enableSorting: false,
        cell: (info) => <span className="text-ink-muted">{info.getValue()}</span>,
      }),
    ],
    [hid, units],
  );
  const columnFilters = useMemo(
    () => [
      ...(kind ? [{ id: 'productKind', value: kind }] : []),
      ...(pastOnly ? [{ id: 'pastBestQuality', value: true }] : []),
    ],
    [kind, pastOnly],
  );
  const table = useReactTable({
    data: rows,
    columns,
    state: {
      sorting,
      columnFilters,
      columnVisibility: HIDDEN_COLUMNS,
    },
    onSortingChange: setSorting,
    getCoreRowModel: getCoreRowModel(),
    getSortedRowModel: getSortedRowModel(),
    getFilteredRowModel: getFilteredRowModel(),
  });
  const kinds = [...new Set(rows.map((r) => r.productKind))].sort();

  return (
    <div className="flex flex-col gap-3">
      <div className="flex flex-wrap items-end gap-4">
        <div className="w-56">
          <SelectField label="Kind" value={kind} onChange={(e) => setKind(e.target.value)}>
            <option value="">Every kind</option>
            {kinds.map((k) => (
              <option key={k} value={k}>
                {PRODUCT_KIND_NAMES[k as ProductKind]}
              </option>
            ))}
          </SelectField>
        </div>
        <div className="pb-2">
          <CheckboxField
            label="Only jars past best quality"
            checked={pastOnly}
            onChange={(e) => setPastOnly(e.target.checked)}
          />
        </div>
      </div>
      <div className="overflow-x-auto rounded-card border border-line bg-surface">
        <table className="w-full min-w-[48rem] border-collapse text-left">
          <caption className="sr-only">Sealed jars on the shelf by batch; column headers sort the table.</caption>
          <thead className="bg-sunken/70">
            {table.getHeaderGroups().map((group) => (
              <tr key={group.id}>
                {group.headers.map((header) => {
                  const sorted = header.column.getIsSorted();
                  return (
                    <th
                      key={header.id}
                      scope="col"
                      aria-sort={sorted === 'asc' ? 'ascending' : sorted === 'desc' ? 'descending' : undefined}
                      className="px-3 py-1 font-bold"
                    >
                      {header.column.getCanSort() ? (
                        <button
                          type="button"
                          onClick={header.column.getToggleSortingHandler()}
                          className="flex min-h-11 items-center gap-1 font-bold whitespace-nowrap"
                        >
                          {flexRender(header.column.columnDef.header, header.getContext())}
                          <span aria-hidden="true" className="text-ink-muted">
                            {sorted === 'asc' ? '▲' : sorted === 'desc' ? '▼' : '↕'}
                          </span>
                        </button>
                      ) : (
                        flexRender(header.column.columnDef.header, header.getContext())
                      )}
                    </th>
                  );
                })}
              </tr>
            ))}
          </thead>
          <tbody>
            {table.getRowModel().rows.map((row) => (
              <tr key={row.id} className="border-t border-line">
                {row.getVisibleCells().map((cell) => (
                  <td key={cell.id} className="px-3 py-1 align-middle">
                    {flexRender(cell.column.columnDef.cell, cell.getContext())}
                  </td>
                ))}
              </tr>
            ))}
          </tbody>
        </table>
        {table.getRowModel().rows.length === 0 && (
          <p className="p-4 text-ink-muted">No batch on the shelf matches these filters.</p>
        )}
      </div>
    </div>
  );
}
