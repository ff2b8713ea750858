import { useState } from 'react';
import type { StockItem } from '@shared/domain';
import type { JarStockView } from '@shared/schemas/stock';
import { JAR_SIZE_NAMES } from '@shared/words';
import { MOUTH_NAMES, STOCK_WORDS } from '@shared/words/stock';
import { Button } from '@/components/ui/button';
import { Notice } from '@/components/ui/notice';
import { useCorrectStock } from '../api/correct-stock';

const sentence = (words: string) => words.charAt(0).toUpperCase() + words.slice(1);
/** Shown always; the other sizes wait under a disclosure unless the cupboard holds some. */
const EVERYDAY_SIZES: readonly string[] = ['half-pint', 'pint', 'quart'];

interface Row {
  item: StockItem;
  size: string;
  label: string;
  count: number;
}

function CountRow({ hid, row, canCorrect, note }: { hid: string; row: Row; canCorrect: boolean; note: string }) {
  const correct = useCorrectStock(hid);
  const [value, setValue] = useState(String(row.count));
  const wanted = Number(value);
  const valid = value.trim() !== '' && Number.isInteger(wanted) && wanted >= 0;
  const fieldError = correct.error && 'fields' in correct.error ? (correct.error.fields as Record<string, string>) : {};
  return (
    <li className="flex flex-col gap-1 border-b border-line py-3 last:border-b-0">
      <div className="flex flex-wrap items-center gap-3">
        <span className="min-w-0 flex-1 font-bold">{row.label}</span>
        {canCorrect ? (
          <form
            className="flex items-center gap-2"
            onSubmit={(e) => {
              e.preventDefault();
              if (!valid) return;
              correct.mutate(
                row.item === 'jar'
                  ? { item: 'jar', size: row.size as never, count: wanted, note }
                  : { item: 'lid', size: row.size as never, count: wanted, note },
              );
            }}
          >
            <input
              type="number"
              inputMode="numeric"
              min={0}
              aria-label={`${row.label}: how many`}
              aria-invalid={!valid || undefined}
              className="min-h-11 w-20 rounded-lg border border-line bg-surface px-3 text-right tabular"
              value={value}
              onChange={(e) => setValue(e.target.value)}
            />
            <Button
              type="submit"
              variant="secondary"
              disabled={!valid || wanted === row.count || correct.isPending}
              aria-label={`${STOCK_WORDS.correct}: ${row.label}`}
            >
              {STOCK_WORDS.correct}
            </Button>
          </form>
        ) : (
          <span className="text-lg font-bold tabular">{row.count}</span>
        )}
      </div>
      {!valid && <p className="text-sm text-past">Enter a whole number, 0 or more.</p>}
      {correct.error && (
        <p className="text-sm text-past" role="alert">
          {fieldError.count ?? correct.error.message}
        </p>
      )}
    </li>
  );
}

/** The counts, each corrected on its own line by a cook or keeper after counting the cupboard. */
export function StockCounts({ hid, stock, canCorrect }: { hid: string; stock: JarStockView; canCorrect: boolean }) {
  const [note, setNote] = useState('');
  const jars: Row[] = stock.jars.map((j) => ({
    item: 'jar',
    size: j.size,
    label: sentence(`${JAR_SIZE_NAMES[j.size]} jars`),
    count: j.count,
  }));
  const lids: Row[] = stock.lids.map((l) => ({
    item: 'lid',
    size: l.mouth,
    label: sentence(`${MOUTH_NAMES[l.mouth]} lids`),
    count: l.count,
  }));
  const list = (rows: Row[]) => (
    <ul>
      {rows.map((row) => (
        // Keyed by the count too, so a saved or newly counted number shows as it is now.
        <CountRow
          key={`${row.item}-${row.size}-${row.count}`}
          hid={hid}
          row={row}
          canCorrect={canCorrect}
          note={note}
        />
      ))}
    </ul>
  );
  return (
    <div className="flex flex-col gap-5">
      {canCorrect ? (
        <label className="flex flex-col gap-1">
          <span className="font-bold">{STOCK_WORDS.correctNote}</span>
          <input
            className="min-h-11 rounded-lg border border-line bg-surface px-3"
            maxLength={200}
            placeholder="Two jars chipped; bought a box of lids"
            value={note}
            onChange={(e) => setNote(e.target.value)}
          />
        </label>
      ) : (
        <Notice>A cook or keeper corrects the counts after counting the cupboard.</Notice>
      )}
      <section aria-labelledby="stock-jars" className="rounded-card border border-line bg-surface px-4">
        <h2 id="stock-jars" className="pt-3 text-lg">
          {STOCK_WORDS.emptyJars}
        </h2>
        {list(jars.filter((row) => row.count > 0 || EVERYDAY_SIZES.includes(row.size)))}
        {jars.some((row) => row.count === 0 && !EVERYDAY_SIZES.includes(row.size)) && (
          <details className="border-t border-line py-3">
            <summary className="min-h-11 cursor-pointer content-center font-bold text-action">
              {STOCK_WORDS.otherSizes}
            </summary>
            {list(jars.filter((row) => row.count === 0 && !EVERYDAY_SIZES.includes(row.size)))}
          </details>
        )}
      </section>
      <section aria-labelledby="stock-lids" className="rounded-card border border-line bg-surface px-4">
        <h2 id="stock-lids" className="pt-3 text-lg">
          {STOCK_WORDS.newLids}
        </h2>
        <p className="text-sm text-ink-muted">{STOCK_WORDS.lidsHint}</p>
        {list(lids)}
      </section>
    </div>
  );
}
