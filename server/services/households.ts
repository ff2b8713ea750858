import type { Sequelize, Transaction } from 'sequelize';
import type { Role } from '../../shared/roles';
import type { HouseholdPatch, HouseholdView, MemberView } from '../../shared/schemas/households';
import {
  CalendarFeed,
  DigestDelivery,
  Household,
  Membership,
  PushSubscription,
  ReminderDelivery,
  Todo,
  User,
} from '../db/models';
import { AppError, conflict, notFound } from '../http/errors';
import { paths } from '../../shared/paths';
import { cannerFor } from '../../shared/domain';
import { METHOD_NAMES } from '../../shared/words';

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
  const { cannerCapacityJars, canners: listed, ...settings } = patch;
  const defaultMethod = patch.defaultMethod ?? household.defaultMethod;
  let canners = listed ?? household.canners;
  if (cannerCapacityJars !== undefined) {
    // One number for the default canner, as the first-run questions ask it: that canner's capacity, added if new.
    canners = cannerFor(canners, defaultMethod)
      ? canners.map((c) => (c.method === defaultMethod ? { ...c, capacityJars: cannerCapacityJars } : c))
      : [...canners, { method: defaultMethod, capacityJars: cannerCapacityJars }];
  }
  if (!cannerFor(canners, defaultMethod)) {
    const message = `Add the ${METHOD_NAMES[defaultMethod].toLowerCase()} to the household’s canners first, or choose one it has as the default.`;
    throw new AppError(400, 'invalid_input', message, { defaultMethod: message });
  }
  await household.update({
    ...settings,
    canners,
    ...(patch.altitudeFt === undefined ? {} : { altitudeConfirmedAt: new Date() }),
  });
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
    { action: { label: 'Confirm the altitude', href: paths.setup(household.id) } },
  );
}

/** Changes a member's role; the last keeper cannot stop being one, even under concurrent changes. */
export async function changeRole(sequelize: Sequelize, householdId: string, userId: string, role: Role) {
  return sequelize.transaction(async (transaction) => {
    const memberships = await Membership.findAll({
      where: { householdId },
      transaction,
      lock: transaction.LOCK.UPDATE,
    });
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

/**
 * Ends one person's membership: their to-dos there are unassigned, their reminder and digest claims
 * for the household go, and their browsers stop receiving pushes once they belong to no household.
 * The guard reads membership on every request, so their access ends on the very next one.
 */
async function endMembership(householdId: string, userId: string, transaction: Transaction) {
  await Membership.destroy({ where: { householdId, userId }, transaction });
  await Todo.update({ assigneeId: null }, { where: { householdId, assigneeId: userId }, transaction });
  await ReminderDelivery.destroy({ where: { householdId, userId }, transaction });
  await DigestDelivery.destroy({ where: { householdId, userId }, transaction });
  await CalendarFeed.destroy({ where: { householdId, userId }, transaction });
  if ((await Membership.count({ where: { userId }, transaction })) === 0)
    await PushSubscription.destroy({ where: { userId }, transaction });
}

const LAST_KEEPER = 'A household needs at least one keeper. Make someone else a keeper first, then leave.';

/** A keeper removes another member; keepers leave by themselves, so a household always keeps one. */
export async function removeMember(sequelize: Sequelize, householdId: string, keeperId: string, userId: string) {
  if (userId === keeperId) throw conflict('To leave the household yourself, use Leave household.');
  await sequelize.transaction(async (transaction) => {
    const memberships = await Membership.findAll({
      where: { householdId },
      transaction,
      lock: transaction.LOCK.UPDATE,
    });
    if (!memberships.some((m) => m.userId === userId)) throw notFound('That member');
    await endMembership(householdId, userId, transaction);
  });
}

/** The signed-in member leaves; the last keeper must hand over first. */
export async function leaveHousehold(sequelize: Sequelize, householdId: string, userId: string) {
  await sequelize.transaction(async (transaction) => {
    const memberships = await Membership.findAll({
      where: { householdId },
      transaction,
      lock: transaction.LOCK.UPDATE,
    });
    const me = memberships.find((m) => m.userId === userId);
    if (!me) throw notFound('That household');
    if (me.role === 'keeper' && memberships.filter((m) => m.role === 'keeper').length === 1)
      throw conflict(LAST_KEEPER);
    await endMembership(householdId, userId, transaction);
  });
}
