import type { Method, ProcessingPlan } from '@shared/domain';
import { METHOD_NAMES } from '@shared/shelf-words';
import { Notice } from '@/components/ui/notice';
import { feet } from '../format';

/** The processing plan with its cautions: the canning numbers are never shown without them. */
export function PlanPanel({ plan, method, altitudeFt }: { plan: ProcessingPlan; method: Method; altitudeFt: number }) {
  return (
    <section aria-labelledby="plan-heading" aria-live="polite" className="flex flex-col gap-3">
      <h2 id="plan-heading" className="text-xl">
        Processing plan at {feet(altitudeFt)}
      </h2>
      {plan.allowed ? (
        <Notice tone="action" title={headline(plan, method)}>
          <p>{METHOD_NAMES[method]}.{plan.altitudeAddMinutes ? ` Includes ${plan.altitudeAddMinutes} minutes added for your altitude.` : ''}</p>
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
      <Cautions cautions={plan.cautions} />
    </section>
  );
}

function headline(plan: ProcessingPlan, method: Method): string {
  if (plan.pressurePsi !== null) return `Process ${plan.minutes} minutes at ${plan.pressurePsi} pounds pressure`;
  return `Process ${plan.minutes} minutes${method === 'atmospheric-steam' ? ' in full steam' : ' at a full rolling boil'}`;
}

export function Cautions({ cautions }: { cautions: string[] }) {
  return (
    <div className="rounded-card border border-line bg-sunken/60 px-4 py-3">
      <h3 className="font-bold">Before you start</h3>
      <ul className="list-disc pl-5 text-[0.95rem] text-ink-muted">
        {cautions.map((caution) => (
          <li key={caution}>{caution}</li>
        ))}
      </ul>
    </div>
  );
}
