import { useState } from 'react';
import type { ImportProblem, ImportRow } from '@shared/schemas/batches';
import { Button } from '@/components/ui/button';
import { Notice } from '@/components/ui/notice';
import { useCommitImport, usePreviewImport } from '../api/import-batches';
import { dateWords } from '@shared/words';
import { CSV_IMPORT_COLUMNS, csvChoiceList } from '@shared/words/csv';
import { useUnits } from '@/lib/units';

const EXAMPLE = 'product,recipe,canned_on,jar_size,jars_filled,jars_sealed,method,minutes,notes';
const NEEDED = {
  always: 'needed',
  'batch rows': 'needed, one row a batch',
  'jar rows': 'needed, one row a jar',
  no: 'may be empty',
} as const;

/** The columns the import reads and the values each takes, from the same words the export writes. */
function ImportColumns() {
  return (
    <details className="rounded-card border border-line bg-surface p-3">
      <summary className="cursor-pointer font-bold">Columns and accepted values</summary>
      <dl className="mt-2 flex flex-col gap-2">
        {CSV_IMPORT_COLUMNS.map((c) => (
          <div key={c.column}>
            <dt>
              <code className="rounded bg-sunken px-1">{c.column}</code>{' '}
              <span className="text-ink-muted">({NEEDED[c.needed]})</span>
            </dt>
            <dd>
              {c.says}
              {c.choices && <> One of: {csvChoiceList(c.choices)} Capitals do not matter.</>}
            </dd>
          </div>
        ))}
      </dl>
    </details>
  );
}

/** Choose a file, see every row checked, then write all of it or none of it. */
export function CsvImport({ hid }: { hid: string }) {
  const units = useUnits();
  const [csv, setCsv] = useState<string | null>(null);
  const [fileName, setFileName] = useState('');
  const preview = usePreviewImport(hid);
  const commit = useCommitImport(hid);
  const result = preview.data as { rows: ImportRow[]; problems: ImportProblem[] } | undefined;

  async function choose(file: File | undefined) {
    if (!file) return;
    const text = await file.text();
    setCsv(text);
    setFileName(file.name);
    commit.reset();
    preview.mutate(text);
  }

  return (
    <div className="flex flex-col gap-3">
      <p className="text-ink-muted">
        A CSV with the header <code className="break-all rounded bg-sunken px-1">{EXAMPLE}</code>. Recipe, minutes and
        notes may be empty; where a recipe is named, its plan is worked out for your altitude. The shelf’s own CSV
        export (one row a jar) imports as it is, into this household or another.
      </p>
      <ImportColumns />
      <div>
        <label className="inline-flex min-h-11 cursor-pointer items-center rounded-lg border border-line bg-surface px-4 font-bold hover:bg-sunken">
          {fileName ? `Choose another file (${fileName})` : 'Choose a CSV file'}
          <input
            type="file"
            accept=".csv,text/csv"
            className="sr-only"
            onChange={(e) => void choose(e.target.files?.[0])}
          />
        </label>
      </div>
      {preview.error && (
        <Notice tone="past" role="alert">
          {preview.error.message}
        </Notice>
      )}
      {result && result.problems.length > 0 && (
        <Notice
          tone="past"
          role="alert"
          title={`Nothing can be imported until ${result.problems.length === 1 ? 'this is' : 'these are'} fixed`}
        >
          <ul className="list-disc pl-5">
            {result.problems.map((p) => (
              <li key={`${p.row}-${p.field}-${p.message}`}>
                Row {p.row}
                {p.field !== '_' ? ` (${p.field})` : ''}: {p.message}
              </li>
            ))}
          </ul>
        </Notice>
      )}
      {result && result.rows.length > 0 && (
        <div className="overflow-x-auto rounded-card border border-line bg-surface">
          <table className="w-full min-w-[36rem] text-left">
            <caption className="sr-only">Batches the file holds</caption>
            <thead className="bg-sunken/70">
              <tr>
                {['Row', 'Product', 'Canned', 'Jars', 'Sealed', 'Minutes'].map((h) => (
                  <th key={h} scope="col" className="px-3 py-2">
                    {h}
                  </th>
                ))}
              </tr>
            </thead>
            <tbody>
              {result.rows.map((row) => (
                <tr key={row.row} className="tabular border-t border-line">
                  <td className="px-3 py-2">{row.row}</td>
                  <td className="px-3 py-2">{row.productName}</td>
                  <td className="px-3 py-2">{dateWords(row.cannedOn)}</td>
                  <td className="px-3 py-2">
                    {row.jarsFilled} {units.jarSize(row.jarSize)}
                  </td>
                  <td className="px-3 py-2">{row.jarsSealed}</td>
                  <td className="px-3 py-2">{row.minutes ?? '—'}</td>
                </tr>
              ))}
            </tbody>
          </table>
        </div>
      )}
      {result && result.problems.length === 0 && csv && !commit.isSuccess && (
        <Button onClick={() => commit.mutate(csv)} disabled={commit.isPending} className="self-start">
          {commit.isPending ? 'Importing…' : `Import ${result.rows.length} batches`}
        </Button>
      )}
      {commit.error && (
        <Notice tone="past" role="alert">
          {commit.error.message}
        </Notice>
      )}
      {commit.data && (
        <Notice tone="action" role="status" title="Imported">
          {commit.data.imported} batches and {commit.data.jars} jars are on the shelf now.
        </Notice>
      )}
    </div>
  );
}
