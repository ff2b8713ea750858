import { UniqueConstraintError, type Sequelize } from 'sequelize';
import type { MeResponse, SignupBody } from '../../shared/schemas/auth';
import { hashPassword } from '../auth/passwords';
import { Household, Membership, User } from '../db/models';
import { conflict } from '../http/errors';

const EMAIL_TAKEN = 'An account with that e-mail already exists. Sign in instead, or use another address.';

/** Creates the person and their household in one transaction, with them as its keeper. */
export async function signUp(sequelize: Sequelize, input: SignupBody, bcryptCost: number) {
  if (await User.findOne({ where: { email: input.email } })) throw conflict(EMAIL_TAKEN);
  const passwordHash = await hashPassword(input.password, bcryptCost);
  try {
    return await sequelize.transaction(async (transaction) => {
      const user = await User.create({ email: input.email, name: input.name, passwordHash }, { transaction });
      const household = await Household.create({ name: input.householdName }, { transaction });
      await Membership.create({ householdId: household.id, userId: user.id, role: 'keeper' }, { transaction });
      return user.toPublic();
    });
  } catch (error) {
    if (error instanceof UniqueConstraintError) throw conflict(EMAIL_TAKEN);
    throw error;
  }
}

export async function describeMe(user: Express.User): Promise<MeResponse> {
  const memberships = await Membership.findAll({
    where: { userId: user.id },
    include: [{ model: Household, as: 'household', required: true }],
    order: [['createdAt', 'ASC']],
  });
  return {
    user: { id: user.id, email: user.email, name: user.name },
    memberships: memberships.map((m) => ({ householdId: m.householdId, householdName: m.household!.name, role: m.role })),
  };
}
