// Planned meals: add, move, change and remove them, keeping each slot's positions 0, 1, 2, ... in order.
import { QueryTypes, type Sequelize, type Transaction } from 'sequelize';
import { Meal, MealProduct, Membership, Pairing, PlanEntry } from '../../db/models';
import { AppError, notFound } from '../../http/errors';
import type { PlanEntryCreate, PlanEntryPatch, Slot } from '../../../shared/schemas/week';
import { densePlacements, lockDays, slotOf, writePlacements, type Placement } from './slot-locks';

const clamp = (value: number, max: number) => Math.max(0, Math.min(value, max));

function placementsOf(entries: PlanEntry[]) {
  return new Map<string, Placement>(
    entries.map((e) => [e.id, { id: e.id, date: e.date, slot: e.slot, position: e.position }]),
  );
}

/** Adds a meal to a slot, from the library (with its usual products) or by name. */
export async function createPlanEntry(sequelize: Sequelize, householdId: string, input: PlanEntryCreate) {
  return sequelize.transaction(async (transaction) => {
    const entries = await lockDays(sequelize, transaction, householdId, [input.date]);
    return (await insertPlanEntry(sequelize, transaction, householdId, input, entries)).id;
  });
}

/**
 * The write behind a drop on the board, inside a transaction that already holds the day's lock:
 * `entries` are the locked days' entries, and the new one joins them.
 */
export async function insertPlanEntry(
  sequelize: Sequelize,
  transaction: Transaction,
  householdId: string,
  input: PlanEntryCreate,
  entries: PlanEntry[],
) {
  const meal = input.mealId
    ? await Meal.findOne({
        where: { id: input.mealId, householdId },
        include: [{ model: MealProduct, as: 'products' }],
        transaction,
      })
    : null;
  if (input.mealId && !meal) throw notFound('That meal');
  const slot = slotOf(entries, input.date, input.slot as Slot);
  const position = clamp(input.position ?? slot.length, slot.length);
  const entry = await PlanEntry.create(
    {
      householdId,
      date: input.date,
      slot: input.slot as Slot,
      position: slot.length,
      title: input.title ?? meal!.name,
      mealId: meal?.id ?? null,
      servings: input.servings ?? meal?.usualServings ?? 2,
    },
    { transaction },
  );
  const ids = slot.map((e) => e.id);
  ids.splice(position, 0, entry.id);
  const current = placementsOf([...entries, entry]);
  await writePlacements(
    sequelize,
    transaction,
    householdId,
    densePlacements([{ date: input.date, slot: input.slot as Slot, ids }], current),
  );
  entries.push(entry);
  const usual = (meal as (Meal & { products?: MealProduct[] }) | null)?.products ?? [];
  if (usual.length) {
    await Pairing.bulkCreate(
      usual.map((mp) => ({
        householdId,
        planEntryId: entry.id,
        productId: mp.productId,
        tbspPerServing: mp.tbspPerServing,
      })),
      { transaction },
    );
  }
  return entry;
}

async function lockedEntry(householdId: string, id: string, transaction: Transaction) {
  const entry = await PlanEntry.findOne({ where: { id, householdId }, transaction, lock: transaction.LOCK.UPDATE });
  if (!entry) throw notFound('That planned meal');
  return entry;
}

/** Moves and edits one entry; a move closes the gap it leaves and opens one where it lands. */
export async function updatePlanEntry(sequelize: Sequelize, householdId: string, id: string, patch: PlanEntryPatch) {
  const moves = patch.date !== undefined || patch.slot !== undefined || patch.position !== undefined;
  if (!moves) return editPlanEntry(sequelize, householdId, id, patch);
  return sequelize.transaction(async (transaction) => {
    const peek = await PlanEntry.findOne({ where: { id, householdId }, attributes: ['date'], transaction });
    if (!peek) throw notFound('That planned meal');
    const target = { date: patch.date ?? peek.date };
    const entries = await lockDays(sequelize, transaction, householdId, [peek.date, target.date]);
    // Read again under the locks: a concurrent move may have changed it while we waited.
    const entry = await lockedEntry(householdId, id, transaction);
    if (entry.date !== peek.date && entry.date !== target.date) {
      throw new AppError(
        409,
        'conflict',
        'Someone moved this meal at the same moment. The board has been refreshed; try again.',
      );
    }
    if (patch.eaters) await requireMembers(householdId, patch.eaters, transaction);
    const date = patch.date ?? entry.date;
    const slot = (patch.slot ?? entry.slot) as Slot;
    const source = slotOf(entries, entry.date, entry.slot)
      .map((e) => e.id)
      .filter((e) => e !== id);
    const sameSlot = entry.date === date && entry.slot === slot;
    const destination = sameSlot ? source : slotOf(entries, date, slot).map((e) => e.id);
    const position = clamp(patch.position ?? destination.length, destination.length);
    destination.splice(position, 0, id);
    const lists = [{ date, slot, ids: destination }];
    if (!sameSlot) lists.push({ date: entry.date, slot: entry.slot, ids: source });
    await writePlacements(sequelize, transaction, householdId, densePlacements(lists, placementsOf(entries)));
    const fields = editedFields(patch);
    if (Object.keys(fields).length) await PlanEntry.update(fields, { where: { id, householdId }, transaction });
    return id;
  });
}

function editedFields(patch: PlanEntryPatch) {
  const fields: Partial<Pick<PlanEntry, 'servings' | 'title' | 'eaters'>> = {};
  if (patch.servings !== undefined) fields.servings = patch.servings;
  if (patch.title !== undefined) fields.title = patch.title;
  if (patch.eaters !== undefined) fields.eaters = patch.eaters;
  return fields;
}

/**
 * Servings, title or eaters only: no slot changes, so no day lock; the UPDATE's own row lock orders it with a
 * concurrent move of the same entry (a move writes date, slot and position, never these columns).
 */
async function editPlanEntry(sequelize: Sequelize, householdId: string, id: string, patch: PlanEntryPatch) {
  const write = async (transaction?: Transaction) => {
    // Raw SQL: the edit and the "is it there" answer in one round trip (Model.update and a count took two, and about
    // twice the CPU). Only a row that differs is written: a repeated edit (a second tap, a replayed change) moves no
    // plan version, so the cached answers that read the plan stay good (services/household-memo.ts). Each new value is
    // worked out from the row as it is when the UPDATE takes its lock, so a concurrent edit of another field stands.
    const [result] = await sequelize.query<{ found: boolean; changed: number }>(
      `WITH changed AS (
         UPDATE plan_entries p
            SET servings = COALESCE($3::integer, p.servings), title = COALESCE($4::text, p.title),
                eaters = CASE WHEN $5::boolean THEN $6::uuid[] ELSE p.eaters END, updated_at = now()
          WHERE p.id = $1 AND p.household_id = $2
            AND (p.servings, p.title, p.eaters) IS DISTINCT FROM
                (COALESCE($3::integer, p.servings), COALESCE($4::text, p.title), CASE WHEN $5::boolean THEN $6::uuid[] ELSE p.eaters END)
          RETURNING p.id)
       SELECT EXISTS (SELECT 1 FROM plan_entries WHERE id = $1 AND household_id = $2) AS found,
              (SELECT count(*) FROM changed)::integer AS changed`,
      {
        bind: [
          id,
          householdId,
          patch.servings ?? null,
          patch.title ?? null,
          patch.eaters !== undefined,
          patch.eaters ?? null,
        ],
        type: QueryTypes.SELECT,
        transaction,
      },
    );
    if (!result!.found && result!.changed === 0) throw notFound('That planned meal');
    return id;
  };
  // Without eaters to check, the one UPDATE is its own transaction: edits of the same meal wait for its row's lock
  // only for the statement, not across a BEGIN and a COMMIT round trip each.
  if (!patch.eaters) return write();
  const eaters = patch.eaters;
  return sequelize.transaction(async (transaction) => {
    await requireMembers(householdId, eaters, transaction);
    return write(transaction);
  });
}

export async function requireMembers(householdId: string, userIds: string[], transaction: Transaction) {
  const count = await Membership.count({ where: { householdId, userId: [...new Set(userIds)] }, transaction });
  if (count !== new Set(userIds).size)
    throw new AppError(400, 'invalid_input', 'Choose eaters from the household’s members.', {
      eaters: 'Choose members of this household.',
    });
}

/** Removes an entry (and its pairings) and closes the gap in its slot. */
export async function deletePlanEntry(sequelize: Sequelize, householdId: string, id: string) {
  await sequelize.transaction(async (transaction) => {
    const peek = await PlanEntry.findOne({ where: { id, householdId }, attributes: ['date'], transaction });
    if (!peek) throw notFound('That planned meal');
    const entries = await lockDays(sequelize, transaction, householdId, [peek.date]);
    const entry = entries.find((e) => e.id === id);
    if (!entry) throw notFound('That planned meal');
    await PlanEntry.destroy({ where: { id, householdId }, transaction });
    const rest = slotOf(entries, entry.date, entry.slot)
      .map((e) => e.id)
      .filter((e) => e !== id);
    await writePlacements(
      sequelize,
      transaction,
      householdId,
      densePlacements([{ date: entry.date, slot: entry.slot, ids: rest }], placementsOf(entries)),
    );
  });
}

/** Removes several entries in one transaction (taking back an accepted proposal); every one must exist. */
export async function deletePlanEntries(sequelize: Sequelize, householdId: string, ids: string[]) {
  return sequelize.transaction(async (transaction) => {
    const unique = [...new Set(ids)];
    const peeks = await PlanEntry.findAll({ where: { id: unique, householdId }, attributes: ['date'], transaction });
    if (peeks.length !== unique.length) throw notFound('One of those planned meals');
    const entries = await lockDays(
      sequelize,
      transaction,
      householdId,
      peeks.map((p) => p.date),
    );
    const gone = entries.filter((e) => unique.includes(e.id));
    if (gone.length !== unique.length) throw notFound('One of those planned meals');
    await PlanEntry.destroy({ where: { id: unique, householdId }, transaction });
    const slots = [...new Map(gone.map((e) => [`${e.date}|${e.slot}`, e])).values()];
    const lists = slots.map(({ date, slot }) => ({
      date,
      slot,
      ids: slotOf(entries, date, slot)
        .map((e) => e.id)
        .filter((id) => !unique.includes(id)),
    }));
    await writePlacements(sequelize, transaction, householdId, densePlacements(lists, placementsOf(entries)));
    return gone.length;
  });
}

/** Empties one day of the plan. */
export async function clearDay(sequelize: Sequelize, householdId: string, date: string) {
  return sequelize.transaction(async (transaction) => {
    await lockDays(sequelize, transaction, householdId, [date]);
    return PlanEntry.destroy({ where: { householdId, date }, transaction });
  });
}
