import { useEffect, useRef } from 'react';
import { SLOTS } from '@shared/choices';
import { monthDayWords, weekdayWords } from '@shared/words';
import { useBoard } from '../board-context';
import { SLOT_LABELS, sourceLabel, type Held } from '../drag';
import { isPending } from '../week-edits';

const choice =
  'min-h-11 rounded-lg border border-line bg-surface font-bold text-action hover:border-action hover:bg-action-soft disabled:font-normal disabled:text-ink-muted';

/** The keyboard and screen-reader way to put a meal on a slot, or a product on a planned meal: a list of places. */
export function PutOnMenu({ id, source, onClose }: { id: string; source: Held; onClose: () => void }) {
  const board = useBoard();
  const heading = useRef<HTMLHeadingElement>(null);
  useEffect(() => heading.current?.focus(), []);
  const name = sourceLabel(source);
  const entries = board.week.days.flatMap((day) =>
    SLOTS.flatMap((slot) => day.entries.filter((e) => e.slot === slot).sort((a, b) => a.position - b.position)),
  );
  return (
    <div
      id={id}
      role="group"
      aria-labelledby={`${id}-title`}
      onKeyDown={(e) => e.key === 'Escape' && (e.stopPropagation(), onClose())}
      className="flex flex-col gap-2 rounded-lg border-2 border-action bg-surface p-2"
    >
      <div className="flex items-center justify-between gap-2">
        <h3 id={`${id}-title`} ref={heading} tabIndex={-1} className="min-w-0 text-base">
          Put {name} on…
        </h3>
        <button
          type="button"
          onClick={onClose}
          className="min-h-11 shrink-0 rounded-lg px-3 font-bold text-action hover:bg-action-soft"
        >
          Close
        </button>
      </div>
      {source.type === 'meal' ? (
        <ul className="flex flex-col gap-1">
          {board.week.days.map((day) => (
            <li key={day.date} className="grid grid-cols-[4.5rem_repeat(4,minmax(0,1fr))] items-center gap-1">
              <span className="tabular text-sm font-bold leading-tight">
                {weekdayWords(day.date).slice(0, 3)}{' '}
                <span className="font-normal text-ink-muted">{monthDayWords(day.date)}</span>
              </span>
              {SLOTS.map((slot) => (
                <button
                  key={slot}
                  type="button"
                  className={`${choice} px-1 text-xs`}
                  aria-label={`${weekdayWords(day.date)} ${slot}`}
                  onClick={() => {
                    board.put(source, { type: 'slot', date: day.date, slot });
                    onClose();
                  }}
                >
                  {SLOT_LABELS[slot]}
                </button>
              ))}
            </li>
          ))}
        </ul>
      ) : entries.length === 0 ? (
        <p className="text-sm text-ink-muted">
          No meals are planned this week yet. Put a meal on a day first, then pair {name} with it.
        </p>
      ) : (
        <ul className="flex flex-col gap-1">
          {entries.map((entry) => {
            const paired = entry.pairings.some((p) => p.productId === source.product.id);
            return (
              <li key={entry.id}>
                <button
                  type="button"
                  className={`${choice} w-full px-2 text-left text-sm`}
                  disabled={paired || isPending(entry.id)}
                  onClick={() => {
                    board.put(source, { type: 'entry', entry });
                    onClose();
                  }}
                >
                  {entry.title}
                  <span className="font-normal text-ink-muted">
                    {' '}
                    · {weekdayWords(entry.date)} {entry.slot}
                    {paired ? ` · has ${name}` : ''}
                  </span>
                </button>
              </li>
            );
          })}
        </ul>
      )}
    </div>
  );
}
