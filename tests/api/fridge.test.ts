import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { addDays, UNSEALED_JAR_ADVICE } from '../../shared/domain';
import { Pairing, PlanEntry } from '../../server/db/models';
import { todayIn } from '../../server/services/clock';
import { bareApp } from '../support/bare-app';
import { newHousehold, openedJar } from '../support/opened-jar';

let ctx: ReturnType<typeof bareApp>;
beforeAll(() => {
  ctx = bareApp();
});
afterAll(() => ctx.close());

describe('the fridge', () => {
  it('lists opened jars soonest use-by first, with days open and days left', async () => {
    const home = await newHousehold(ctx.app, 'Europe/Lisbon');
    const today = todayIn('Europe/Lisbon');
    await openedJar(home.householdId, {
      productName: 'Fig and Orange Chutney',
      openedOn: addDays(today, -3),
      useWithinDays: 28,
    });
    await openedJar(home.householdId, {
      productName: 'Green Bean Piccalilli',
      openedOn: addDays(today, -9),
      useWithinDays: 10,
      unsealed: true,
    });
    const response = await home.agent.get(`/api/households/${home.householdId}/fridge`);
    expect(response.status).toBe(200);
    expect(response.body.today).toBe(today);
    expect(response.body.unsealedAdvice).toBe(UNSEALED_JAR_ADVICE);
    expect(
      response.body.jars.map((j: { productName: string; daysOpen: number; daysLeft: number; unsealed: boolean }) => [
        j.productName,
        j.daysOpen,
        j.daysLeft,
        j.unsealed,
      ]),
    ).toEqual([
      ['Green Bean Piccalilli', 9, 1, true],
      ['Fig and Orange Chutney', 3, 25, false],
    ]);
  });

  it('estimates what is left on the use-by from the plan (the domain allocation), else from the jar', async () => {
    const home = await newHousehold(ctx.app, 'UTC');
    const today = todayIn('UTC');
    const { product } = await openedJar(home.householdId, {
      productName: 'Cherry Tomato Jam',
      openedOn: today,
      useWithinDays: 21,
      remainingTbsp: 12,
    });
    const before = (await home.agent.get(`/api/households/${home.householdId}/fridge`)).body.jars[0];
    expect(before).toMatchObject({ remainingTbsp: 12, plannedTbsp: 0, estimateTbsp: 12, estimateFrom: 'jar' });

    // Two servings at 2 tbsp each tomorrow, and one past the jar's use-by that it cannot serve.
    for (const [date, position] of [
      [addDays(today, 1), 0],
      [addDays(today, 30), 0],
    ] as const) {
      const entry = await PlanEntry.create({
        householdId: home.householdId,
        date,
        slot: 'dinner',
        position,
        title: 'Cheese board',
        servings: 2,
      });
      await Pairing.create({
        householdId: home.householdId,
        planEntryId: entry.id,
        productId: product.id,
        tbspPerServing: 2,
      });
    }
    const after = (await home.agent.get(`/api/households/${home.householdId}/fridge`)).body.jars[0];
    expect(after).toMatchObject({ remainingTbsp: 12, plannedTbsp: 4, estimateTbsp: 8, estimateFrom: 'plan' });
  });

  it('shows an empty fridge as an empty list', async () => {
    const home = await newHousehold(ctx.app, 'UTC');
    expect((await home.agent.get(`/api/households/${home.householdId}/fridge`)).body.jars).toEqual([]);
  });

  it("answers another household's member 404, never the jars", async () => {
    const home = await newHousehold(ctx.app, 'UTC');
    await openedJar(home.householdId, {
      productName: 'Private Marmalade',
      openedOn: todayIn('UTC'),
      useWithinDays: 21,
    });
    const stranger = await newHousehold(ctx.app, 'UTC');
    const response = await stranger.agent.get(`/api/households/${home.householdId}/fridge`);
    expect(response.status).toBe(404);
    expect(JSON.stringify(response.body)).not.toContain('Marmalade');
  });
});
