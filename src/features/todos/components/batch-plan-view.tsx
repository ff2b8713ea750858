import { Link } from 'react-router-dom';
import {
  BEFORE_YOU_START,
  count,
  dateWords,
  inCanner,
  JAR_SIZE_NAMES,
  minutesWords,
  METHOD_NAMES,
} from '@shared/words';
import { MOUTH_NAMES, STOCK_WORDS } from '@shared/words/stock';
import type { BatchPlan, BatchPlanStock, ShoppingItem } from '@shared/schemas/todos';
import { Button } from '@/components/ui/button';
import { useCreateTodo } from '../api/create-todo';
import { Notice } from '@/components/ui/notice';
import { paths } from '@shared/paths';
import { useUnits, type Units } from '@/lib/units';

function processingWords(plan: BatchPlan, units: Units): string {
  const { processing } = plan;
  const altitude = units.altitude(plan.altitudeFt);
  if (processing.pressurePsi !== null) {
    return `${minutesWords(processing.minutes!)} at ${units.pressure(processing.pressurePsi)} ${inCanner(plan.method)}, for ${altitude}.`;
  }
  const added = processing.altitudeAddMinutes
    ? ` (${processing.minutes! - processing.altitudeAddMinutes} at 0-${units.altitude(1000)} plus ${processing.altitudeAddMinutes} for the altitude)`
    : '';
  return `${minutesWords(processing.minutes!)} ${inCanner(plan.method)} at ${altitude}${added}.`;
}

function ShoppingList({ title, items }: { title: string; items: ShoppingItem[] }) {
  if (items.length === 0) return null;
  return (
    <div>
      <h4 className="font-bold">{title}</h4>
      <ul className="list-disc pl-5">
        {items.map((item) => (
          <li key={item.name}>{item.text}</li>
        ))}
      </ul>
    </div>
  );
}

/** The empty jars and new lids in stock now, what to buy beyond them, and a to-do to buy it. */
function PlanStock({
  hid,
  plan,
  stock,
  canAdd,
}: {
  hid: string;
  plan: BatchPlan;
  stock: BatchPlanStock;
  canAdd: boolean;
}) {
  const add = useCreateTodo(hid);
  return (
    <div className="mt-2 flex flex-col gap-2 rounded-lg border border-line bg-sunken p-3" data-testid="plan-stock">
      <p>
        {stock.words}{' '}
        <Link to={paths.stock(hid)} className="font-bold text-action underline">
          {STOCK_WORDS.title}
        </Link>
      </p>
      {stock.todoTitle && canAdd && (
        <div className="flex flex-wrap items-center gap-2">
          {add.isSuccess ? (
            <p role="status" className="font-bold">
              Added “{stock.todoTitle}” to the to-do list.
            </p>
          ) : (
            <Button
              variant="secondary"
              disabled={add.isPending}
              onClick={() =>
                add.mutate({
                  title: stock.todoTitle!,
                  notes: `For ${plan.productName}: ${count(plan.jars, `${JAR_SIZE_NAMES[plan.jarSize]} jar`)}, one new ${MOUTH_NAMES[stock.mouth]} lid a jar.`,
                  dueOn: plan.targetOn,
                })
              }
            >
              {STOCK_WORDS.addLidsTodo}: {stock.todoTitle}
            </Button>
          )}
          {add.error && (
            <p role="alert" className="text-past">
              {add.error.message}
            </p>
          )}
        </div>
      )}
    </div>
  );
}

/** Everything needed to make a restock batch, and the step that records it. */
export function BatchPlanView({
  hid,
  todoId,
  plan,
  canRecord,
}: {
  hid: string;
  todoId: string;
  plan: BatchPlan;
  canRecord: boolean;
}) {
  const units = useUnits();
  const size = units.jarSize(plan.jarSize);
  const recordHref = paths.newBatch(hid, {
    productId: plan.productId,
    recipeId: plan.recipeId,
    jars: plan.jars,
    jarSize: plan.jarSize,
    todoId,
  });
  return (
    <div className="flex flex-col gap-5">
      <div>
        <p className="font-bold">Make it by {dateWords(plan.targetOn)}</p>
        <p className="text-ink-muted">{plan.targetWhy}</p>
      </div>

      {plan.changes && plan.changes.length > 0 && (
        <Notice tone="soon" title={`Updated since it was planned on ${dateWords(plan.plannedOn)}`} role="status">
          <ul className="list-disc pl-5">
            {plan.changes.map((change) => (
              <li key={change}>{change}</li>
            ))}
          </ul>
          <p className="mt-1">Every number below is for the household and recipe as they are now.</p>
        </Notice>
      )}

      {/* The cautions come before every number of the plan: jars, amounts, minutes and pressure. */}
      <Notice tone="info" title={BEFORE_YOU_START}>
        <ul className="list-disc pl-5">
          {plan.processing.cautions.map((caution) => (
            <li key={caution}>{caution}</li>
          ))}
        </ul>
      </Notice>

      <section aria-labelledby="plan-equipment">
        <h3 id="plan-equipment" className="mb-1 text-lg">
          Jars and canner
        </h3>
        <ul className="list-disc pl-5">
          <li>{count(plan.equipment.jars, `${size} jar`)}, washed and kept hot</li>
          <li>{count(plan.equipment.newLids, 'new lid')}: lids seal only once; bands can be reused</li>
          <li>
            {count(plan.equipment.cannerLoads.length, 'canner load')} ({plan.equipment.cannerLoads.join(' + ')} jars;
            your {METHOD_NAMES[plan.equipment.cannerMethod ?? plan.method].toLowerCase()} holds{' '}
            {plan.equipment.cannerCapacityJars})
          </li>
        </ul>
        {plan.stock && <PlanStock hid={hid} plan={plan} stock={plan.stock} canAdd={canRecord} />}
      </section>

      <section aria-labelledby="plan-shopping">
        <h3 id="plan-shopping" className="mb-1 text-lg">
          Shopping list
        </h3>
        <div className="grid gap-3 sm:grid-cols-2">
          <ShoppingList title="Produce" items={plan.shopping.produce} />
          <ShoppingList title="Pantry" items={plan.shopping.pantry} />
        </div>
      </section>

      <section aria-labelledby="plan-recipe">
        <h3 id="plan-recipe" className="mb-1 text-lg">
          {plan.recipeName}, scaled ×{Math.round(plan.scaled.factor * 100) / 100}
        </h3>
        {plan.recipeSource && <p className="text-sm text-ink-muted">Source: {plan.recipeSource}</p>}
        {plan.scaled.cautions.map((caution) => (
          <Notice key={caution} tone="soon">
            {caution}
          </Notice>
        ))}
      </section>

      <section aria-labelledby="plan-processing">
        <h3 id="plan-processing" className="mb-1 text-lg">
          Processing
        </h3>
        {plan.processing.allowed ? (
          <p className="font-bold">{processingWords(plan, units)}</p>
        ) : (
          <Notice tone="past" title="Not allowed: no tested process for this plan now" role="alert">
            <ul className="list-disc pl-5">
              {plan.processing.reasons.map((reason) => (
                <li key={reason}>{reason}</li>
              ))}
            </ul>
          </Notice>
        )}
        <p>Headspace: {units.headspace(plan.headspaceInches)}.</p>
        <h4 className="mt-2 font-bold">After processing</h4>
        <ol className="list-decimal pl-5">
          {plan.processing.afterProcessing.map((step) => (
            <li key={step}>{step}</li>
          ))}
        </ol>
      </section>

      {canRecord && plan.processing.allowed && (
        <Link
          to={recordHref}
          className="inline-flex min-h-11 items-center justify-center rounded-lg bg-action px-4 font-bold text-white hover:bg-action-strong"
        >
          Record this batch
        </Link>
      )}
    </div>
  );
}
