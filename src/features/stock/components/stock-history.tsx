import type { StockChangeView } from '@shared/schemas/stock';
import { stockItemWords, STOCK_REASON_NAMES, STOCK_WORDS } from '@shared/words/stock';

const when = (at: string) =>
  new Date(at).toLocaleString('en-US', { month: 'short', day: 'numeric', hour: 'numeric', minute: '2-digit' });

/** Who changed which count, when, by how much and why: newest first. */
export function StockHistory({ history }: { history: StockChangeView[] }) {
  return (
    <section aria-labelledby="stock-history" className="rounded-card border border-line bg-surface px-4 py-3">
      <h2 id="stock-history" className="text-lg">
        {STOCK_WORDS.history}
      </h2>
      {history.length === 0 ? (
        <p className="text-ink-muted">{STOCK_WORDS.noHistory}</p>
      ) : (
        <ol className="flex flex-col">
          {history.map((row) => (
            <li key={row.id} className="border-b border-line py-2 last:border-b-0">
              <p className="flex flex-wrap justify-between gap-x-3">
                <span className="font-bold tabular">
                  {row.delta > 0 ? '+' : row.delta < 0 ? '−' : '±'}
                  {Math.abs(row.delta)} {stockItemWords(row.item, row.size, Math.abs(row.delta))}
                </span>
                <span className="text-ink-muted tabular">now {row.countAfter}</span>
              </p>
              <p className="text-sm text-ink-muted">
                {STOCK_REASON_NAMES[row.reason]} · {row.who ?? 'someone no longer in the household'} · {when(row.at)}
              </p>
              {row.short > 0 && (
                <p className="text-sm">{row.short} more used than were in stock; the count stopped at 0.</p>
              )}
              {row.note && <p className="text-sm">“{row.note}”</p>}
            </li>
          ))}
        </ol>
      )}
    </section>
  );
}
