// The household to-do list: positions stay dense (0..n-1) through every add, move and delete.
import { Op, type Sequelize, type Transaction, type WhereOptions } from 'sequelize';
import type { Role } from '../../shared/roles';
import type { BatchPlan, TodoCreate, TodoFilter, TodoPatch, TodoView } from '../../shared/schemas/todos';
import { Household, Membership, Todo, User } from '../db/models';
import { AppError, forbidden, notFound } from '../http/errors';
import { refreshPlans } from './restock/todo-plan-numbers';

export function viewTodo(todo: Todo & { assignee?: User | null }): TodoView {
  return {
    id: todo.id,
    title: todo.title,
    notes: todo.notes,
    dueOn: todo.dueOn ?? null,
    assigneeId: todo.assigneeId ?? null,
    assigneeName: todo.assignee?.name ?? null,
    done: todo.done,
    doneAt: todo.doneAt ? todo.doneAt.toISOString() : null,
    position: todo.position,
    kind: todo.kind,
    productId: todo.productId ?? null,
    batchPlan: todo.batchPlan ?? null,
    createdBy: todo.createdBy ?? null,
  };
}

const withAssignee = [{ model: User, as: 'assignee', attributes: ['id', 'name'] }];

function whereFor(householdId: string, filter: TodoFilter, userId: string): WhereOptions<Todo> {
  if (filter === 'open') return { householdId, done: false };
  if (filter === 'done') return { householdId, done: true };
  if (filter === 'mine') return { householdId, done: false, assigneeId: userId };
  return { householdId };
}

export async function listTodos(householdId: string, filter: TodoFilter, userId: string): Promise<TodoView[]> {
  const todos = await Todo.findAll({
    where: whereFor(householdId, filter, userId),
    include: withAssignee,
    order: [['position', 'ASC']],
  });
  return refreshPlans(householdId, todos.map(viewTodo));
}

export async function findTodo(householdId: string, id: string): Promise<TodoView> {
  const todo = await Todo.findOne({ where: { id, householdId }, include: withAssignee });
  if (!todo) throw notFound('That to-do');
  const [view] = await refreshPlans(householdId, [viewTodo(todo)]);
  return view;
}

/** Locks the household's list: the household row serialises adds, the todo rows are the ones moved. */
async function lockList(householdId: string, transaction: Transaction): Promise<Todo[]> {
  await Household.findByPk(householdId, { transaction, lock: transaction.LOCK.UPDATE, attributes: ['id'] });
  return Todo.findAll({
    where: { householdId },
    order: [['position', 'ASC']],
    transaction,
    lock: transaction.LOCK.UPDATE,
  });
}

async function requireMember(householdId: string, userId: string | null | undefined, transaction: Transaction) {
  if (!userId) return;
  const member = await Membership.findOne({ where: { householdId, userId }, transaction, attributes: ['id'] });
  if (!member)
    throw new AppError(400, 'invalid_input', 'Some fields need attention.', {
      assigneeId: 'Choose a member of this household.',
    });
}

interface NewTodo extends TodoCreate {
  kind?: 'plain' | 'restock';
  productId?: string;
  batchPlan?: BatchPlan;
}

/** Adds a to-do at the end of the list. */
export async function createTodo(
  sequelize: Sequelize,
  householdId: string,
  createdBy: string,
  input: NewTodo,
): Promise<TodoView> {
  const id = await sequelize.transaction(async (transaction) => {
    const list = await lockList(householdId, transaction);
    await requireMember(householdId, input.assigneeId, transaction);
    const todo = await Todo.create(
      {
        householdId,
        title: input.title,
        notes: input.notes ?? '',
        dueOn: input.dueOn ?? null,
        assigneeId: input.assigneeId ?? null,
        position: list.length,
        kind: input.kind ?? 'plain',
        productId: input.productId ?? null,
        batchPlan: input.batchPlan ?? null,
        createdBy,
      },
      { transaction },
    );
    return todo.id;
  });
  return findTodo(householdId, id);
}

/** Moves one to-do to `position` in the whole list, shifting the ones between by one. */
async function move(list: Todo[], todo: Todo, position: number, transaction: Transaction) {
  const target = Math.min(position, list.length - 1);
  const from = list.findIndex((t) => t.id === todo.id);
  if (target === from) return;
  const order = list.filter((t) => t.id !== todo.id);
  order.splice(target, 0, todo);
  for (const [index, t] of order.entries()) {
    if (t.position !== index) await t.update({ position: index }, { transaction });
  }
}

const HELPER_FIELDS = new Set(['done']);

export async function updateTodo(
  sequelize: Sequelize,
  householdId: string,
  role: Role,
  id: string,
  patch: TodoPatch,
): Promise<TodoView> {
  if (role === 'helper' && Object.keys(patch).some((field) => !HELPER_FIELDS.has(field))) {
    throw forbidden('Helpers may tick a to-do done or not done; ask a cook or keeper to change anything else.');
  }
  await sequelize.transaction(async (transaction) => {
    const list = await lockList(householdId, transaction);
    const todo = list.find((t) => t.id === id);
    if (!todo) throw notFound('That to-do');
    await requireMember(householdId, patch.assigneeId, transaction);
    const { position, done, ...fields } = patch;
    const doneFields = done === undefined || done === todo.done ? {} : { done, doneAt: done ? new Date() : null };
    await todo.update({ ...fields, ...doneFields }, { transaction });
    if (position !== undefined) await move(list, todo, position, transaction);
  });
  return findTodo(householdId, id);
}

export async function deleteTodo(sequelize: Sequelize, householdId: string, id: string) {
  await sequelize.transaction(async (transaction) => {
    const list = await lockList(householdId, transaction);
    const todo = list.find((t) => t.id === id);
    if (!todo) throw notFound('That to-do');
    await todo.destroy({ transaction });
    await Todo.decrement('position', {
      by: 1,
      where: { householdId, position: { [Op.gt]: todo.position } },
      transaction,
    });
  });
}
