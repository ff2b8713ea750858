import type { Canner } from '../../shared/domain';
import type { Sequelize } from 'sequelize';
import type { Role } from '../../shared/roles';
import { hashPassword } from '../auth/passwords';
import { todayIn } from '../services/clock';
import { Household, Membership, User } from '../db/models';
import accounts from './demo-accounts.json' with { type: 'json' };
import { seedDemoFeatures } from './features';

export const DEMO_PASSWORD = accounts.password;

/**
 * Our invented demo scenario, for local use only: a production start never seeds it.
 * Returns the created households by name so feature seeders can add to them.
 */
export async function seedDemo(sequelize: Sequelize, bcryptCost = 12) {
  const passwordHash = await hashPassword(DEMO_PASSWORD, bcryptCost);
  return sequelize.transaction(async (transaction) => {
    const households: Record<string, Household> = {};
    const members: Record<string, User> = {};
    for (const h of accounts.households) {
      const household = await Household.create(
        {
          name: h.name,
          altitudeFt: h.altitudeFt,
          timeZone: h.timeZone,
          altitudeConfirmedAt: new Date(),
          // A water-bath canner for fruit and pickles, a pressure canner for the low-acid jars (common sizes).
          ...('canners' in h ? { canners: h.canners as Canner[] } : {}),
        },
        { transaction },
      );
      households[h.name] = household;
      for (const m of h.members) {
        const user = await User.create({ email: m.email, name: m.name, passwordHash }, { transaction });
        members[m.email] = user;
        await Membership.create({ householdId: household.id, userId: user.id, role: m.role as Role }, { transaction });
      }
    }
    await seedDemoFeatures({ households, members, transaction, today: todayIn(accounts.households[0].timeZone) });
    return households;
  });
}

export async function isEmpty() {
  return (await Household.count()) === 0;
}
