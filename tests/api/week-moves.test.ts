import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { addDays } from '../../shared/domain';
import { Membership, PlanEntry } from '../../server/db/models';
import { demoApp } from '../support/app';

let ctx: Awaited<ReturnType<typeof demoApp>>;
let cook: Awaited<ReturnType<typeof ctx.signedIn>>;
// A week far from the demo plan, so the seeded entries never share its slots.
const monday = '2031-03-03';
const tuesday = addDays(monday, 1);

beforeAll(async () => {
  ctx = await demoApp();
  cook = await ctx.signedIn('cook@larderly.test');
});
afterAll(() => ctx.close());

const url = (path: string) => `/api/households/${ctx.householdId}${path}`;

async function plan(date: string, slot: string, title: string, position?: number) {
  const response = await cook
    .post(url('/plan-entries'))
    .send({ date, slot, title, ...(position === undefined ? {} : { position }) });
  expect(response.status).toBe(201);
  return response.body.id as string;
}

/** Titles of one slot in position order, with the positions themselves. */
async function slot(date: string, name: string) {
  const rows = await PlanEntry.findAll({
    where: { householdId: ctx.householdId, date, slot: name },
    order: [['position', 'ASC']],
  });
  return { titles: rows.map((r) => r.title), positions: rows.map((r) => r.position) };
}

describe('moving planned meals keeps each slot dense and ordered', () => {
  it('inserts at a position and shifts the rest down', async () => {
    await plan(monday, 'lunch', 'Soup');
    await plan(monday, 'lunch', 'Bread');
    await plan(monday, 'lunch', 'Cheese board', 1);
    expect(await slot(monday, 'lunch')).toEqual({ titles: ['Soup', 'Cheese board', 'Bread'], positions: [0, 1, 2] });
  });

  it('reorders within a slot', async () => {
    const [soup] = (
      await PlanEntry.findAll({ where: { householdId: ctx.householdId, date: monday, slot: 'lunch', title: 'Soup' } })
    ).map((e) => e.id);
    expect((await cook.patch(url(`/plan-entries/${soup}`)).send({ position: 2 })).status).toBe(200);
    expect(await slot(monday, 'lunch')).toEqual({ titles: ['Cheese board', 'Bread', 'Soup'], positions: [0, 1, 2] });
  });

  it('moves across slots: the gap closes and the new slot opens one', async () => {
    await plan(monday, 'dinner', 'Pork chops');
    const bread = (await PlanEntry.findOne({ where: { householdId: ctx.householdId, date: monday, title: 'Bread' } }))!
      .id;
    expect((await cook.patch(url(`/plan-entries/${bread}`)).send({ slot: 'dinner', position: 0 })).status).toBe(200);
    expect(await slot(monday, 'lunch')).toEqual({ titles: ['Cheese board', 'Soup'], positions: [0, 1] });
    expect(await slot(monday, 'dinner')).toEqual({ titles: ['Bread', 'Pork chops'], positions: [0, 1] });
  });

  it('moves across days to the end of the slot when no position is given', async () => {
    await plan(tuesday, 'dinner', 'Lentil stew');
    const soup = (await PlanEntry.findOne({ where: { householdId: ctx.householdId, date: monday, title: 'Soup' } }))!
      .id;
    expect((await cook.patch(url(`/plan-entries/${soup}`)).send({ date: tuesday, slot: 'dinner' })).status).toBe(200);
    expect(await slot(monday, 'lunch')).toEqual({ titles: ['Cheese board'], positions: [0] });
    expect(await slot(tuesday, 'dinner')).toEqual({ titles: ['Lentil stew', 'Soup'], positions: [0, 1] });
  });

  it('clamps a position past the end to the end', async () => {
    const cheese = (await PlanEntry.findOne({
      where: { householdId: ctx.householdId, date: monday, title: 'Cheese board' },
    }))!.id;
    expect(
      (await cook.patch(url(`/plan-entries/${cheese}`)).send({ date: tuesday, slot: 'dinner', position: 99 })).status,
    ).toBe(200);
    expect(await slot(tuesday, 'dinner')).toEqual({
      titles: ['Lentil stew', 'Soup', 'Cheese board'],
      positions: [0, 1, 2],
    });
    expect(await slot(monday, 'lunch')).toEqual({ titles: [], positions: [] });
  });

  it('closes the gap when an entry is removed', async () => {
    const soup = (await PlanEntry.findOne({ where: { householdId: ctx.householdId, date: tuesday, title: 'Soup' } }))!
      .id;
    expect((await cook.delete(url(`/plan-entries/${soup}`))).status).toBe(204);
    expect(await slot(tuesday, 'dinner')).toEqual({ titles: ['Lentil stew', 'Cheese board'], positions: [0, 1] });
  });

  it('shows the moves on GET /week in slot and position order', async () => {
    const week = (await cook.get(url(`/week?start=${monday}`))).body;
    expect(week.start).toBe(monday);
    const tue = week.days.find((d: { date: string }) => d.date === tuesday);
    expect(
      tue.entries.map((e: { title: string; slot: string; position: number }) => `${e.slot}:${e.position}:${e.title}`),
    ).toEqual(['dinner:0:Lentil stew', 'dinner:1:Cheese board']);
  });
});

describe('concurrent moves', () => {
  it('never leave two entries on one position, whatever order they land in', async () => {
    const day = '2031-04-07';
    const other = addDays(day, 1);
    const ids: string[] = [];
    for (let i = 0; i < 6; i += 1) ids.push(await plan(day, 'dinner', `Dinner ${i}`));
    for (let i = 0; i < 4; i += 1) ids.push(await plan(other, 'lunch', `Lunch ${i}`));
    // Every entry moves at once: half to the top of one slot, half to the top of the other.
    const responses = await Promise.all(
      ids.map((id, i) =>
        cook
          .patch(url(`/plan-entries/${id}`))
          .send(i % 2 ? { date: day, slot: 'dinner', position: 0 } : { date: other, slot: 'lunch', position: 0 }),
      ),
    );
    expect(responses.map((r) => r.status)).toEqual(ids.map(() => 200));
    const dinner = await slot(day, 'dinner');
    const lunch = await slot(other, 'lunch');
    expect(dinner.positions).toEqual([...dinner.positions.keys()]);
    expect(lunch.positions).toEqual([...lunch.positions.keys()]);
    expect(dinner.titles.length + lunch.titles.length).toBe(10);
    expect(dinner.titles.length).toBe(5);
  });

  it('keeps a slot dense when many reorder the same slot at once', async () => {
    const day = '2031-05-05';
    const ids: string[] = [];
    for (let i = 0; i < 8; i += 1) ids.push(await plan(day, 'snack', `Snack ${i}`));
    await Promise.all(ids.map((id, i) => cook.patch(url(`/plan-entries/${id}`)).send({ position: (i * 3) % 8 })));
    expect((await slot(day, 'snack')).positions).toEqual([0, 1, 2, 3, 4, 5, 6, 7]);
  });

  it('edits servings and titles without a move while others move the same entries, and both land', async () => {
    const day = '2031-06-02';
    const ids: string[] = [];
    for (let i = 0; i < 6; i += 1) ids.push(await plan(day, 'dinner', `Supper ${i}`));
    const answers = await Promise.all(
      ids.flatMap((id, i) => [
        cook.patch(url(`/plan-entries/${id}`)).send({ servings: i + 2, title: `Supper ${i} for ${i + 2}` }),
        cook.patch(url(`/plan-entries/${id}`)).send({ slot: 'lunch', position: 0 }),
      ]),
    );
    expect(answers.map((a) => a.status)).toEqual(answers.map(() => 200));
    const rows = await PlanEntry.findAll({ where: { householdId: ctx.householdId, date: day } });
    for (const [i, id] of ids.entries()) {
      const row = rows.find((r) => r.id === id)!;
      expect([row.slot, row.servings, row.title]).toEqual(['lunch', i + 2, `Supper ${i} for ${i + 2}`]);
    }
    expect((await slot(day, 'lunch')).positions).toEqual([0, 1, 2, 3, 4, 5]);
  });

  it('refuses an edit of a planned meal that is not there, changing nothing', async () => {
    const missing = await cook.patch(url('/plan-entries/00000000-0000-4000-8000-000000000000')).send({ servings: 3 });
    expect(missing.status).toBe(404);
    const empty = await cook.patch(url('/plan-entries/00000000-0000-4000-8000-000000000000')).send({});
    expect(empty.status).toBe(404);
  });
});

describe('an edit that changes nothing', () => {
  const planVersion = async () => {
    const [[found]] = (await PlanEntry.sequelize!.query('SELECT plan_version FROM households WHERE id = $1', {
      bind: [ctx.householdId],
    })) as [{ plan_version: string }[], unknown];
    return found!.plan_version;
  };
  const row = async (id: string) => (await PlanEntry.findByPk(id))!;

  it('writes nothing and moves no plan version; each field that differs is written, nullable eaters both ways', async () => {
    const id = await plan('2031-07-07', 'dinner', 'Bean chili');
    const members = (await Membership.findAll({ where: { householdId: ctx.householdId } })).map((m) => m.userId);
    const edit = async (change: object) => {
      const response = await cook.patch(url(`/plan-entries/${id}`)).send(change);
      expect(response.status).toBe(200);
    };
    await edit({ servings: 4, title: 'Bean chili', eaters: null });
    const before = await row(id);
    const version = await planVersion();
    // The same values again: no UPDATE runs, so neither the row nor the version moves.
    await edit({ servings: 4 });
    await edit({ servings: 4, title: 'Bean chili', eaters: null });
    expect((await row(id)).updatedAt).toEqual(before.updatedAt);
    expect(await planVersion()).toBe(version);

    const steps: [object, (r: PlanEntry) => unknown, unknown][] = [
      [{ eaters: members }, (r) => r.eaters, members],
      [{ eaters: members }, (r) => r.eaters, members],
      [{ eaters: members.slice(0, 1) }, (r) => r.eaters, members.slice(0, 1)],
      [{ eaters: null }, (r) => r.eaters, null],
      [{ servings: 5, title: 'Bean chili' }, (r) => r.servings, 5],
      [{ title: 'Bean chili, mild' }, (r) => r.title, 'Bean chili, mild'],
    ];
    let expected = version;
    for (const [i, [change, read, value]] of steps.entries()) {
      await edit(change);
      // The second step repeats the first: the only one that must leave the version where it was.
      if (i !== 1) expected = String(BigInt(expected) + 1n);
      expect([read(await row(id)), await planVersion()]).toEqual([value, expected]);
    }
  });
});
