import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { demoApp, DEMO_PASSWORD } from '../support/app';

let ctx: Awaited<ReturnType<typeof demoApp>>;
beforeAll(async () => {
  ctx = await demoApp();
});
afterAll(() => ctx.close());

describe('sign-in and sign-out', () => {
  it('signs in with the right password and sets an httpOnly, SameSite=Lax session cookie', async () => {
    const response = await ctx.request
      .post('/api/auth/login')
      .send({ email: 'keeper@larderly.test', password: DEMO_PASSWORD });
    expect(response.status).toBe(200);
    expect(response.body.user).toMatchObject({ email: 'keeper@larderly.test', name: 'Wren Calloway' });
    const cookie = String(response.headers['set-cookie']);
    expect(cookie).toMatch(/larderly\.sid=/);
    expect(cookie).toMatch(/HttpOnly/i);
    expect(cookie).toMatch(/SameSite=Lax/i);
  });

  it('gives the same 401 for a wrong password and for an unknown e-mail', async () => {
    const wrongPassword = await ctx.request
      .post('/api/auth/login')
      .send({ email: 'keeper@larderly.test', password: 'not the password' });
    const unknownEmail = await ctx.request
      .post('/api/auth/login')
      .send({ email: 'nobody@larderly.test', password: 'not the password' });
    expect(wrongPassword.status).toBe(401);
    expect(unknownEmail.status).toBe(401);
    expect(wrongPassword.body).toEqual(unknownEmail.body);
  });

  it('issues a new session id at sign-in', async () => {
    const agent = request.agent(ctx.app);
    await agent.post('/api/auth/login').send({ email: 'cook@larderly.test', password: DEMO_PASSWORD });
    const first = String(
      (await agent.post('/api/auth/login').send({ email: 'cook@larderly.test', password: DEMO_PASSWORD })).headers[
        'set-cookie'
      ],
    );
    const second = String(
      (await agent.post('/api/auth/login').send({ email: 'cook@larderly.test', password: DEMO_PASSWORD })).headers[
        'set-cookie'
      ],
    );
    expect(first.split(';')[0]).not.toBe(second.split(';')[0]);
  });

  it('keeps the session in PostgreSQL', async () => {
    const agent = await ctx.signedIn('helper@larderly.test');
    expect((await agent.get('/api/auth/me')).status).toBe(200);
    const [rows] = await ctx.sequelize.query(
      `SELECT count(*)::int AS n FROM sessions WHERE sess::text LIKE '%passport%'`,
    );
    expect((rows as { n: number }[])[0].n).toBeGreaterThan(0);
  });

  it('signs out with 204, after which /me answers 401', async () => {
    const agent = await ctx.signedIn('cook@larderly.test');
    expect((await agent.post('/api/auth/logout')).status).toBe(204);
    const me = await agent.get('/api/auth/me');
    expect(me.status).toBe(401);
    expect(me.body.error.code).toBe('signed_out');
  });

  it('lists every household of a person with the role held in each', async () => {
    const agent = await ctx.signedIn('keeper@larderly.test');
    const me = await agent.get('/api/auth/me');
    expect(me.body.memberships).toEqual([
      { householdId: ctx.householdId, householdName: 'Calloway Hollow', role: 'keeper' },
    ]);
  });
});

describe('the session cookie on household routes', () => {
  async function cookieOf(email: string) {
    const login = await ctx.request.post('/api/auth/login').send({ email, password: DEMO_PASSWORD });
    return String(login.headers['set-cookie']).split(';')[0]!;
  }
  const household = () => `/api/households/${ctx.householdId}`;

  it('answers 401 to the cookie of a session signed out or deleted, on the very next request', async () => {
    const cookie = await cookieOf('cook@larderly.test');
    expect((await ctx.request.get(household()).set('Cookie', cookie)).status).toBe(200);
    expect((await ctx.request.post('/api/auth/logout').set('Cookie', cookie)).status).toBe(204);
    const after = await ctx.request.get(household()).set('Cookie', cookie);
    expect(after.status).toBe(401);
    expect(after.body.error.code).toBe('signed_out');

    const other = await cookieOf('helper@larderly.test');
    expect((await ctx.request.get(household()).set('Cookie', other)).status).toBe(200);
    const sid = decodeURIComponent(other.split('=')[1]!).slice(2).split('.')[0];
    await ctx.sequelize.query('DELETE FROM sessions WHERE sid = :sid', { replacements: { sid } });
    expect((await ctx.request.get(household()).set('Cookie', other)).status).toBe(401);
  });

  it('is no sign-in when its signature does not match, and only the first cookie of the name counts', async () => {
    const cookie = await cookieOf('keeper@larderly.test');
    const value = decodeURIComponent(cookie.split('=')[1]!);
    const last = value.at(-1) === 'A' ? 'B' : 'A';
    const forged = `larderly.sid=${encodeURIComponent(value.slice(0, -1) + last)}`;
    expect((await ctx.request.get(household()).set('Cookie', forged)).status).toBe(401);
    expect((await ctx.request.get('/api/auth/me').set('Cookie', forged)).status).toBe(401);
    // Unsigned, the bare id is not taken either (express-session's rule: only a signed `s:` value).
    const bare = `larderly.sid=${value.slice(2).split('.')[0]}`;
    expect((await ctx.request.get(household()).set('Cookie', bare)).status).toBe(401);
    expect((await ctx.request.get(household()).set('Cookie', `${forged}; ${cookie}`)).status).toBe(401);
    expect((await ctx.request.get(household()).set('Cookie', `${cookie}; ${forged}`)).status).toBe(200);
  });

  it('answers 404 for a household the signed-in person does not belong to', async () => {
    const cookie = await cookieOf('keeper@larderly.test');
    const away = await ctx.request.get(`/api/households/${ctx.neighbourHouseholdId}`).set('Cookie', cookie);
    expect(away.status).toBe(404);
  });
});

describe('requests from another site', () => {
  it('refuses a cross-origin POST with 403', async () => {
    const response = await ctx.request
      .post('/api/auth/login')
      .set('Origin', 'https://elsewhere.example')
      .send({ email: 'keeper@larderly.test', password: DEMO_PASSWORD });
    expect(response.status).toBe(403);
    expect(response.body.error.code).toBe('forbidden');
  });

  it('refuses a cross-site PATCH even with a valid session', async () => {
    const agent = await ctx.signedIn('keeper@larderly.test');
    const response = await agent
      .patch(`/api/households/${ctx.householdId}`)
      .set('Origin', 'https://elsewhere.example')
      .send({ name: 'Taken over' });
    expect(response.status).toBe(403);
    const after = await agent.get(`/api/households/${ctx.householdId}`);
    expect(after.body.household.name).toBe('Calloway Hollow');
  });

  it('accepts a POST whose Origin is the app itself on its loopback address (APP_ORIGIN unset)', async () => {
    const response = await ctx.request
      .post('/api/auth/login')
      .set('Host', '127.0.0.1:3000')
      .set('Origin', 'http://127.0.0.1:3000')
      .send({ email: 'keeper@larderly.test', password: DEMO_PASSWORD });
    expect(response.status).toBe(200);
  });
});
