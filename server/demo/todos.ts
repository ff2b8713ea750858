// The to-do part of the demo scenario: a few everyday jobs and one restock batch with its plan.
import { addDays } from '../../shared/domain';
import type { BatchPlan } from '../../shared/schemas/todos';
import { jarSizeFor, oneTestedBatch, restockTitle } from '../services/restock/todo-batch-plan';
import { composeBatchPlan } from '../services/restock/todo-plan-numbers';
import { Product, Recipe, Todo } from '../db/models';
import type { DemoSeedContext } from './features';

export async function seedTodos(ctx: DemoSeedContext) {
  const { households, members, transaction, today } = ctx;
  const calloway = households['Calloway Hollow'];
  const cook = members['cook@larderly.test'];
  const helper = members['helper@larderly.test'];
  const keeper = members['keeper@larderly.test'];

  const plan = await relishPlan(ctx);

  const todos = [
    {
      title: 'Buy a box of half-pint lids',
      notes: 'The wide-mouth ones for the relish.',
      dueOn: addDays(today, 4),
      assigneeId: cook.id,
    },
    { title: 'Wash the empty jars from the cellar', notes: '', dueOn: addDays(today, 2), assigneeId: helper.id },
    ...(plan
      ? [
          {
            title: restockTitle(plan),
            notes: '',
            dueOn: plan.targetOn,
            assigneeId: cook.id,
            kind: 'restock' as const,
            productId: plan.productId,
            batchPlan: plan,
          },
        ]
      : []),
    {
      title: 'Take the dial gauge to the extension office for its yearly test',
      notes: '',
      dueOn: addDays(today, -10),
      assigneeId: keeper.id,
      done: true,
      doneAt: new Date(),
    },
  ];
  await Todo.bulkCreate(
    todos.map((todo, position) => ({ householdId: calloway.id, createdBy: keeper.id, position, ...todo })),
    { transaction },
  );
}

/** One tested batch of the household's corn relish, planned as the restock screen would. */
async function relishPlan({ households, transaction, today }: DemoSeedContext): Promise<BatchPlan | null> {
  const calloway = households['Calloway Hollow'];
  const relish = await Product.findOne({ where: { householdId: calloway.id, name: 'Sweet Corn Relish' }, transaction });
  const recipe =
    relish && (await Recipe.findOne({ where: { householdId: calloway.id, productId: relish.id }, transaction }));
  if (!relish || !recipe) return null;
  const jarSize = jarSizeFor(recipe, relish, undefined);
  return composeBatchPlan({
    household: calloway,
    product: relish,
    recipe,
    today,
    jars: oneTestedBatch(recipe, jarSize),
    jarSize,
    reason: null,
    runOutOn: null,
  });
}
