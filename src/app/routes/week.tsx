import { lazy, Suspense, useEffect, useState } from 'react';
import { useSearchParams } from 'react-router-dom';
import { addDays, requireIsoDate, weekStartOf } from '@shared/domain';
import { can } from '@shared/roles';
import { monthDayWords } from '@shared/words';
import { Button } from '@/components/ui/button';
import { Notice } from '@/components/ui/notice';
import { PageHeader } from '@/components/ui/page';
import { useHousehold } from '@/features/households/api/get-household';
import { useCurrentHousehold } from '@/features/households/use-current-household';
import { useCopyWeek } from '@/features/week/api/copy-week';
import { useMeals } from '@/features/week/api/get-meals';
import { useWeek } from '@/features/week/api/get-week';
import { PreferencesPanel } from '@/features/week/components/preferences-panel';
import { currentWeekStart, shiftWeek } from '@/features/week/week-dates';

// The board (drag and drop, the meal library's search) is a chunk of its own, fetched while the week's plan is read:
// the header, this screen's first paint, does not wait for it.
const loadBoard = () => import('@/features/week/components/week-board');
const WeekBoard = lazy(() => loadBoard().then((module) => ({ default: module.WeekBoard })));

/** The screen's line, the same for every week: it shows while the household is still being read. */
const WEEK_LEAD = 'Plan meals and pair them with jars from the shelf; the board says which jar each one draws from.';

function validDate(value: string | null) {
  try {
    return value ? requireIsoDate(value) : null;
  } catch {
    return null;
  }
}

export function WeekRoute() {
  const { hid, role, me } = useCurrentHousehold();
  const household = useHousehold(hid);
  const [params, setParams] = useSearchParams();
  if (!household.data) return <PageHeader title="Week" lead={WEEK_LEAD} actions={<p>Loading the week…</p>} />;
  const { timeZone, weekStartsOn } = household.data;
  const asked = validDate(params.get('start'));
  const day = validDate(params.get('day'));
  const start = asked ? weekStartOf(asked, weekStartsOn) : currentWeekStart(timeZone, weekStartsOn);
  const goTo = (next: string) => setParams(next === currentWeekStart(timeZone, weekStartsOn) ? {} : { start: next });
  return (
    <WeekScreen
      key={start}
      hid={hid}
      start={start}
      canEdit={can(role, 'cook')}
      isKeeper={role === 'keeper'}
      myId={me?.user.id ?? ''}
      goTo={goTo}
      thisWeek={currentWeekStart(timeZone, weekStartsOn)}
      day={day}
    />
  );
}

function WeekScreen({
  hid,
  start,
  canEdit,
  isKeeper,
  myId,
  goTo,
  thisWeek,
  day,
}: {
  hid: string;
  start: string;
  canEdit: boolean;
  isKeeper: boolean;
  myId: string;
  goTo: (start: string) => void;
  thisWeek: string;
  day: string | null;
}) {
  const week = useWeek(hid, start);
  const meals = useMeals(hid);
  // Asked for once the header has painted (a frame, then a task), beside the week's read.
  useEffect(() => {
    let timer: ReturnType<typeof setTimeout> | undefined;
    const frame = requestAnimationFrame(() => (timer = setTimeout(() => void loadBoard())));
    return () => {
      cancelAnimationFrame(frame);
      clearTimeout(timer);
    };
  }, []);
  const copy = useCopyWeek(hid);
  const [copied, setCopied] = useState<string | null>(null);
  const title = `${monthDayWords(start)} – ${monthDayWords(addDays(start, 6))}`;
  const copyLastWeek = () =>
    copy.mutate(
      { from: shiftWeek(start, -1), to: start },
      {
        onSuccess: ({ copied: count }) =>
          setCopied(
            count
              ? `Copied ${count} planned meal${count === 1 ? '' : 's'} from last week.`
              : 'Last week had nothing planned to copy.',
          ),
      },
    );
  return (
    <>
      <PageHeader
        title="Week"
        lead={WEEK_LEAD}
        actions={
          <nav aria-label="Weeks" className="flex flex-wrap items-center gap-2">
            <p className="w-full">
              <span className="tabular font-bold text-ink">{title}</span>
              {start === thisWeek ? ' · this week' : ''}
            </p>
            <Button variant="secondary" onClick={() => goTo(shiftWeek(start, -1))} aria-label="Previous week">
              ← Previous
            </Button>
            {start !== thisWeek && (
              <Button variant="secondary" onClick={() => goTo(thisWeek)}>
                This week
              </Button>
            )}
            <Button variant="secondary" onClick={() => goTo(shiftWeek(start, 1))} aria-label="Next week">
              Next →
            </Button>
            {canEdit && (
              <Button variant="quiet" onClick={copyLastWeek} disabled={copy.isPending}>
                Copy last week
              </Button>
            )}
          </nav>
        }
      />
      <div className="flex flex-col gap-4">
        {!canEdit && <Notice tone="info">You can see the plan; cooks and keepers change it.</Notice>}
        {copied && (
          <Notice tone="action" role="status">
            {copied}
          </Notice>
        )}
        {copy.error && (
          <Notice tone="past" role="alert">
            {copy.error.message}
          </Notice>
        )}
        {week.error && (
          <Notice tone="past" role="alert" title="The week could not be loaded">
            {week.error.message}
          </Notice>
        )}
        {week.data && meals.data ? (
          // The preferences wait with the board, so nothing below it moves when it arrives.
          <Suspense fallback={<p className="text-ink-muted">Loading the week…</p>}>
            <WeekBoard hid={hid} week={week.data} meals={meals.data} canEdit={canEdit} firstDay={day} />
            <PreferencesPanel hid={hid} members={week.data.members} myId={myId} isKeeper={isKeeper} />
          </Suspense>
        ) : (
          !week.error && <p className="text-ink-muted">Loading the week…</p>
        )}
      </div>
    </>
  );
}
