// Serialises the writes that renumber a day's slots, so two moves at once never share a position.
import type { Sequelize, Transaction } from 'sequelize';
import type { Slot } from '../../../shared/schemas/week';
import { lockNames } from '../../db/advisory-locks';
import { PlanEntry } from '../../db/models';

/**
 * Takes the days' advisory locks in one fixed order (no deadlock between two moves crossing days),
 * then locks the rows already in those slots.
 */
export async function lockDays(sequelize: Sequelize, transaction: Transaction, householdId: string, dates: string[]) {
  await lockNames(
    sequelize,
    transaction,
    dates.map((date) => `plan:${householdId}:${date}`),
  );
  return PlanEntry.findAll({
    where: { householdId, date: [...new Set(dates)] },
    order: [
      ['position', 'ASC'],
      ['id', 'ASC'],
    ],
    transaction,
    lock: transaction.LOCK.UPDATE,
  });
}

export interface Placement {
  id: string;
  date: string;
  slot: Slot;
  position: number;
}

/** Writes every changed position in one statement; the unique (date, slot, position) check waits for commit. */
export async function writePlacements(
  sequelize: Sequelize,
  transaction: Transaction,
  householdId: string,
  placements: Placement[],
) {
  if (placements.length === 0) return;
  const values = placements.map((_, i) => `(:id${i}::uuid, :date${i}::date, :slot${i}, :position${i}::int)`).join(', ');
  const replacements: Record<string, unknown> = { householdId };
  placements.forEach((p, i) =>
    Object.assign(replacements, {
      [`id${i}`]: p.id,
      [`date${i}`]: p.date,
      [`slot${i}`]: p.slot,
      [`position${i}`]: p.position,
    }),
  );
  await sequelize.query(
    `UPDATE plan_entries e SET date = v.date, slot = v.slot, position = v.position, updated_at = now()
       FROM (VALUES ${values}) AS v(id, date, slot, position)
      WHERE e.id = v.id AND e.household_id = :householdId`,
    { replacements, transaction },
  );
}

/** The entries of one slot in their order. */
export function slotOf(entries: PlanEntry[], date: string, slot: Slot) {
  return entries
    .filter((e) => e.date === date && e.slot === slot)
    .sort((a, b) => a.position - b.position || (a.id < b.id ? -1 : 1));
}

/** The positions each slot's list asks for (0, 1, 2, ...), for the entries whose place changed. */
export function densePlacements(
  lists: { date: string; slot: Slot; ids: string[] }[],
  current: Map<string, Placement>,
): Placement[] {
  const changed: Placement[] = [];
  for (const list of lists) {
    list.ids.forEach((id, position) => {
      const was = current.get(id);
      if (!was || was.date !== list.date || was.slot !== list.slot || was.position !== position)
        changed.push({ id, date: list.date, slot: list.slot, position });
    });
  }
  return changed;
}
