import { useState } from 'react';
import { DEFAULT_VARIETY_DAYS } from '@shared/domain';
import { wasteWords } from '@shared/words/proposal';
import { SLOTS } from '@shared/choices';
import type { WeekView } from '@shared/schemas/week';
import type { ProposalScope, ProposalView, ProposedMealView } from '@shared/schemas/week-proposal';
import { Button } from '@/components/ui/button';
import { Notice } from '@/components/ui/notice';
import { useAcceptProposal, useTakeBackProposal } from '../api/accept-proposal';
import { useWaste } from '../api/get-waste';
import { useProposeMeals } from '../api/propose-meals';
import { weekday } from '../drag';
import { ProposedMealRow } from './proposed-meal-row';
import { useUnits } from '@/lib/units';

const slotKey = (m: { date: string; slot: string }) => `${m.date}|${m.slot}`;
const SLOT_NAMES: Record<string, string> = {
  breakfast: 'The breakfasts',
  lunch: 'The lunches',
  dinner: 'The dinners',
  snack: 'The snacks',
};

function scopeOf(value: string): ProposalScope {
  const [kind, rest] = value.split(':');
  if (kind === 'day') return { kind: 'day', date: rest };
  if (kind === 'slot') return { kind: 'slot', slot: rest as (typeof SLOTS)[number] };
  return { kind: 'week' };
}

/** Plan from the shelf: meals for the open slots that eat what must go first, and the waste that saves. */
export function ProposalPanel({ hid, week, canEdit }: { hid: string; week: WeekView; canEdit: boolean }) {
  const units = useUnits();
  const waste = useWaste(hid, week.start);
  const [message, setMessage] = useState<string | null>(null);
  const propose = useProposeMeals(hid);
  const accept = useAcceptProposal(hid, week.start, setMessage);
  const takeBack = useTakeBackProposal(hid, week.start, setMessage);
  const [scope, setScope] = useState('slot:lunch');
  const [varietyDays, setVarietyDays] = useState(DEFAULT_VARIETY_DAYS);
  const [proposal, setProposal] = useState<ProposalView | null>(null);
  const [chosen, setChosen] = useState<Set<string>>(new Set());
  const [avoid, setAvoid] = useState<{ date: string; slot: ProposedMealView['slot']; mealId: string }[]>([]);
  const [planned, setPlanned] = useState<{ ids: string[]; count: number } | null>(null);
  // The before-and-after figures hold for the whole proposal; once some of it is planned the live figure above says it.
  const [wholeProposal, setWholeProposal] = useState(true);
  const days = week.days.filter((d) => d.date >= week.today);

  const ask = (options: { keep?: ProposedMealView[]; avoid?: typeof avoid } = {}) => {
    setMessage(null);
    propose.mutate(
      {
        start: week.start,
        scope: scopeOf(scope),
        varietyDays,
        keep: (options.keep ?? []).map((m) => ({ date: m.date, slot: m.slot, mealId: m.mealId })),
        avoid: options.avoid ?? [],
      },
      {
        onSuccess: (answer) => {
          setProposal(answer);
          setChosen(new Set(answer.proposed.map(slotKey)));
          setAvoid(options.avoid ?? []);
          setWholeProposal(true);
        },
        onError: (error) => setMessage(error.message),
      },
    );
  };

  const swap = (meal: ProposedMealView) => {
    if (!proposal) return;
    const turnedDown = [...avoid, { date: meal.date, slot: meal.slot, mealId: meal.mealId }];
    ask({ keep: proposal.proposed.filter((m) => slotKey(m) !== slotKey(meal)), avoid: turnedDown });
  };

  const acceptChosen = () => {
    if (!proposal) return;
    const meals = proposal.proposed.filter((m) => chosen.has(slotKey(m)));
    if (meals.length === 0) return;
    accept.mutate(meals, {
      onSuccess: ({ entryIds }) => {
        setPlanned({ ids: entryIds, count: entryIds.length });
        const rest = proposal.proposed.filter((m) => !chosen.has(slotKey(m)));
        setProposal(rest.length ? { ...proposal, proposed: rest } : null);
        setWholeProposal(false);
      },
    });
  };

  const undo = () => {
    if (!planned) return;
    takeBack.mutate(planned.ids, { onSuccess: () => setPlanned(null) });
  };

  return (
    <section
      aria-labelledby="proposal-heading"
      className="flex flex-col gap-3 rounded-card border border-line bg-surface p-3"
    >
      <div className="flex flex-wrap items-baseline justify-between gap-2">
        <h2 id="proposal-heading" className="text-lg font-bold">
          Plan from the shelf
        </h2>
        <p className="tabular text-sm" data-testid="week-waste" aria-live="polite">
          <span className="text-ink-muted">Waste this week as planned: </span>
          <span className="font-bold">{waste.data ? wasteWords(waste.data, units.system) : '…'}</span>
        </p>
      </div>
      {message && (
        <Notice tone="past" role="alert" title="That did not work">
          {message}
        </Notice>
      )}
      {canEdit && days.length > 0 && (
        <div className="flex flex-wrap items-end gap-2">
          <label className="flex flex-col gap-1 text-sm font-bold">
            Propose meals for
            <select
              className="min-h-11 rounded-lg border border-line bg-surface px-2 font-normal"
              value={scope}
              onChange={(e) => setScope(e.target.value)}
            >
              <option value="week">The whole week</option>
              {SLOTS.map((slot) => (
                <option key={slot} value={`slot:${slot}`}>
                  {SLOT_NAMES[slot]}
                </option>
              ))}
              {days.map((d) => (
                <option key={d.date} value={`day:${d.date}`}>
                  {weekday(d.date)}
                </option>
              ))}
            </select>
          </label>
          <label className="flex flex-col gap-1 text-sm font-bold">
            No meal twice within (days)
            <input
              type="number"
              min={1}
              max={14}
              className="tabular min-h-11 w-24 rounded-lg border border-line bg-surface px-2 font-normal"
              value={varietyDays}
              onChange={(e) => setVarietyDays(Math.max(1, Math.min(14, Math.round(Number(e.target.value) || 1))))}
            />
          </label>
          <Button onClick={() => ask()} disabled={propose.isPending}>
            {propose.isPending ? 'Thinking…' : proposal ? 'Ask again' : 'Propose meals'}
          </Button>
        </div>
      )}
      {planned && (
        <div className="flex flex-wrap items-center gap-2 rounded-lg bg-action-soft px-3 py-2" role="status">
          <span className="flex-1">
            Planned {planned.count === 1 ? '1 proposed meal' : `${planned.count} proposed meals`}.
          </span>
          <Button variant="secondary" onClick={undo} disabled={takeBack.isPending}>
            Undo
          </Button>
        </div>
      )}
      {proposal && (
        <div className="flex flex-col gap-2">
          {wholeProposal && (
            <p className="tabular text-sm" data-testid="proposal-figures">
              If you accept them all: <span className="font-bold">{wasteWords(proposal.before, units.system)}</span> →{' '}
              <span className="font-bold text-action">{wasteWords(proposal.after, units.system)}</span>
            </p>
          )}
          {proposal.proposed.length === 0 && (
            <p>
              Every slot asked for is planned already, or no meal suits it without a flag, a repeat or a jar the shelf
              lacks.
            </p>
          )}
          <ul className="flex flex-col gap-2" aria-label="Proposed meals">
            {proposal.proposed.map((meal) => (
              <ProposedMealRow
                key={slotKey(meal)}
                meal={meal}
                chosen={chosen.has(slotKey(meal))}
                onChoose={(on) =>
                  setChosen((set) => {
                    const next = new Set(set);
                    if (on) next.add(slotKey(meal));
                    else next.delete(slotKey(meal));
                    return next;
                  })
                }
                onSwap={() => swap(meal)}
                busy={propose.isPending}
              />
            ))}
          </ul>
          {proposal.unfilled.length > 0 && (
            <p className="text-sm text-ink-muted">
              Left open: {proposal.unfilled.map((s) => `${weekday(s.date)} ${s.slot}`).join(', ')} (no meal suits
              without a flag, a repeat or a jar the shelf lacks).
            </p>
          )}
          <div className="flex flex-wrap gap-2">
            <Button onClick={acceptChosen} disabled={accept.isPending || chosen.size === 0}>
              Accept {chosen.size === proposal.proposed.length ? 'all' : 'chosen'} ({chosen.size})
            </Button>
            <Button variant="quiet" onClick={() => setProposal(null)}>
              Close
            </Button>
          </div>
        </div>
      )}
    </section>
  );
}
