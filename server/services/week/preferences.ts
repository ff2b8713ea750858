// Who eats: a member's heat tolerance and diet, kept by the member or a keeper.
import type { Role } from '../../../shared/roles';
import type { PreferencesPatch } from '../../../shared/schemas/week';
import { Membership } from '../../db/models';
import { forbidden, notFound } from '../../http/errors';

export async function updatePreferences(
  householdId: string,
  actor: { userId: string; role: Role },
  userId: string,
  patch: PreferencesPatch,
) {
  if (actor.userId !== userId && actor.role !== 'keeper')
    throw forbidden('Only the member themselves or a keeper can change what they eat.');
  const membership = await Membership.findOne({ where: { householdId, userId } });
  if (!membership) throw notFound('That member');
  await membership.update(patch);
  return { userId, heatTolerance: membership.heatTolerance, dietTags: membership.dietTags };
}
