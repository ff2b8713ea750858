import type { RestockForecastView } from '@shared/schemas/restock';
import { count, dateWords } from '@shared/words';
import { LazyUseChart } from './lazy-use-chart';
import { RestockSettings } from './restock-settings';
import { useUnits, type Units } from '@/lib/units';

function runOutWords(forecast: RestockForecastView, units: Units) {
  if (forecast.dailyTbsp === 0) return 'Not eaten lately and nothing planned.';
  if (forecast.runOutOn === null) return 'Lasts well past next year at this rate.';
  return `At ${units.tbspPerDay(forecast.dailyTbsp)}, runs out around ${dateWords(forecast.runOutOn)}.`;
}

/** One product's rate, stock, run-out date and jar size advice, with its use chart. */
export function ForecastCard({
  hid,
  forecast,
  canCook,
}: {
  hid: string;
  forecast: RestockForecastView;
  canCook: boolean;
}) {
  const units = useUnits();
  const advice = forecast.jarSizeAdvice;
  return (
    <article
      aria-labelledby={`forecast-${forecast.productId}`}
      className="flex flex-col gap-3 rounded-card border border-line bg-surface p-4"
    >
      <div className="flex flex-wrap items-baseline justify-between gap-2">
        <h3 id={`forecast-${forecast.productId}`} className="text-lg">
          {forecast.productName}
        </h3>
        <p className="tabular text-ink-muted">
          {count(forecast.sealedJars, 'sealed jar')}
          {forecast.jarsOnHand > forecast.sealedJars && `, ${forecast.jarsOnHand - forecast.sealedJars} open`}
        </p>
      </div>
      <p>{runOutWords(forecast, units)}</p>
      {forecast.givenThisYear > 0 && (
        <p className="text-sm text-ink-muted">
          {count(forecast.givenThisYear, 'jar')} given away this year
          {forecast.givenJarsInHistory > 0 && `, ${forecast.givenJarsInHistory} in the last twelve weeks`}: counted
          apart from what you ate.
        </p>
      )}
      <p className="text-sm text-ink-muted">
        {advice.size
          ? `Jar size that gets finished within ${forecast.useWithinDays} days of opening: ${units.jarSize(advice.size)}.`
          : 'No jar size advice until it is eaten or planned.'}
        {advice.size && advice.cautions.map((caution) => ` ${caution}`)}
      </p>
      <LazyUseChart productName={forecast.productName} months={forecast.monthlyUse} />
      <RestockSettings hid={hid} forecast={forecast} canEdit={canCook} />
    </article>
  );
}
