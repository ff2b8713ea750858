// Copies one week's plan into another, after whatever that week already holds.
import type { Sequelize } from 'sequelize';
import { daysBetween, addDays } from '../../../shared/domain';
import { weekDates } from '../../../shared/schemas/week';
import { Pairing, PlanEntry } from '../../db/models';
import { lockDays, slotOf } from './slot-locks';

export async function copyWeek(sequelize: Sequelize, householdId: string, from: string, to: string) {
  return sequelize.transaction(async (transaction) => {
    const shift = daysBetween(from, to);
    const targets = await lockDays(sequelize, transaction, householdId, weekDates(to));
    const sources = await PlanEntry.findAll({
      where: { householdId, date: weekDates(from) },
      include: [{ model: Pairing, as: 'pairings' }],
      order: [
        ['date', 'ASC'],
        ['slot', 'ASC'],
        ['position', 'ASC'],
      ],
      transaction,
    });
    const nextPosition = new Map<string, number>();
    const copies = sources.map((source) => {
      const date = addDays(source.date, shift);
      const key = `${date}|${source.slot}`;
      const position = nextPosition.get(key) ?? slotOf(targets, date, source.slot).length;
      nextPosition.set(key, position + 1);
      return {
        source,
        row: {
          householdId,
          date,
          slot: source.slot,
          position,
          title: source.title,
          mealId: source.mealId,
          servings: source.servings,
          eaters: source.eaters,
        },
      };
    });
    const created = await PlanEntry.bulkCreate(
      copies.map((c) => c.row),
      { transaction },
    );
    const pairings = copies.flatMap((c, i) =>
      (c.source.pairings ?? []).map((p) => ({
        householdId,
        planEntryId: created[i].id,
        productId: p.productId,
        tbspPerServing: p.tbspPerServing,
      })),
    );
    if (pairings.length) await Pairing.bulkCreate(pairings, { transaction });
    return created.length;
  });
}
