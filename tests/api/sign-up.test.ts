import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { passwordWork } from '../../server/auth/passwords';
import { LIMITS } from '../../shared/schemas/limits';
import { signUpByMail, signUpTokenFor } from '../support/accounts';
import { demoApp } from '../support/app';
import { startStandIns, type StandIns } from '../support/stand-ins';

let ctx: Awaited<ReturnType<typeof demoApp>>;
let standIns: StandIns;
beforeAll(async () => {
  standIns = await startStandIns();
  ctx = await demoApp({ ...standIns.env, APP_ORIGIN: 'http://larderly.example.test' });
});
afterAll(async () => {
  await ctx.close();
  await standIns.close();
});

const freshAddress = () => `pantry-${Math.random().toString(36).slice(2, 10)}@example.test`;
const attempt = (email: string) => ({
  email,
  password: 'long enough password',
  name: 'Copy Cat',
  householdName: 'Copy Cupboard',
});

describe('sign-up says nothing about which addresses have accounts', () => {
  it('answers a taken address exactly as a fresh one: same status, same body but the address, one password hash each', async () => {
    const fresh = freshAddress();
    const hashesBefore = passwordWork().jobs;
    const freshAnswer = await ctx.request.post('/api/auth/signup').send(attempt(fresh));
    const hashesBetween = passwordWork().jobs;
    const takenAnswer = await ctx.request.post('/api/auth/signup').send(attempt('Keeper@Larderly.test'));
    expect(freshAnswer.status).toBe(202);
    expect(takenAnswer.status).toBe(202);
    expect(takenAnswer.body).toEqual({
      ...freshAnswer.body,
      email: 'keeper@larderly.test',
      message: freshAnswer.body.message.replace(fresh, 'keeper@larderly.test'),
    });
    expect(freshAnswer.headers['set-cookie']).toBeUndefined();
    expect(takenAnswer.headers['set-cookie']).toBeUndefined();
    // The same work either way, so the time taken tells nothing either: one bcrypt hash per sign-up.
    expect(hashesBetween - hashesBefore).toBe(1);
    expect(passwordWork().jobs - hashesBetween).toBe(1);
  });

  it('mails the owner of a taken address that someone tried, with a sign-in link, and changes nothing of theirs', async () => {
    const before = standIns.mail.to('keeper@larderly.test').length;
    await ctx.request.post('/api/auth/signup').send(attempt('keeper@larderly.test'));
    const mails = standIns.mail.to('keeper@larderly.test');
    expect(mails.length).toBe(before + 1);
    const warning = mails.at(-1)!;
    expect(warning.subject).toBe('Someone tried to sign up on Larderly with your address');
    expect(warning.text).toContain('Hello Wren Calloway');
    expect(warning.text).toContain('http://larderly.example.test/sign-in');
    expect(warning.html).toContain('href="http://larderly.example.test/sign-in"');
    expect(warning.text).not.toMatch(/sign-up\/confirm/);
    // The demo password still works and no second household appeared.
    const keeper = await ctx.signedIn('keeper@larderly.test');
    expect((await keeper.get('/api/auth/me')).body.memberships).toEqual([
      { householdId: ctx.householdId, householdName: 'Calloway Hollow', role: 'keeper' },
    ]);
    expect(
      (
        await request(ctx.app)
          .post('/api/auth/login')
          .send({ email: 'keeper@larderly.test', password: 'long enough password' })
      ).status,
    ).toBe(401);
  });
});

describe('a fresh address confirms by the mailed link', () => {
  it('makes nothing until the link is used; the link makes the household with its keeper and signs them in', async () => {
    const email = freshAddress();
    const agent = request.agent(ctx.app);
    expect(
      (
        await agent.post('/api/auth/signup').send({
          email: email.toUpperCase(),
          password: 'long enough password',
          name: 'Rosa',
          householdName: 'Rosa’s Pantry',
        })
      ).status,
    ).toBe(202);
    expect((await agent.get('/api/auth/me')).status).toBe(401);
    expect(
      (await request(ctx.app).post('/api/auth/login').send({ email, password: 'long enough password' })).status,
    ).toBe(401);

    const mail = standIns.mail.to(email).at(-1)!;
    expect(mail.subject).toBe('Finish setting up Rosa’s Pantry on Larderly');
    const token = signUpTokenFor(standIns.mail, email);
    expect(mail.text).toContain(`http://larderly.example.test/sign-up/confirm/${token}`);
    expect(mail.html).toContain(`/sign-up/confirm/${token}`);
    const [stored] = (
      await ctx.sequelize.query(`SELECT token_hash FROM sign_up_requests WHERE email = '${email}'`)
    )[0] as { token_hash: string }[];
    expect(stored.token_hash).toMatch(/^[0-9a-f]{64}$/);
    expect(stored.token_hash).not.toContain(token);

    const confirmed = await agent.post(`/api/auth/signup/confirm/${token}`).send({});
    expect(confirmed.status).toBe(201);
    expect(confirmed.body.user).toMatchObject({ email, name: 'Rosa' });
    expect(confirmed.body.memberships).toEqual([
      { householdId: expect.any(String), householdName: 'Rosa’s Pantry', role: 'keeper' },
    ]);
    expect((await agent.get('/api/auth/me')).body.user.name).toBe('Rosa');
    expect(
      (await request(ctx.app).post('/api/auth/login').send({ email, password: 'long enough password' })).status,
    ).toBe(200);
  });

  it('uses a link once; a second use, or a made-up one, is refused with the way forward', async () => {
    const email = freshAddress();
    await signUpByMail(ctx.app, standIns.mail, { ...attempt(email) });
    const token = signUpTokenFor(standIns.mail, email);
    const again = await request(ctx.app).post(`/api/auth/signup/confirm/${token}`).send({});
    expect(again.status).toBe(410);
    expect(again.body.error.message).toMatch(/expired or was already used/);
    expect(
      (
        await request(ctx.app)
          .post(`/api/auth/signup/confirm/${'x'.repeat(43)}`)
          .send({})
      ).status,
    ).toBe(410);
  });

  it('refuses a link past its 24 hours, and the next sign-up clears the expired one away', async () => {
    const email = freshAddress();
    await ctx.request.post('/api/auth/signup').send(attempt(email));
    const token = signUpTokenFor(standIns.mail, email);
    await ctx.sequelize.query(
      `UPDATE sign_up_requests SET expires_at = now() - interval '1 minute' WHERE email = '${email}'`,
    );
    expect((await request(ctx.app).post(`/api/auth/signup/confirm/${token}`).send({})).status).toBe(410);
    await ctx.request.post('/api/auth/signup').send(attempt(freshAddress()));
    const [left] = await ctx.sequelize.query(
      `SELECT count(*)::int AS n FROM sign_up_requests WHERE email = '${email}'`,
    );
    expect((left as { n: number }[])[0].n).toBe(0);
  });

  it('accepts a name and household name at their limits (shared/schemas/limits.ts)', async () => {
    const email = freshAddress();
    const { me } = await signUpByMail(ctx.app, standIns.mail, {
      email,
      password: 'long enough password',
      name: 'N'.repeat(LIMITS.length.personName),
      householdName: 'H'.repeat(LIMITS.length.householdName),
    });
    expect(me.memberships[0].householdName).toBe('H'.repeat(LIMITS.length.householdName));
  });

  it('stores the password hashed with bcrypt at the configured cost, never in plain text', async () => {
    const email = freshAddress();
    await signUpByMail(ctx.app, standIns.mail, attempt(email));
    const [rows] = await ctx.sequelize.query(`SELECT password_hash FROM users WHERE email = '${email}'`);
    const hash = (rows as { password_hash: string }[])[0].password_hash;
    expect(hash).toMatch(/^\$2[aby]\$04\$/);
    expect(hash).not.toContain('long enough password');
  });
});

describe('sign-up input', () => {
  it('refuses a password shorter than 10 characters with a 400 that names the field', async () => {
    const response = await ctx.request
      .post('/api/auth/signup')
      .send({ email: 'short@example.test', password: 'short', name: 'S', householdName: 'H' });
    expect(response.status).toBe(400);
    expect(response.body.error.code).toBe('invalid_input');
    expect(response.body.error.fields.password).toMatch(/at least 10 characters/);
  });

  it('refuses a malformed e-mail and missing fields, naming each', async () => {
    const response = await ctx.request
      .post('/api/auth/signup')
      .send({ email: 'not-an-address', password: 'long enough password' });
    expect(response.status).toBe(400);
    expect(Object.keys(response.body.error.fields).sort()).toEqual(['email', 'householdName', 'name']);
  });
});
