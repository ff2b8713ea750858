// The household to-do list: positions stay dense (0..n-1) through every add, move and delete.
import { Op, QueryTypes, type Sequelize, type Transaction } from 'sequelize';
import type { Role } from '../../shared/roles';
import type { BatchPlan, TodoCreate, TodoFilter, TodoKind, TodoPatch, TodoView } from '../../shared/schemas/todos';
import { advisoryKey, lockNames } from '../db/advisory-locks';
import { Household, Membership, Todo } from '../db/models';
import { AppError, forbidden, notFound } from '../http/errors';
import type { HouseholdVersions } from './household-memo';
import { refreshPlans } from './restock/todo-plan-numbers';

interface TodoRow {
  id: string;
  title: string;
  notes: string;
  due_on: string | null;
  assignee_id: string | null;
  assignee_name: string | null;
  done: boolean;
  done_at: Date | null;
  position: number;
  kind: TodoKind;
  product_id: string | null;
  batch_plan: BatchPlan | null;
  created_by: string | null;
}

function viewTodo(row: TodoRow): TodoView {
  return {
    id: row.id,
    title: row.title,
    notes: row.notes,
    dueOn: row.due_on ?? null,
    assigneeId: row.assignee_id ?? null,
    assigneeName: row.assignee_name ?? null,
    done: row.done,
    doneAt: row.done_at ? new Date(row.done_at).toISOString() : null,
    position: row.position,
    kind: row.kind,
    productId: row.product_id ?? null,
    batchPlan: row.batch_plan ?? null,
    createdBy: row.created_by ?? null,
  };
}

const FILTERS: Record<TodoFilter, string> = {
  all: '',
  open: 'AND NOT t.done',
  done: 'AND t.done',
  mine: 'AND NOT t.done AND t.assignee_id = $2',
};

/**
 * The household's to-dos with their assignees' names, in list order. Raw SQL: GET /todos and the answer of every
 * to-do write read through here, and Sequelize instances with an include cost several times the query itself.
 */
async function todoRows(householdId: string, where: string, bind: unknown[]): Promise<TodoRow[]> {
  return Todo.sequelize!.query<TodoRow>(
    `SELECT t.id, t.title, t.notes, t.due_on, t.assignee_id, u.name AS assignee_name, t.done, t.done_at, t.position,
            t.kind, t.product_id, t.batch_plan, t.created_by
       FROM todos t LEFT JOIN users u ON u.id = t.assignee_id
      WHERE t.household_id = $1 ${where}
      ORDER BY t.position`,
    { bind: [householdId, ...bind], type: QueryTypes.SELECT },
  );
}

/** `versions` are the request's (the guard's): with them, what the restock plans are worked out from is kept. */
export async function listTodos(
  household: Household,
  filter: TodoFilter,
  userId: string,
  versions?: HouseholdVersions,
): Promise<TodoView[]> {
  const rows = await todoRows(household.id, FILTERS[filter], filter === 'mine' ? [userId] : []);
  return refreshPlans(household, rows.map(viewTodo), versions);
}

export async function findTodo(household: Household, id: string, versions?: HouseholdVersions): Promise<TodoView> {
  const [row] = await todoRows(household.id, 'AND t.id = $2', [id]);
  if (!row) throw notFound('That to-do');
  const [view] = await refreshPlans(household, [viewTodo(row)], versions);
  return view!;
}

/**
 * Locks the household's list: the list's advisory lock serialises adds, moves and deletes (an add's new row is one no
 * row lock could wait for), the todo rows are the ones changed. The lock is the list's own, not the household row's,
 * which every write to the household updates at commit (its data version, migration 0085): a to-do write holding that
 * row would make every other write of the household wait for it.
 * The rows are read in a statement after the lock's, so they include what the list's previous writer committed.
 */
async function lockList(householdId: string, transaction: Transaction): Promise<Todo[]> {
  await lockNames(Todo.sequelize!, transaction, [listLockName(householdId)]);
  return Todo.findAll({
    where: { householdId },
    order: [['position', 'ASC']],
    transaction,
    lock: transaction.LOCK.UPDATE,
  });
}

/** The name of the household list's advisory lock, taken by every writer of the list. */
const listLockName = (householdId: string) => `todos:${householdId}`;

const notAMember = () =>
  new AppError(400, 'invalid_input', 'Some fields need attention.', {
    assigneeId: 'Choose a member of this household.',
  });

async function requireMember(householdId: string, userId: string | null | undefined, transaction: Transaction) {
  if (!userId) return;
  const member = await Membership.findOne({ where: { householdId, userId }, transaction, attributes: ['id'] });
  if (!member) throw notAMember();
}

interface NewTodo extends TodoCreate {
  kind?: 'plain' | 'restock';
  productId?: string;
  batchPlan?: BatchPlan;
}

/** Adds a to-do at the end of the list. */
export async function createTodo(
  sequelize: Sequelize,
  household: Household,
  createdBy: string,
  input: NewTodo,
): Promise<TodoView> {
  const householdId = household.id;
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
  return findTodo(household, id);
}

const HELPER_FIELDS = new Set(['done']);

export async function updateTodo(
  sequelize: Sequelize,
  household: Household,
  role: Role,
  id: string,
  patch: TodoPatch,
  versions?: HouseholdVersions,
): Promise<TodoView> {
  if (role === 'helper' && Object.keys(patch).some((field) => !HELPER_FIELDS.has(field))) {
    throw forbidden('Helpers may tick a to-do done or not done; ask a cook or keeper to change anything else.');
  }
  const householdId = household.id;
  const { position, done, ...fields } = patch;
  // One statement (migrations 0210, 0220): the list's lock is held inside PostgreSQL only, not across round trips,
  // and only by a change that writes.
  const [{ outcome }] = await sequelize.query<{ outcome: string }>(
    'SELECT todo_list_update($1::bigint, $2, $3, $4::jsonb, $5, $6) AS outcome',
    {
      bind: [
        advisoryKey(listLockName(householdId)),
        householdId,
        id,
        JSON.stringify(fields),
        done ?? null,
        position ?? null,
      ],
      type: QueryTypes.SELECT,
    },
  );
  if (outcome === 'missing') throw notFound('That to-do');
  if (outcome === 'not a member') throw notAMember();
  return findTodo(household, id, versions);
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
