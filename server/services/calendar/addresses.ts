// Private calendar addresses: one a person per household, its secret long and random, only its SHA-256 kept.
import { createHash, randomBytes } from 'node:crypto';
import type { CalendarFeedView, MealTimes } from '../../../shared/schemas/calendar';
import { CalendarFeed, Household, Membership } from '../../db/models';

const fingerprint = (secret: string) => createHash('sha256').update(secret).digest('hex');

/** The address a calendar app subscribes to; the secret is 256 random bits. */
export const feedAddress = (publicOrigin: string, secret: string) => `${publicOrigin}/api/calendar/${secret}.ics`;

const viewOf = (household: Household, feed: CalendarFeed | null): CalendarFeedView => ({
  on: feed !== null,
  createdAt: feed?.updatedAt.toISOString() ?? null,
  lastFetchedAt: feed?.lastFetchedAt?.toISOString() ?? null,
  mealTimes: household.mealTimes,
});

export async function feedView(household: Household, userId: string): Promise<CalendarFeedView> {
  return viewOf(household, await CalendarFeed.findOne({ where: { householdId: household.id, userId } }));
}

/** Turns the address on, or renews it: the new secret replaces the old one, which stops answering at once. */
export async function renewFeed(household: Household, userId: string, publicOrigin: string): Promise<CalendarFeedView> {
  const secret = randomBytes(32).toString('base64url');
  const tokenHash = fingerprint(secret);
  const existing = await CalendarFeed.findOne({ where: { householdId: household.id, userId } });
  const feed = existing
    ? await existing.update({ tokenHash, lastFetchedAt: null })
    : await CalendarFeed.create({ householdId: household.id, userId, tokenHash });
  return { ...viewOf(household, feed), address: feedAddress(publicOrigin, secret) };
}

export async function turnOffFeed(householdId: string, userId: string) {
  await CalendarFeed.destroy({ where: { householdId, userId } });
}

/** The household a secret opens, while its person is still a member; null otherwise (the caller answers 404). */
export async function householdOfSecret(secret: string): Promise<{ household: Household; feed: CalendarFeed } | null> {
  const feed = await CalendarFeed.findOne({ where: { tokenHash: fingerprint(secret) } });
  if (!feed) return null;
  const membership = await Membership.findOne({
    where: { householdId: feed.householdId, userId: feed.userId },
    include: [{ model: Household, as: 'household' }],
  });
  if (!membership?.household) return null;
  return { household: membership.household, feed };
}

export async function setMealTimes(household: Household, mealTimes: MealTimes) {
  await household.update({ mealTimes });
  return household;
}
