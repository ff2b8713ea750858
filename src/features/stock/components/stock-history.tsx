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
          {history.map((row) => {
            // What was used, including what was never entered: the count itself stopped at 0.
            const change = row.delta - row.short;
            return (
              <li key={row.id} className="border-b border-line py-2 last:border-b-0">
                <p className="flex flex-wrap justify-between gap-x-3">
                  <span className="font-bold tabular">
                    {change > 0 ? '+' : '−'}
                    {Math.abs(change)} {stockItemWords(row.item, row.size, Math.abs(change))}
                  </span>
                  <span className="text-ink-muted tabular">now {row.countAfter}</span>
                </p>
                <p className="text-sm text-ink-muted">
                  {STOCK_REASON_NAMES[row.reason]} · {row.who ?? 'someone no longer in the household'} · {when(row.at)}
                </p>
                {row.short > 0 && (
                  <p className="text-sm">{row.short} of them were not in stock, so the count stopped at 0.</p>
                )}
                {row.note && <p className="text-sm">“{row.note}”</p>}
              </li>
            );
          })}
        </ol>
      )}
    </section>
  );
}
