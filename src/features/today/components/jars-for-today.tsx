import { lazy, Suspense } from 'react';
import { Link } from 'react-router-dom';
import type { TodayUse, TodayView } from '@shared/schemas/today';
import { count } from '@shared/words';
import { Button } from '@/components/ui/button';
import { Notice } from '@/components/ui/notice';
import { paths } from '@shared/paths';

// The open-jar change and its undo toast stay out of Today's first load (its script budget).
const OpenItButton = lazy(() => import('./open-it-button'));

const SLOT_NAMES = { breakfast: 'Breakfast', lunch: 'Lunch', dinner: 'Dinner', snack: 'Snack' } as const;

/** An opened jar this close to its use-by is the one to reach for: say so, by name. */
const OPENED_SOON_DAYS = 2;

function JarLink({ code }: { code: string }) {
  return (
    <Link to={paths.jar(code)} className="font-bold text-action underline underline-offset-4">
      jar {code}
    </Link>
  );
}

function whereFrom(portion: TodayUse) {
  if (!portion.jarCode) return <span className="font-bold text-soon">none on the shelf</span>;
  if (portion.opensToday)
    return (
      <>
        open <JarLink code={portion.jarCode} />
        {portion.jarPlaceWords ? ` ${portion.jarPlaceWords}` : ''}
      </>
    );
  const daysLeft = portion.openedJarDaysLeft;
  if (daysLeft !== null && daysLeft <= OPENED_SOON_DAYS) {
    return (
      <>
        use the opened jar first: <JarLink code={portion.jarCode} /> (
        {daysLeft === 0 ? 'use by today' : `${count(daysLeft, 'day')} left`})
      </>
    );
  }
  return (
    <>
      from <JarLink code={portion.jarCode} />
    </>
  );
}

/** What to open and use today, meal by meal, from the week's allocation; each new jar can be opened right here. */
export function JarsForToday({
  hid,
  use,
  short,
  canHandleJars,
}: Pick<TodayView, 'use' | 'short'> & { hid: string; canHandleJars: boolean }) {
  if (use.length === 0)
    return (
      <p className="text-ink-muted">
        No jars are paired with today’s meals. Pair a product with a meal on the Week to see it here.
      </p>
    );
  // One line per jar: two portions from the same new jar open it once.
  const openings = [...new Map(use.filter((p) => p.opensToday && p.jarId).map((p) => [p.jarId!, p])).values()];
  return (
    <div className="flex flex-col gap-3">
      {openings.length > 0 && (
        <Notice
          tone="action"
          title={openings.length === 1 ? 'Open one new jar today' : `Open ${openings.length} new jars today`}
        >
          <ul className="flex flex-col gap-1">
            {openings.map((portion) => (
              <li key={portion.jarId} className="flex flex-wrap items-center justify-between gap-x-3 gap-y-1">
                <span>
                  {portion.productName} (<JarLink code={portion.jarCode!} />)
                  {portion.jarPlaceWords ? `, ${portion.jarPlaceWords}` : ''}
                </span>
                {canHandleJars && (
                  // On the right, also when a long name wraps it onto a line of its own; while its code loads, the
                  // same button not yet working holds its place, so the row keeps its height (no layout shift).
                  <span className="ml-auto">
                    <Suspense
                      fallback={
                        <Button
                          variant="secondary"
                          disabled
                          aria-label={`Open it: jar ${portion.jarCode} of ${portion.productName}`}
                        >
                          Open it
                        </Button>
                      }
                    >
                      <OpenItButton
                        hid={hid}
                        jarId={portion.jarId!}
                        code={portion.jarCode!}
                        productName={portion.productName}
                      />
                    </Suspense>
                  </span>
                )}
              </li>
            ))}
          </ul>
        </Notice>
      )}
      <ul className="divide-y divide-line">
        {use.map((portion) => (
          <li
            key={`${portion.portionId}-${portion.jarCode}`}
            className="flex flex-wrap items-baseline justify-between gap-x-3 py-2"
          >
            <span>
              <span className="font-bold">{SLOT_NAMES[portion.slot]}</span> · {portion.mealTitle}:{' '}
              <span className="tabular">{portion.tbsp}</span> tbsp {portion.productName}
            </span>
            <span className="text-sm text-ink-muted">{whereFrom(portion)}</span>
          </li>
        ))}
      </ul>
      {short.length > 0 && (
        <Notice tone="soon" title="The shelf runs short today">
          {short.map((s) => `${s.tbsp} tbsp of ${s.productName}`).join(', ')} cannot be covered. Swap the pairing on the
          Week, or use something else.
        </Notice>
      )}
    </div>
  );
}
