import { useEffect } from 'react';
import { useSearchParams } from 'react-router-dom';
import { can } from '@shared/roles';
import { giftsThisYearWords } from '@shared/words/gifts';
import { Notice } from '@/components/ui/notice';
import { EmptyState, PageHeader } from '@/components/ui/page';
import { useCurrentHousehold } from '@/features/households/use-current-household';
import { useRestock } from '@/features/restock/api/get-restock';
import { ForecastCard } from '@/features/restock/components/forecast-card';
import { SuggestionCard } from '@/features/restock/components/suggestion-card';

export function RestockRoute() {
  const { hid, role } = useCurrentHousehold();
  const restock = useRestock(hid);
  const [params] = useSearchParams();
  const focus = params.get('product');
  const canCook = can(role, 'cook');

  useEffect(() => {
    if (focus && restock.data) document.getElementById(`restock-${focus}`)?.scrollIntoView({ block: 'center' });
  }, [focus, restock.data]);

  return (
    <>
      <PageHeader
        title="Restock"
        lead="Favorites to restock, and the batch that would carry you to the next harvest."
      />
      {restock.isError && (
        <Notice tone="past" role="alert" title="The restock list could not be loaded">
          {restock.error.message}
        </Notice>
      )}
      {!restock.data && !restock.isError && <p className="text-ink-muted">Loading…</p>}
      {restock.data && (
        <div className="flex flex-col gap-8">
          <section aria-labelledby="needs-batch">
            <h2 id="needs-batch" className="mb-3 text-xl">
              Restock suggestions
            </h2>
            {restock.data.suggestions.length === 0 ? (
              <EmptyState title="Nothing to restock">
                Mark your favorites and set a minimum below; Larderly watches the count for you.
              </EmptyState>
            ) : (
              <div className="grid gap-4 md:grid-cols-2">
                {restock.data.suggestions.map((suggestion) => (
                  <SuggestionCard
                    key={suggestion.productId}
                    hid={hid}
                    suggestion={suggestion}
                    canCook={canCook}
                    focused={suggestion.productId === focus}
                  />
                ))}
              </div>
            )}
          </section>
          <section aria-labelledby="every-product">
            <h2 id="every-product" className="mb-1 text-xl">
              Every product
            </h2>
            <p className="mb-3 max-w-prose text-ink-muted">
              The rate is the larger of the last twelve weeks’ finished jars and the meals planned from today. Jars
              given away are counted apart: they leave the shelf but do not raise the rate.{' '}
              {giftsThisYearWords(restock.data.givenThisYear, Number(restock.data.today.slice(0, 4)))}
            </p>
            {restock.data.forecasts.length === 0 ? (
              <EmptyState title="No products yet">
                Add products and record a batch on the Shelf to see how fast each one goes.
              </EmptyState>
            ) : (
              <div className="grid gap-4 md:grid-cols-2 xl:grid-cols-3">
                {restock.data.forecasts.map((forecast) => (
                  <ForecastCard key={forecast.productId} hid={hid} forecast={forecast} canCook={canCook} />
                ))}
              </div>
            )}
          </section>
        </div>
      )}
    </>
  );
}
