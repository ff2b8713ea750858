import { monthDayWords, weekdayWords } from '@shared/words';
import { SLOTS } from '@shared/choices';
import type { WeekDay } from '@shared/schemas/week';
import { useBoard } from '../board-context';
import { DayNotes } from './day-notes';
import { SlotList } from './slot-list';

export function DayColumn({ day }: { day: WeekDay }) {
  const board = useBoard();
  const isToday = day.date === board.week.today;
  // The full weekday leads, so a screen reader (and a search by day) hears "Wednesday, Dec 9".
  const label = `${weekdayWords(day.date)}, ${monthDayWords(day.date)}`;
  const clear = () => {
    if (window.confirm(`Clear every meal planned for ${label}?`)) board.clearDay.mutate(day.date);
  };
  return (
    <section
      aria-label={label}
      className={`flex min-w-0 flex-col gap-1 rounded-card border p-0.5 lg:p-1 ${isToday ? 'border-action bg-action-soft/40' : 'border-line bg-surface/60'}`}
    >
      <header className="flex items-start justify-between gap-1">
        <h2 className="text-base leading-tight">
          <span className="block">{weekdayWords(day.date)}</span>
          <span className="tabular text-sm font-normal text-ink-muted">
            {monthDayWords(day.date)}
            {isToday && <span className="ml-1 font-bold text-action">Today</span>}
          </span>
        </h2>
        {board.canEdit && day.entries.length > 0 && (
          <button
            type="button"
            onClick={clear}
            aria-label={`Clear ${label}`}
            className="min-h-8 rounded-md px-1 text-xs font-bold text-ink-muted hover:bg-past-soft hover:text-past pointer-coarse:min-h-11 pointer-coarse:px-2"
          >
            Clear
          </button>
        )}
      </header>
      <DayNotes date={day.date} />
      {SLOTS.map((slot) => (
        <SlotList
          key={slot}
          date={day.date}
          slot={slot}
          entries={day.entries.filter((e) => e.slot === slot).sort((a, b) => a.position - b.position)}
        />
      ))}
    </section>
  );
}
