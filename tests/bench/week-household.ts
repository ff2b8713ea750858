// A generated household with three years behind it: 60 products, 400 batches, 4,000 jars, 3,000 plan entries.
import { addDays, addMonths, bestQualityBy, jarCapacityTbsp, PRODUCT_KINDS } from '../../shared/domain';
import { SLOTS } from '../../shared/schemas/week';
import { hashPassword } from '../../server/auth/passwords';
import { Batch, Household, Jar, Membership, Pairing, PlanEntry, Product, Recipe, User } from '../../server/db/models';

export const BENCH_EMAIL = 'bench-keeper@larderly.test';
export const BENCH_PASSWORD = 'bench household password';

export async function generateHousehold(today: string) {
  const household = await Household.create({
    name: 'Bench Holler',
    timeZone: 'America/New_York',
    altitudeFt: 1200,
    altitudeConfirmedAt: new Date(),
  });
  const hid = household.id;
  const people = await User.bulkCreate(
    ['Keeper', 'Cook', 'Helper'].map((role, i) => ({
      email: i === 0 ? BENCH_EMAIL : `bench-${role.toLowerCase()}@larderly.test`,
      name: `Bench ${role}`,
      passwordHash: '',
    })),
  );
  const passwordHash = await hashPassword(BENCH_PASSWORD, 4);
  await User.update({ passwordHash }, { where: { id: people.map((p) => p.id) } });
  await Membership.bulkCreate([
    { householdId: hid, userId: people[0].id, role: 'keeper', heatTolerance: 3, dietTags: ['low-salt'] },
    { householdId: hid, userId: people[1].id, role: 'cook' },
    { householdId: hid, userId: people[2].id, role: 'helper', heatTolerance: 1, dietTags: ['no-added-sugar'] },
  ]);

  const products = await Product.bulkCreate(
    Array.from({ length: 60 }, (_, i) => ({
      householdId: hid,
      name: `Preserve ${String(i + 1).padStart(2, '0')}`,
      kind: PRODUCT_KINDS[i % PRODUCT_KINDS.length],
      heat: i % 6,
    })),
  );
  await Recipe.bulkCreate(
    products.map((p) => ({
      householdId: hid,
      productId: p.id,
      name: `${p.name} card`,
      yieldJars: 8,
      yieldJarSize: 'half-pint' as const,
      ingredients: [
        { name: 'produce', amount: 4, unit: 'lb' as const, role: 'produce' as const },
        { name: 'vinegar (5%)', amount: 2, unit: 'cup' as const, role: 'acid' as const },
        { name: 'sugar', amount: 1, unit: 'cup' as const, role: 'sweetener' as const },
        { name: 'canning salt', amount: 1, unit: 'tbsp' as const, role: 'spice' as const },
      ],
      method: 'boiling-water' as const,
      baseMinutes: { 'half-pint': 10 },
      headspaceInches: 0.5,
    })),
  );

  // 400 batches spread over three years, ten jars each; older jars mostly eaten, the last year's mostly sealed.
  const batches = await Batch.bulkCreate(
    Array.from({ length: 400 }, (_, i) => ({
      householdId: hid,
      productId: products[i % 60].id,
      cannedOn: addDays(today, -1095 + Math.floor((i * 1090) / 400)),
      jarSize: 'half-pint' as const,
      jarsFilled: 10,
      jarsSealed: 10,
      method: 'boiling-water' as const,
      altitudeFt: 1200,
      minutes: 15,
    })),
  );
  const capacity = jarCapacityTbsp('half-pint');
  const openedProducts = new Set<string>();
  const jars = batches.flatMap((batch, b) =>
    Array.from({ length: 10 }, (_, j) => {
      const recent = batch.cannedOn > addMonths(today, -12);
      const opened = recent && j === 0 && !openedProducts.has(batch.productId) && openedProducts.add(batch.productId);
      const state = opened ? 'opened' : recent && j > 2 ? 'sealed' : j === 9 ? 'discarded' : 'finished';
      const openedOn = opened ? addDays(today, -((b % 10) + 1)) : null;
      return {
        householdId: hid,
        batchId: batch.id,
        productId: batch.productId,
        code: `BN${String(b * 10 + j).padStart(5, '0')}`,
        state: state as 'opened' | 'sealed' | 'finished' | 'discarded',
        capacityTbsp: capacity,
        remainingTbsp: state === 'sealed' ? capacity : state === 'opened' ? capacity / 2 : 0,
        bestBy: bestQualityBy(batch.cannedOn),
        openedOn,
        useBy: openedOn ? addDays(openedOn, 21) : null,
        finishedOn: state === 'finished' ? addDays(batch.cannedOn, 60) : null,
        discardedOn: state === 'discarded' ? addDays(batch.cannedOn, 30) : null,
      };
    }),
  );
  await Jar.bulkCreate(jars);

  // 3,000 planned meals: three a day for the thousand days up to two weeks ahead, each paired with one product.
  const entries = await PlanEntry.bulkCreate(
    Array.from({ length: 3000 }, (_, i) => ({
      householdId: hid,
      date: addDays(today, -986 + Math.floor(i / 3)),
      slot: SLOTS[i % 3],
      position: 0,
      title: `Meal ${i + 1}`,
      servings: 2 + (i % 3),
    })),
  );
  await Pairing.bulkCreate(
    entries.map((e, i) => ({
      householdId: hid,
      planEntryId: e.id,
      productId: products[(i * 7) % 60].id,
      tbspPerServing: 1,
    })),
  );
  return { household, jars: jars.length, entries: entries.length };
}
