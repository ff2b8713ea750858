import { useState } from 'react';
import type { RestockForecastView } from '@shared/schemas/restock';
import { useUpdateRestockSettings } from '../api/update-restock-settings';

/** Favourite and minimum jars, edited in place; a helper sees them read-only. */
export function RestockSettings({
  hid,
  forecast,
  canEdit,
}: {
  hid: string;
  forecast: RestockForecastView;
  canEdit: boolean;
}) {
  const update = useUpdateRestockSettings(hid);
  const [minJars, setMinJars] = useState(String(forecast.minJars));
  const save = (patch: { favourite?: boolean; minJars?: number }) =>
    update.mutate({ productId: forecast.productId, patch });
  const saveMinimum = () => {
    const value = Number(minJars);
    if (Number.isInteger(value) && value >= 0 && value !== forecast.minJars) save({ minJars: value });
    else setMinJars(String(forecast.minJars));
  };
  return (
    <div className="flex flex-wrap items-center gap-x-2 gap-y-3">
      <button
        type="button"
        aria-pressed={forecast.favourite}
        disabled={!canEdit || update.isPending}
        onClick={() => save({ favourite: !forecast.favourite })}
        className={`inline-flex min-h-11 items-center gap-2 rounded-lg border px-3 font-bold ${forecast.favourite ? 'border-soon-fill bg-soon-soft text-ink' : 'border-line bg-surface text-ink-muted'} disabled:cursor-default`}
      >
        <svg viewBox="0 0 24 24" className="h-5 w-5" aria-hidden="true">
          <path
            d="M12 3l2.7 5.6 6.1.9-4.4 4.3 1 6.1L12 17l-5.4 2.9 1-6.1L3.2 9.5l6.1-.9z"
            className={forecast.favourite ? 'fill-soon-fill stroke-soon' : 'fill-none stroke-ink-muted'}
            strokeWidth="1.5"
          />
        </svg>
        Favorite
      </button>
      <label className="flex items-center gap-2">
        <span className="text-sm font-bold">At least</span>
        <input
          type="number"
          inputMode="numeric"
          min={0}
          max={500}
          value={minJars}
          disabled={!canEdit}
          aria-label={`Keep at least this many sealed jars of ${forecast.productName}`}
          onChange={(event) => setMinJars(event.target.value)}
          onBlur={saveMinimum}
          onKeyDown={(event) => event.key === 'Enter' && saveMinimum()}
          className="min-h-11 w-16 rounded-lg border border-line bg-surface px-2 text-center tabular disabled:bg-sunken"
        />
        <span className="text-sm">sealed</span>
      </label>
      {update.isError && (
        <p role="alert" className="w-full text-sm font-bold text-past">
          {update.error.message}
        </p>
      )}
    </div>
  );
}
