import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { demoApp } from '../support/app';

let ctx: Awaited<ReturnType<typeof demoApp>>;
let entryId: string;
const date = '2031-06-02';

beforeAll(async () => {
  ctx = await demoApp();
  const cook = await ctx.signedIn('cook@larderly.test');
  entryId = (
    await cook
      .post(`/api/households/${ctx.householdId}/plan-entries`)
      .send({ date, slot: 'lunch', title: 'Bean salad' })
  ).body.id;
});
afterAll(() => ctx.close());

const url = (path: string) => `/api/households/${ctx.householdId}${path}`;
const writes = () =>
  [
    ['post', '/meals', { name: 'Omelette' }],
    ['post', '/plan-entries', { date, slot: 'dinner', title: 'Stew' }],
    ['patch', `/plan-entries/${entryId}`, { slot: 'dinner' }],
    ['delete', `/plan-entries/${entryId}`, undefined],
    ['post', '/week/copy', { from: date, to: '2031-06-09' }],
    ['delete', `/week/days/${date}`, undefined],
  ] as const;

describe('who may plan the week', () => {
  it('lets a helper read the week and the meals', async () => {
    const helper = await ctx.signedIn('helper@larderly.test');
    const week = await helper.get(url(`/week?start=${date}`));
    expect(week.status).toBe(200);
    expect(week.body.days.flatMap((d: { entries: { title: string }[] }) => d.entries.map((e) => e.title))).toContain(
      'Bean salad',
    );
    expect((await helper.get(url('/meals'))).status).toBe(200);
  });

  it('refuses every write from a helper with 403 and changes nothing', async () => {
    const helper = await ctx.signedIn('helper@larderly.test');
    for (const [method, path, payload] of writes()) {
      const response = await helper[method](url(path)).send(payload);
      expect(response.status, `${method} ${path}`).toBe(403);
    }
    const week = await helper.get(url(`/week?start=${date}`));
    expect(week.body.days[0].entries.map((e: { title: string; slot: string }) => `${e.slot} ${e.title}`)).toEqual([
      'lunch Bean salad',
    ]);
  });

  it("answers the neighbour 404 on the first household's week, meals and entries, never the data", async () => {
    const neighbour = await ctx.signedIn('neighbor@larderly.test');
    for (const path of [`/week?start=${date}`, '/meals']) {
      const response = await neighbour.get(url(path));
      expect(response.status).toBe(404);
      expect(JSON.stringify(response.body)).not.toMatch(/Bean salad|Calloway/);
    }
    for (const [method, path, payload] of writes()) {
      expect((await neighbour[method](url(path)).send(payload)).status, `${method} ${path}`).toBe(404);
    }
  });

  it("answers 404 when the neighbour names the first household's entry under its own household", async () => {
    const neighbour = await ctx.signedIn('neighbor@larderly.test');
    const response = await neighbour
      .patch(`/api/households/${ctx.neighbourHouseholdId}/plan-entries/${entryId}`)
      .send({ slot: 'snack' });
    expect(response.status).toBe(404);
  });

  it('lets a cook write', async () => {
    const cook = await ctx.signedIn('cook@larderly.test');
    expect((await cook.patch(url(`/plan-entries/${entryId}`)).send({ servings: 3 })).status).toBe(200);
  });

  it('refuses a malformed week start and a bad slot with 400 naming the field', async () => {
    const cook = await ctx.signedIn('cook@larderly.test');
    expect((await cook.get(url('/week?start=next-tuesday'))).body.error.fields).toHaveProperty('start');
    const bad = await cook.post(url('/plan-entries')).send({ date, slot: 'elevenses', title: 'Tea' });
    expect(bad.status).toBe(400);
    expect(bad.body.error.fields).toHaveProperty('slot');
  });
});

describe('member preferences', () => {
  async function memberId(email: string) {
    const keeper = await ctx.signedIn('keeper@larderly.test');
    const members = (await keeper.get(`/api/households/${ctx.householdId}/members`)).body.members as {
      userId: string;
      email: string;
    }[];
    return members.find((m) => m.email === email)!.userId;
  }

  it('lets a member set their own heat tolerance and diet', async () => {
    const helper = await ctx.signedIn('helper@larderly.test');
    const response = await helper
      .patch(url(`/members/${await memberId('helper@larderly.test')}/preferences`))
      .send({ heatTolerance: 1, dietTags: ['low-salt'] });
    expect(response.status).toBe(200);
    expect(response.body.preferences).toMatchObject({ heatTolerance: 1, dietTags: ['low-salt'] });
  });

  it("lets a keeper set someone else's, but not a cook", async () => {
    const helperId = await memberId('helper@larderly.test');
    const keeper = await ctx.signedIn('keeper@larderly.test');
    expect((await keeper.patch(url(`/members/${helperId}/preferences`)).send({ heatTolerance: 2 })).status).toBe(200);
    const cook = await ctx.signedIn('cook@larderly.test');
    expect((await cook.patch(url(`/members/${helperId}/preferences`)).send({ heatTolerance: 5 })).status).toBe(403);
  });

  it('refuses a tolerance outside 0-5 and an unknown diet', async () => {
    const keeper = await ctx.signedIn('keeper@larderly.test');
    const response = await keeper
      .patch(url(`/members/${await memberId('keeper@larderly.test')}/preferences`))
      .send({ heatTolerance: 9, dietTags: ['paleo'] });
    expect(response.status).toBe(400);
    expect(Object.keys(response.body.error.fields).sort()).toEqual(['dietTags.0', 'heatTolerance']);
  });
});
