import type { Method, ProcessingPlan } from '@shared/domain';
import { BEFORE_YOU_START, METHOD_NAMES, minutesWords } from '@shared/words';
import { Notice } from '@/components/ui/notice';
import { useUnits, type Units } from '@/lib/units';

/** The processing plan with its cautions first: the canning numbers are never shown without them, nor before them. */

export function PlanPanel({ plan, method, altitudeFt }: { plan: ProcessingPlan; method: Method; altitudeFt: number }) {
  const units = useUnits();
  return (
    <section aria-labelledby="plan-heading" aria-live="polite" className="flex flex-col gap-3">
      <h2 id="plan-heading" className="text-xl">
        Processing plan at {units.altitude(altitudeFt)}
      </h2>
      <Cautions cautions={plan.cautions} />
      {plan.allowed ? (
        <Notice tone="action" title={headline(plan, method, units)}>
          <p>
            {METHOD_NAMES[method]}.
            {plan.altitudeAddMinutes ? ` Includes ${plan.altitudeAddMinutes} minutes added for your altitude.` : ''}
          </p>
        </Notice>
      ) : (
        <Notice tone="past" title="Not allowed: this batch cannot be saved" role="alert">
          <ul className="list-disc pl-5">
            {plan.reasons.map((reason) => (
              <li key={reason}>{reason}</li>
            ))}
          </ul>
        </Notice>
      )}
      {plan.allowed && (
        <div>
          <h3 className="font-bold">After processing</h3>
          <ol className="list-decimal pl-5 text-[0.95rem]">
            {plan.afterProcessing.map((step) => (
              <li key={step}>{step}</li>
            ))}
          </ol>
        </div>
      )}
    </section>
  );
}

function headline(plan: ProcessingPlan, method: Method, units: Units): string {
  if (plan.pressurePsi !== null) return `Process ${minutesWords(plan.minutes!)} at ${units.pressure(plan.pressurePsi)}`;
  return `Process ${minutesWords(plan.minutes!)}${method === 'atmospheric-steam' ? ' in full steam' : ' at a full rolling boil'}`;
}

export function Cautions({ cautions }: { cautions: string[] }) {
  return (
    <div className="rounded-card border border-line bg-sunken/60 px-4 py-3">
      <h3 className="font-bold">{BEFORE_YOU_START}</h3>
      <ul className="list-disc pl-5 text-[0.95rem] text-ink-muted">
        {cautions.map((caution) => (
          <li key={caution}>{caution}</li>
        ))}
      </ul>
    </div>
  );
}
