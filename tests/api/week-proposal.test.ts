import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { addDays } from '../../shared/domain';
import type { WeekView } from '../../shared/schemas/week';
import type { ProposalView, WasteFigure } from '../../shared/schemas/week-proposal';
import { demoApp } from '../support/app';

let ctx: Awaited<ReturnType<typeof demoApp>>;
let cook: Awaited<ReturnType<Awaited<ReturnType<typeof demoApp>>['signedIn']>>;
let start: string;
const url = (path: string) => `/api/households/${ctx.householdId}${path}`;
const lunches = () => ({ start, scope: { kind: 'slot', slot: 'lunch' } });
const accepted = (p: ProposalView['proposed'][number]) => ({
  date: p.date,
  slot: p.slot,
  mealId: p.mealId,
  servings: p.servings,
  eaters: p.eaters,
});
const waste = async (): Promise<WasteFigure> => (await cook.get(url(`/week/waste?start=${start}`)).expect(200)).body;

beforeAll(async () => {
  ctx = await demoApp();
  cook = await ctx.signedIn('cook@larderly.test');
  const week: WeekView = (await cook.get(url('/week')).expect(200)).body;
  // The demo leaves the lunches open from today for nine days, beside a fridge jar of chutney that turns in three:
  // the week the jar turns in, so that its waste is this week's (this week, or next when it turns after this one ends).
  start = addDays(week.today, 3) > week.end ? addDays(week.start, 7) : week.start;
});
afterAll(() => ctx.close());

describe('the meal proposal on the demo week', () => {
  it('proposes lunches that use the chutney opened in the fridge before it turns, and says the waste falls', async () => {
    const proposal: ProposalView = (await cook.post(url('/week/proposal')).send(lunches()).expect(200)).body;
    expect(proposal.proposed.length).toBeGreaterThanOrEqual(2);
    expect(
      proposal.proposed.every((p) => p.slot === 'lunch' && p.date >= proposal.start && p.date <= proposal.end),
    ).toBe(true);
    expect(proposal.proposed.map((p) => p.reason)).toContainEqual(
      expect.stringMatching(/^Uses the Green Tomato Chutney opened on [\w, ]+ before \w+/),
    );
    expect(proposal.after.tbspPastUseBy).toBeLessThan(proposal.before.tbspPastUseBy);
    expect(proposal.before).toEqual(await waste());
    const chutney = proposal.proposed.flatMap((p) => p.pairings).find((p) => p.name === 'Green Tomato Chutney')!;
    expect(chutney.jars[0]).toMatchObject({ opens: false, code: expect.stringMatching(/\S/) });
  });

  it('accepts two as drops on the board would write them, lowers the week’s waste, and undoes them in one go', async () => {
    const before = await waste();
    const proposal: ProposalView = (await cook.post(url('/week/proposal')).send(lunches()).expect(200)).body;
    const two = proposal.proposed
      .filter((p) => p.pairings.some((pairing) => pairing.name === 'Green Tomato Chutney'))
      .slice(0, 2);
    expect(two).toHaveLength(2);
    const { entryIds } = (
      await cook
        .post(url('/week/proposal/accept'))
        .send({ entries: two.map(accepted) })
        .expect(201)
    ).body;
    expect(entryIds).toHaveLength(2);

    const week: WeekView = (await cook.get(url(`/week?start=${start}`)).expect(200)).body;
    const planned = week.days.flatMap((d) => d.entries).filter((e) => entryIds.includes(e.id));
    expect(planned.map((e) => [e.date, e.slot, e.title, e.position])).toEqual(
      two.map((p) => [p.date, 'lunch', p.title, 0]),
    );
    const meals = (await cook.get(url('/meals')).expect(200)).body.meals as {
      id: string;
      products: { productId: string; tbspPerServing: number }[];
    }[];
    for (const [i, entry] of planned.entries()) {
      expect(entry.pairings.map((p) => ({ productId: p.productId, tbspPerServing: p.tbspPerServing }))).toEqual(
        meals.find((m) => m.id === entry.mealId)!.products,
      );
      // The board's allocation draws each from the jar the proposal named.
      const chutney = two[i].pairings.find((p) => p.name === 'Green Tomato Chutney')!;
      const pairing = entry.pairings.find((p) => p.productId === chutney.productId)!;
      expect(week.allocation.assignments.filter((a) => a.portionId === pairing.id).map((a) => a.jarId)).toEqual(
        chutney.jars.map((j) => j.jarId),
      );
    }
    const after = await waste();
    expect(after.tbspPastUseBy).toBeLessThan(before.tbspPastUseBy);

    expect((await cook.post(url('/week/proposal/undo')).send({ entryIds }).expect(200)).body).toEqual({ removed: 2 });
    expect(await waste()).toEqual(before);
    const again: WeekView = (await cook.get(url(`/week?start=${start}`)).expect(200)).body;
    expect(again.days.flatMap((d) => d.entries).filter((e) => entryIds.includes(e.id))).toEqual([]);
  });

  it('writes nothing when one accepted meal is not the household’s: one transaction', async () => {
    const proposal: ProposalView = (await cook.post(url('/week/proposal')).send(lunches()).expect(200)).body;
    const entries = [
      accepted(proposal.proposed[0]),
      { ...accepted(proposal.proposed[1]), mealId: 'ffffffff-ffff-4fff-bfff-ffffffffffff' },
    ];
    expect((await cook.post(url('/week/proposal/accept')).send({ entries })).status).toBe(404);
    const week: WeekView = (await cook.get(url(`/week?start=${start}`)).expect(200)).body;
    expect(
      week.days.flatMap((d) => d.entries).filter((e) => e.slot === 'lunch' && e.date === proposal.proposed[0].date),
    ).toEqual([]);
  });

  it('keeps a kept meal and turns down an avoided one when asked again', async () => {
    const first: ProposalView = (await cook.post(url('/week/proposal')).send(lunches()).expect(200)).body;
    const [swap, ...rest] = first.proposed;
    const again: ProposalView = (
      await cook
        .post(url('/week/proposal'))
        .send({
          ...lunches(),
          keep: rest.map((p) => ({ date: p.date, slot: p.slot, mealId: p.mealId })),
          avoid: [{ date: swap.date, slot: swap.slot, mealId: swap.mealId }],
        })
        .expect(200)
    ).body;
    const swapped = again.proposed.find((p) => p.date === swap.date)!;
    expect(swapped.mealId).not.toBe(swap.mealId);
    expect(again.proposed.filter((p) => p.date !== swap.date).map((p) => p.mealId)).toEqual(rest.map((p) => p.mealId));
  });

  it('refuses a day outside the week and a variety of 0 days with 400 naming the field', async () => {
    const day = await cook.post(url('/week/proposal')).send({ start, scope: { kind: 'day', date: addDays(start, 9) } });
    expect([day.status, Object.keys(day.body.error.fields)]).toEqual([400, ['scope']]);
    const variety = await cook.post(url('/week/proposal')).send({ ...lunches(), varietyDays: 0 });
    expect([variety.status, Object.keys(variety.body.error.fields)]).toEqual([400, ['varietyDays']]);
  });
});

describe('who may ask for and accept a proposal', () => {
  it('refuses a helper with 403 and changes nothing, but shows them the waste', async () => {
    const helper = await ctx.signedIn('helper@larderly.test');
    const before = await waste();
    const proposal: ProposalView = (await cook.post(url('/week/proposal')).send(lunches()).expect(200)).body;
    expect((await helper.post(url('/week/proposal')).send(lunches())).status).toBe(403);
    expect(
      (await helper.post(url('/week/proposal/accept')).send({ entries: [accepted(proposal.proposed[0])] })).status,
    ).toBe(403);
    expect((await helper.get(url(`/week/waste?start=${start}`))).body).toEqual(before);
    expect(await waste()).toEqual(before);
  });

  it("answers the neighbour 404 on the first household's proposal, accept, undo and waste, and on its entries named under their own household", async () => {
    const neighbour = await ctx.signedIn('neighbor@larderly.test');
    const proposal: ProposalView = (await cook.post(url('/week/proposal')).send(lunches()).expect(200)).body;
    const { entryIds } = (
      await cook
        .post(url('/week/proposal/accept'))
        .send({ entries: [accepted(proposal.proposed[0])] })
        .expect(201)
    ).body;
    expect((await neighbour.post(url('/week/proposal')).send(lunches())).status).toBe(404);
    expect(
      (await neighbour.post(url('/week/proposal/accept')).send({ entries: [accepted(proposal.proposed[0])] })).status,
    ).toBe(404);
    expect((await neighbour.post(url('/week/proposal/undo')).send({ entryIds })).status).toBe(404);
    expect((await neighbour.get(url(`/week/waste?start=${start}`))).status).toBe(404);
    const own = await neighbour
      .post(`/api/households/${ctx.neighbourHouseholdId}/week/proposal/undo`)
      .send({ entryIds });
    expect(own.status).toBe(404);
    expect(JSON.stringify(own.body)).not.toMatch(/Chutney|Calloway/);
    expect((await cook.post(url('/week/proposal/undo')).send({ entryIds }).expect(200)).body).toEqual({ removed: 1 });
  });
});
