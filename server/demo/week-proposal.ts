// The proposal's part of the demo: lunches left open from today on, beside a fridge jar of chutney that turns in three days.
import { Op } from 'sequelize';
import { addDays } from '../../shared/domain';
import { PlanEntry } from '../db/models';
import type { DemoSeedContext } from './features';

/** Days from today whose lunches stay open: the rest of this week, and next week's first days when this one ends soon. */
const OPEN_LUNCH_DAYS = 9;

export async function seedProposalScenario({ households, transaction, today }: DemoSeedContext) {
  // The chutney jar the shelf seeder opened 27 days ago keeps 30 days: without lunches that draw on it, it turns with most of it left.
  await PlanEntry.destroy({
    where: {
      householdId: households['Calloway Hollow'].id,
      slot: 'lunch',
      date: { [Op.between]: [today, addDays(today, OPEN_LUNCH_DAYS - 1)] },
    },
    transaction,
  });
}
