import type { Sequelize } from 'sequelize';
import type { Role } from '../../shared/roles';
import type { HouseholdPatch, HouseholdView, MemberView } from '../../shared/schemas/households';
import { Household, Membership, User } from '../db/models';
import { AppError, conflict, notFound } from '../http/errors';

export function viewHousehold(household: Household, role: Role): HouseholdView {
  return { ...household.toPublic(), role };
}

export async function listMembers(householdId: string): Promise<MemberView[]> {
  const memberships = await Membership.findAll({
    where: { householdId },
    include: [{ model: User, as: 'user', required: true }],
    order: [['createdAt', 'ASC']],
  });
  return memberships.map((m) => ({ userId: m.userId, name: m.user!.name, email: m.user!.email, role: m.role }));
}

/** A keeper who saves an altitude has confirmed it: from then on processing plans may be shown. */
export async function updateHousehold(household: Household, patch: HouseholdPatch) {
  await household.update(patch.altitudeFt === undefined ? patch : { ...patch, altitudeConfirmedAt: new Date() });
  return household;
}

/** Processing times depend on the altitude, so none is given before a keeper has confirmed it. */
export function requireConfirmedAltitude(household: Household) {
  if (household.altitudeConfirmedAt) return;
  throw new AppError(
    422,
    'not_allowed',
    'Processing times and pressures depend on your altitude, and this household’s altitude has not been confirmed yet. A keeper confirms it under Household, then plans can be made.',
    undefined,
    { action: { label: 'Confirm the altitude', href: `/h/${household.id}/setup` } },
  );
}

/** Changes a member's role; the last keeper cannot stop being one, even under concurrent changes. */
export async function changeRole(sequelize: Sequelize, householdId: string, userId: string, role: Role) {
  return sequelize.transaction(async (transaction) => {
    const memberships = await Membership.findAll({ where: { householdId }, transaction, lock: transaction.LOCK.UPDATE });
    const target = memberships.find((m) => m.userId === userId);
    if (!target) throw notFound('That member');
    const keepers = memberships.filter((m) => m.role === 'keeper');
    if (target.role === 'keeper' && role !== 'keeper' && keepers.length === 1) {
      throw conflict('A household needs at least one keeper. Make someone else a keeper first.');
    }
    await target.update({ role }, { transaction });
    return target;
  });
}
