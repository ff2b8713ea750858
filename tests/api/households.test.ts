import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { demoApp } from '../support/app';

let ctx: Awaited<ReturnType<typeof demoApp>>;
beforeAll(async () => {
  ctx = await demoApp();
});
afterAll(() => ctx.close());

describe('reading a household', () => {
  it('shows a member the household with their role', async () => {
    const helper = await ctx.signedIn('helper@larderly.test');
    const response = await helper.get(`/api/households/${ctx.householdId}`);
    expect(response.status).toBe(200);
    expect(response.body.household).toMatchObject({ name: 'Calloway Hollow', altitudeFt: 2350, role: 'helper' });
  });

  it('lists the members with their roles', async () => {
    const cook = await ctx.signedIn('cook@larderly.test');
    const response = await cook.get(`/api/households/${ctx.householdId}/members`);
    expect(response.status).toBe(200);
    expect(response.body.members.map((m: { email: string; role: string }) => [m.email, m.role])).toEqual([
      ['keeper@larderly.test', 'keeper'],
      ['cook@larderly.test', 'cook'],
      ['helper@larderly.test', 'helper'],
    ]);
  });

  it("gives the neighbour's keeper 404 for the first household and its members, never the data", async () => {
    const neighbour = await ctx.signedIn('neighbor@larderly.test');
    for (const path of ['', '/members']) {
      const response = await neighbour.get(`/api/households/${ctx.householdId}${path}`);
      expect(response.status).toBe(404);
      expect(JSON.stringify(response.body)).not.toMatch(/Calloway|larderly\.test/);
    }
  });

  it('answers 404 for a household id that is not a UUID', async () => {
    const keeper = await ctx.signedIn('keeper@larderly.test');
    expect((await keeper.get('/api/households/1')).status).toBe(404);
  });

  it('answers 401 when signed out', async () => {
    const response = await ctx.request.get(`/api/households/${ctx.householdId}`);
    expect(response.status).toBe(401);
    expect(response.body.error.code).toBe('signed_out');
  });
});

describe('changing household settings', () => {
  it('lets the keeper change name, altitude, units and time zone', async () => {
    const keeper = await ctx.signedIn('keeper@larderly.test');
    const response = await keeper
      .patch(`/api/households/${ctx.householdId}`)
      .send({ name: 'Calloway Hollow', altitudeFt: 3100, unitSystem: 'metric', timeZone: 'America/Denver' });
    expect(response.status).toBe(200);
    expect(response.body.household).toMatchObject({
      altitudeFt: 3100,
      unitSystem: 'metric',
      timeZone: 'America/Denver',
    });
    await keeper
      .patch(`/api/households/${ctx.householdId}`)
      .send({ altitudeFt: 2350, unitSystem: 'us', timeZone: 'America/New_York' });
  });

  it("refuses a helper's PATCH with 403 and changes nothing", async () => {
    const helper = await ctx.signedIn('helper@larderly.test');
    const response = await helper.patch(`/api/households/${ctx.householdId}`).send({ altitudeFt: 9000 });
    expect(response.status).toBe(403);
    expect(response.body.error.code).toBe('forbidden');
    expect((await helper.get(`/api/households/${ctx.householdId}`)).body.household.altitudeFt).toBe(2350);
  });

  it("refuses a cook's PATCH with 403", async () => {
    const cook = await ctx.signedIn('cook@larderly.test');
    expect((await cook.patch(`/api/households/${ctx.householdId}`).send({ name: 'Cook’s' })).status).toBe(403);
  });

  it("answers the neighbour's keeper 404 on PATCH", async () => {
    const neighbour = await ctx.signedIn('neighbor@larderly.test');
    expect((await neighbour.patch(`/api/households/${ctx.householdId}`).send({ name: 'Mine now' })).status).toBe(404);
  });

  it('refuses invalid settings with 400 naming each field', async () => {
    const keeper = await ctx.signedIn('keeper@larderly.test');
    const response = await keeper
      .patch(`/api/households/${ctx.householdId}`)
      .send({ altitudeFt: 'high', timeZone: 'Mars/Olympus', unitSystem: 'cubits' });
    expect(response.status).toBe(400);
    expect(Object.keys(response.body.error.fields).sort()).toEqual(['altitudeFt', 'timeZone', 'unitSystem']);
  });

  it('refuses unknown fields instead of ignoring them', async () => {
    const keeper = await ctx.signedIn('keeper@larderly.test');
    const response = await keeper.patch(`/api/households/${ctx.householdId}`).send({ id: 'someone-else' });
    expect(response.status).toBe(400);
  });
});

describe('roles', () => {
  async function memberId(email: string) {
    const keeper = await ctx.signedIn('keeper@larderly.test');
    const members = (await keeper.get(`/api/households/${ctx.householdId}/members`)).body.members as {
      userId: string;
      email: string;
    }[];
    return members.find((m) => m.email === email)!.userId;
  }

  it('lets the keeper change a role', async () => {
    const keeper = await ctx.signedIn('keeper@larderly.test');
    const helperId = await memberId('helper@larderly.test');
    const response = await keeper
      .patch(`/api/households/${ctx.householdId}/members/${helperId}`)
      .send({ role: 'cook' });
    expect(response.status).toBe(200);
    expect(response.body.members.find((m: { userId: string }) => m.userId === helperId).role).toBe('cook');
    await keeper.patch(`/api/households/${ctx.householdId}/members/${helperId}`).send({ role: 'helper' });
  });

  it('keeps at least one keeper: the last keeper cannot step down (409)', async () => {
    const keeper = await ctx.signedIn('keeper@larderly.test');
    const keeperId = await memberId('keeper@larderly.test');
    const response = await keeper
      .patch(`/api/households/${ctx.householdId}/members/${keeperId}`)
      .send({ role: 'cook' });
    expect(response.status).toBe(409);
    expect(response.body.error.message).toMatch(/at least one keeper/);
  });

  it('refuses a cook changing roles with 403', async () => {
    const cook = await ctx.signedIn('cook@larderly.test');
    const helperId = await memberId('helper@larderly.test');
    expect(
      (await cook.patch(`/api/households/${ctx.householdId}/members/${helperId}`).send({ role: 'keeper' })).status,
    ).toBe(403);
  });

  it('answers 404 for a person who is not a member', async () => {
    const keeper = await ctx.signedIn('keeper@larderly.test');
    const response = await keeper
      .patch(`/api/households/${ctx.householdId}/members/00000000-0000-4000-8000-000000000000`)
      .send({ role: 'cook' });
    expect(response.status).toBe(404);
  });

  it('refuses an unknown role with 400', async () => {
    const keeper = await ctx.signedIn('keeper@larderly.test');
    const helperId = await memberId('helper@larderly.test');
    const response = await keeper
      .patch(`/api/households/${ctx.householdId}/members/${helperId}`)
      .send({ role: 'owner' });
    expect(response.status).toBe(400);
    expect(response.body.error.fields.role).toBeDefined();
  });
});

describe('error shape', () => {
  it('answers unknown API paths with a JSON 404', async () => {
    const response = await ctx.request.get('/api/no-such-thing');
    expect(response.status).toBe(404);
    expect(response.body.error).toMatchObject({ code: 'not_found', message: expect.any(String) });
  });

  it('answers malformed JSON with a 400 in the same shape', async () => {
    const response = await ctx.request
      .post('/api/auth/login')
      .set('Content-Type', 'application/json')
      .send('{"email":');
    expect(response.status).toBe(400);
    expect(response.body.error.code).toBe('invalid_input');
  });
});
