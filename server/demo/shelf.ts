// The shelf part of the demo scenario: products, recipes and two seasons of batches with their jars.
import { recipeProcessingPlan } from '../../shared/processing-plan';
import { addDays, defaultUseWithinDays, useBy } from '../../shared/domain';
import { JarEvent, Product, Recipe, type Household, type User } from '../db/models';
import { writeBatch } from '../services/shelf/write-batch';
import type { DemoSeedContext } from './features';
import {
  CALLOWAY_BATCHES,
  CALLOWAY_PRODUCTS,
  MARSH_END_BATCHES,
  MARSH_END_PRODUCTS,
  type DemoBatch,
} from './shelf-batches';
import { DEMO_RECIPES } from './shelf-recipes';

export async function seedShelf({ households, members, transaction, today }: DemoSeedContext) {
  const calloway = households['Calloway Hollow'];
  const marshEnd = households['Marsh End Cottage'];
  const cook = members['cook@larderly.test'];
  const handlers = [members['keeper@larderly.test'], cook, members['helper@larderly.test']];

  const products = await seedProducts(calloway, CALLOWAY_PRODUCTS, transaction);
  const recipes = new Map<string, Recipe>();
  for (const { product, ...recipe } of DEMO_RECIPES) {
    recipes.set(
      product,
      await Recipe.create(
        { householdId: calloway.id, productId: products.get(product)!.id, ...recipe },
        { transaction },
      ),
    );
  }
  await seedBatches(calloway, products, recipes, CALLOWAY_BATCHES, cook, handlers, today, transaction);

  const neighbor = members['neighbor@larderly.test'];
  const marshProducts = await seedProducts(marshEnd, MARSH_END_PRODUCTS, transaction);
  await seedBatches(marshEnd, marshProducts, new Map(), MARSH_END_BATCHES, neighbor, [neighbor], today, transaction);
}

async function seedProducts(
  household: Household,
  list: typeof CALLOWAY_PRODUCTS,
  transaction: DemoSeedContext['transaction'],
) {
  const created = await Product.bulkCreate(
    list.map((p) => ({ householdId: household.id, ...p })),
    { transaction, returning: true },
  );
  return new Map(created.map((p) => [p.name, p]));
}

async function seedBatches(
  household: Household,
  products: Map<string, Product>,
  recipes: Map<string, Recipe>,
  batches: DemoBatch[],
  cook: User,
  handlers: User[],
  today: string,
  transaction: DemoSeedContext['transaction'],
) {
  let turn = 0;
  const nextHandler = () => handlers[turn++ % handlers.length];
  for (const demo of batches) {
    const product = products.get(demo.product)!;
    const recipe = recipes.get(demo.product) ?? null;
    const plan = recipe
      ? recipeProcessingPlan(recipe, {
          jarSize: demo.jarSize,
          method: 'boiling-water',
          altitudeFt: household.altitudeFt,
        })
      : null;
    const cannedOn = addDays(today, -demo.daysAgo);
    const { batch, jars } = await writeBatch(
      household,
      product,
      {
        productId: product.id,
        recipeId: recipe?.id ?? null,
        cannedOn,
        jarSize: demo.jarSize,
        mouth: demo.mouth ?? null,
        jarsFilled: demo.filled,
        jarsSealed: demo.sealed,
        method: 'boiling-water',
        minutes: plan?.minutes ?? null,
        pressurePsi: null,
        headspaceInches: recipe?.headspaceInches ?? null,
        notes: demo.notes ?? '',
      },
      cook.id,
      transaction,
    );
    const keeps = product.useWithinDays ?? defaultUseWithinDays(product.kind);
    const sealed = jars.filter((jar) => !jar.unsealed);
    const fates: { daysAgo: number; state: 'finished' | 'opened' | 'discarded' }[] = [
      ...(demo.fates.finished ?? []).map((daysAgo) => ({ daysAgo, state: 'finished' as const })),
      ...(demo.fates.opened ?? []).map((daysAgo) => ({ daysAgo, state: 'opened' as const })),
      ...(demo.fates.discarded ?? []).map((daysAgo) => ({ daysAgo, state: 'discarded' as const })),
    ];
    // Gifts leave the shelf sealed: no open before, the empty jar never comes back.
    for (const [index, gift] of (demo.fates.given ?? []).entries()) {
      const jar = sealed[fates.length + index];
      const day = addDays(today, -gift.daysAgo);
      await jar.update({ state: 'given', givenOn: day, givenTo: gift.to ?? null }, { transaction });
      await JarEvent.create(
        {
          householdId: household.id,
          jarId: jar.id,
          batchId: batch.id,
          kind: 'given',
          userId: nextHandler().id,
          happenedOn: day,
          givenTo: gift.to ?? null,
        },
        { transaction },
      );
    }
    for (const [index, fate] of fates.entries()) {
      const jar = sealed[index];
      const day = addDays(today, -fate.daysAgo);
      // A finished jar was opened a fortnight before, or sooner where it keeps less.
      const dayBefore = fate.state === 'finished' ? addDays(day, -Math.min(14, keeps - 1)) : day;
      const openedOn = dayBefore < cannedOn ? cannedOn : dayBefore;
      const who = nextHandler();
      if (fate.state !== 'discarded') {
        await jar.update({ state: 'opened', openedOn, useBy: useBy(openedOn, keeps) }, { transaction });
        await JarEvent.create(
          {
            householdId: household.id,
            jarId: jar.id,
            batchId: batch.id,
            kind: 'opened',
            userId: who.id,
            happenedOn: jar.openedOn!,
          },
          { transaction },
        );
      }
      if (fate.state === 'finished')
        await jar.update({ state: 'finished', finishedOn: day, remainingTbsp: 0 }, { transaction });
      if (fate.state === 'discarded') await jar.update({ state: 'discarded', discardedOn: day }, { transaction });
      if (fate.state !== 'opened')
        await JarEvent.create(
          {
            householdId: household.id,
            jarId: jar.id,
            batchId: batch.id,
            kind: fate.state,
            userId: who.id,
            happenedOn: day,
          },
          { transaction },
        );
    }
    const unsealed = jars.filter((jar) => jar.unsealed);
    for (const [index, fate] of (demo.unsealedFates ?? []).entries()) {
      const jar = unsealed[index];
      const state = fate.finished !== undefined ? 'finished' : 'discarded';
      const day = addDays(today, -(fate.finished ?? fate.discarded ?? 0));
      await jar.update(
        state === 'finished' ? { state, finishedOn: day, remainingTbsp: 0 } : { state, discardedOn: day },
        { transaction },
      );
      await JarEvent.create(
        {
          householdId: household.id,
          jarId: jar.id,
          batchId: batch.id,
          kind: state,
          userId: nextHandler().id,
          happenedOn: day,
        },
        { transaction },
      );
    }
  }
}
