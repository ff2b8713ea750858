import type { ProposedMealView } from '@shared/schemas/week-proposal';
import { weekday } from '../drag';
import { useUnits } from '@/lib/units';

/** One proposed meal: where it goes, why, which jar each pairing draws from, and a swap for the next best. */

export function ProposedMealRow({
  meal,
  chosen,
  onChoose,
  onSwap,
  busy,
}: {
  meal: ProposedMealView;
  chosen: boolean;
  onChoose: (on: boolean) => void;
  onSwap: () => void;
  busy: boolean;
}) {
  const units = useUnits();
  const place = `${weekday(meal.date)} ${meal.slot}`;
  const next = meal.alternatives[0];
  return (
    <li
      className="flex flex-col gap-1 rounded-lg border border-line bg-paper px-3 py-2"
      data-proposed={`${place}: ${meal.title}`}
    >
      <div className="flex flex-wrap items-start justify-between gap-2">
        <label className="flex min-h-11 flex-1 items-start gap-2">
          <input
            type="checkbox"
            className="mt-1 size-5 accent-[var(--color-action)]"
            checked={chosen}
            onChange={(e) => onChoose(e.target.checked)}
          />
          <span>
            <span className="block text-sm text-ink-muted">{place}</span>
            <span className="font-bold">{meal.title}</span>{' '}
            <span className="tabular text-sm text-ink-muted">· serves {meal.servings}</span>
          </span>
        </label>
        {next && (
          <button
            type="button"
            className="min-h-11 rounded-lg px-3 text-sm font-bold text-action hover:bg-action-soft disabled:opacity-60"
            onClick={onSwap}
            disabled={busy}
          >
            Swap for {next.title}
          </button>
        )}
      </div>
      <p className="text-sm">{meal.reason}</p>
      {meal.pairings.length > 0 && (
        <ul className="tabular flex flex-col gap-0.5 text-xs text-info">
          {meal.pairings.map((p) => (
            <li key={p.productId}>
              {p.name}:{' '}
              {p.jars.map((j) => `${units.tbsp(j.tbsp)} ${j.opens ? 'opens' : 'from'} jar ${j.code}`).join(', then ')}
            </li>
          ))}
        </ul>
      )}
    </li>
  );
}
