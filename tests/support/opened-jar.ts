import { randomBytes } from 'node:crypto';
import type { Express } from 'express';
import { addDays } from '../../shared/domain';
import { Batch, Household, Jar, Product } from '../../server/db/models';
import { accountSignedIn } from './accounts';

/** A new person with a household of their own, signed in; nothing else shares it. */
export async function newHousehold(app: Express, timeZone: string) {
  const email = `cellar-${randomBytes(4).toString('hex')}@example.test`;
  const { agent, me } = await accountSignedIn(app, {
    email,
    password: 'brine and patience',
    name: 'Ada Fenwick',
    householdName: 'Fenwick Cellar',
  });
  const householdId = me.memberships[0].householdId;
  await Household.update({ timeZone }, { where: { id: householdId } });
  return { email, agent, householdId, userId: me.user.id };
}

/** An opened half-pint of a product that keeps `useWithinDays` once open (our invented test data). */
export async function openedJar(
  householdId: string,
  input: { productName: string; openedOn: string; useWithinDays: number; remainingTbsp?: number; unsealed?: boolean },
) {
  const product = await Product.create({
    householdId,
    name: input.productName,
    kind: 'chutney',
    useWithinDays: input.useWithinDays,
  });
  const batch = await Batch.create({
    householdId,
    productId: product.id,
    cannedOn: addDays(input.openedOn, -60),
    jarSize: 'half-pint',
    jarsFilled: 4,
    jarsSealed: 4,
    method: 'boiling-water',
    altitudeFt: 0,
  });
  const jar = await Jar.create({
    householdId,
    batchId: batch.id,
    productId: product.id,
    code: `T${randomBytes(4).toString('hex').toUpperCase()}`,
    state: 'opened',
    capacityTbsp: 16,
    remainingTbsp: input.remainingTbsp ?? 12,
    unsealed: input.unsealed ?? false,
    bestBy: addDays(input.openedOn, 300),
    openedOn: input.openedOn,
    useBy: addDays(input.openedOn, input.useWithinDays),
  });
  return { product, batch, jar };
}
