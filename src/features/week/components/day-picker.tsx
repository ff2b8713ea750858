import { weekdayWords } from '@shared/words';
import type { WeekDay } from '@shared/schemas/week';

/** On a phone the board shows one day; this picks it. */
export function DayPicker({
  days,
  selected,
  today,
  onSelect,
}: {
  days: WeekDay[];
  selected: string;
  today: string;
  onSelect: (date: string) => void;
}) {
  return (
    <nav aria-label="Day of the week" className="grid grid-cols-7 gap-1">
      {days.map((day) => (
        <button
          key={day.date}
          type="button"
          aria-pressed={day.date === selected}
          onClick={() => onSelect(day.date)}
          className={`flex min-h-14 flex-col items-center justify-center rounded-lg border text-sm font-bold ${
            day.date === selected
              ? 'border-action bg-action text-white'
              : day.date === today
                ? 'border-action bg-surface text-action'
                : 'border-line bg-surface text-ink'
          }`}
        >
          <span aria-hidden="true">{weekdayWords(day.date, true)}</span>
          <span className="sr-only">{weekdayWords(day.date)}</span>
          <span className="tabular text-xs font-normal">{Number(day.date.slice(8))}</span>
          {day.entries.length > 0 && <span className="sr-only">, {day.entries.length} planned</span>}
        </button>
      ))}
    </nav>
  );
}
