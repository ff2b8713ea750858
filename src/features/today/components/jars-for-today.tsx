import type { TodayView } from '@shared/schemas/today';
import { Notice } from '@/components/ui/notice';

const SLOT_NAMES = { breakfast: 'Breakfast', lunch: 'Lunch', dinner: 'Dinner', snack: 'Snack' } as const;

/** What to open and use today, meal by meal, from the week's allocation. */
export function JarsForToday({ use, short }: Pick<TodayView, 'use' | 'short'>) {
  if (use.length === 0) return <p className="text-ink-muted">No jars are paired with today’s meals. Pair a product with a meal on the Week to see it here.</p>;
  const openings = use.filter((portion) => portion.opensToday);
  return (
    <div className="flex flex-col gap-3">
      {openings.length > 0 && (
        <Notice tone="action" title={openings.length === 1 ? 'Open one new jar today' : `Open ${openings.length} new jars today`}>
          {openings.map((portion) => `${portion.productName} (jar ${portion.jarCode})`).join(', ')}
        </Notice>
      )}
      <ul className="divide-y divide-line">
        {use.map((portion) => (
          <li key={`${portion.portionId}-${portion.jarCode}`} className="flex flex-wrap items-baseline justify-between gap-x-3 py-2">
            <span>
              <span className="font-bold">{SLOT_NAMES[portion.slot]}</span> · {portion.mealTitle}: <span className="tabular">{portion.tbsp}</span> tbsp {portion.productName}
            </span>
            <span className={`text-sm ${portion.jarCode ? 'text-ink-muted' : 'font-bold text-soon'}`}>
              {portion.jarCode ? `${portion.opensToday ? 'open jar' : 'from jar'} ${portion.jarCode}` : 'none on the shelf'}
            </span>
          </li>
        ))}
      </ul>
      {short.length > 0 && (
        <Notice tone="soon" title="The shelf runs short today">
          {short.map((s) => `${s.tbsp} tbsp of ${s.productName}`).join(', ')} cannot be covered. Swap the pairing on the Week, or use something else.
        </Notice>
      )}
    </div>
  );
}
