import { mkdtempSync, rmSync } from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { passwordWork } from '../../server/auth/passwords';
import { Invitation } from '../../server/db/models';
import { bareApp } from '../support/bare-app';
import { newHousehold } from '../support/opened-jar';
import { listRoutes } from '../support/routes';
import { startStandIns, type StandIns } from '../support/stand-ins';

let ctx: ReturnType<typeof bareApp>;
let standIns: StandIns;
let catcherDir: string;
beforeAll(async () => {
  catcherDir = mkdtempSync(path.join(os.tmpdir(), 'larderly-invitations-'));
  standIns = await startStandIns(catcherDir);
  ctx = bareApp({
    ...standIns.env,
    APP_ORIGIN: 'http://larderly.example.test',
    MAIL_CATCHER_DIR: path.join(catcherDir, 'mail'),
  });
});
afterAll(async () => {
  await ctx.close();
  await standIns.close();
  rmSync(catcherDir, { recursive: true, force: true });
});

/** The token from the link in the last invitation e-mail to `email`. */
function linkTokenFor(email: string) {
  const mail = standIns.mail.to(email).at(-1);
  const token = /http:\/\/larderly\.example\.test\/invite\/([A-Za-z0-9_-]+)/.exec(mail?.text ?? '')?.[1];
  if (!token) throw new Error(`no invitation link was mailed to ${email}`);
  expect(mail!.html).toContain(`/invite/${token}`);
  return token;
}

const freshAddress = () => `guest-${Math.random().toString(36).slice(2, 10)}@example.test`;

describe('invitations', () => {
  it('e-mails a single-use link; a new person joins with it once, and a second use is refused', async () => {
    const keeper = await newHousehold(ctx.app, 'UTC');
    const email = freshAddress();
    const invited = await keeper.agent
      .post(`/api/households/${keeper.householdId}/invitations`)
      .send({ email, role: 'cook' });
    expect(invited.status).toBe(201);
    expect(invited.body.invitation).toMatchObject({ email, role: 'cook', invitedBy: 'Ada Fenwick' });
    const token = linkTokenFor(email);
    expect(standIns.mail.to(email)[0].subject).toMatch(/Fenwick Cellar/);

    const stored = await Invitation.findByPk(invited.body.invitation.id);
    expect(stored!.tokenHash).not.toContain(token);
    expect(stored!.tokenHash).toMatch(/^[0-9a-f]{64}$/);

    const newcomer = request.agent(ctx.app);
    const accepted = await newcomer
      .post(`/api/invitations/${token}/accept`)
      .send({ name: 'Bram Ostler', password: 'elderflower cordial' });
    expect(accepted.status).toBe(200);
    expect(accepted.body.invitation).toMatchObject({
      householdId: keeper.householdId,
      role: 'cook',
      householdName: 'Fenwick Cellar',
    });
    const me = await newcomer.get('/api/auth/me');
    expect(me.body.user.email).toBe(email);
    expect(me.body.memberships).toEqual([
      { householdId: keeper.householdId, householdName: 'Fenwick Cellar', role: 'cook' },
    ]);

    const again = await request
      .agent(ctx.app)
      .post(`/api/invitations/${token}/accept`)
      .send({ name: 'Someone Else', password: 'another password' });
    expect(again.status).toBe(410);
    expect(again.body.error.message).toMatch(/already been used/);
    expect((await keeper.agent.get(`/api/households/${keeper.householdId}/invitations`)).body.invitations).toEqual([]);
  });

  it('lets an existing person sign in and join with the role of the invitation', async () => {
    const keeper = await newHousehold(ctx.app, 'UTC');
    const other = await newHousehold(ctx.app, 'UTC');
    await keeper.agent
      .post(`/api/households/${keeper.householdId}/invitations`)
      .send({ email: other.email.toUpperCase(), role: 'helper' });
    const signedOut = await request(ctx.app)
      .post(`/api/invitations/${linkTokenFor(other.email)}/accept`)
      .send({});
    expect(signedOut.status).toBe(401);
    const joined = await other.agent.post(`/api/invitations/${linkTokenFor(other.email)}/accept`).send({});
    expect(joined.status).toBe(200);
    const memberships = (await other.agent.get('/api/auth/me')).body.memberships;
    expect(memberships.map((m: { role: string }) => m.role)).toEqual(['keeper', 'helper']);
  });

  it('refuses an expired invitation with a clear message', async () => {
    const keeper = await newHousehold(ctx.app, 'UTC');
    const email = freshAddress();
    const invited = await keeper.agent
      .post(`/api/households/${keeper.householdId}/invitations`)
      .send({ email, role: 'helper' });
    const token = linkTokenFor(email);
    await Invitation.update(
      { expiresAt: new Date(Date.now() - 60_000) },
      { where: { id: invited.body.invitation.id } },
    );
    const response = await request(ctx.app)
      .post(`/api/invitations/${token}/accept`)
      .send({ name: 'Late Guest', password: 'rhubarb season' });
    expect(response.status).toBe(410);
    expect(response.body.error.message).toMatch(/^This invitation expired on \d{4}-\d{2}-\d{2}\. Ask a keeper/);
  });

  it('expires 7 days after it is sent', async () => {
    const keeper = await newHousehold(ctx.app, 'UTC');
    const before = Date.now();
    const invited = await keeper.agent
      .post(`/api/households/${keeper.householdId}/invitations`)
      .send({ email: freshAddress(), role: 'cook' });
    const days = (Date.parse(invited.body.invitation.expiresAt) - before) / 86_400_000;
    expect(days).toBeGreaterThan(6.99);
    expect(days).toBeLessThan(7.01);
  });

  it('does not let a helper invite (403), nor a cook', async () => {
    const keeper = await newHousehold(ctx.app, 'UTC');
    for (const role of ['helper', 'cook'] as const) {
      const member = await newHousehold(ctx.app, 'UTC');
      await keeper.agent.post(`/api/households/${keeper.householdId}/invitations`).send({ email: member.email, role });
      await member.agent.post(`/api/invitations/${linkTokenFor(member.email)}/accept`).send({});
      const sent = standIns.mail.messages.length;
      const response = await member.agent
        .post(`/api/households/${keeper.householdId}/invitations`)
        .send({ email: freshAddress(), role: 'keeper' });
      expect(response.status).toBe(403);
      expect(standIns.mail.messages.length).toBe(sent);
    }
  });

  it('shows the keeper pending invitations and lets them revoke one, whose link then fails', async () => {
    const keeper = await newHousehold(ctx.app, 'UTC');
    const email = freshAddress();
    const invited = await keeper.agent
      .post(`/api/households/${keeper.householdId}/invitations`)
      .send({ email, role: 'cook' });
    const pending = await keeper.agent.get(`/api/households/${keeper.householdId}/invitations`);
    expect(pending.body.invitations.map((i: { email: string }) => i.email)).toEqual([email]);
    expect(
      (await keeper.agent.delete(`/api/households/${keeper.householdId}/invitations/${invited.body.invitation.id}`))
        .status,
    ).toBe(204);
    expect((await keeper.agent.get(`/api/households/${keeper.householdId}/invitations`)).body.invitations).toEqual([]);
    const response = await request(ctx.app)
      .post(`/api/invitations/${linkTokenFor(email)}/accept`)
      .send({ name: 'Withdrawn Guest', password: 'plum butter forever' });
    expect(response.status).toBe(410);
    expect(response.body.error.message).toMatch(/withdrawn/);
  });

  it("answers another household's keeper 404, and refuses to invite someone already in the household", async () => {
    const keeper = await newHousehold(ctx.app, 'UTC');
    const stranger = await newHousehold(ctx.app, 'UTC');
    expect((await stranger.agent.get(`/api/households/${keeper.householdId}/invitations`)).status).toBe(404);
    expect(
      (
        await stranger.agent
          .post(`/api/households/${keeper.householdId}/invitations`)
          .send({ email: freshAddress(), role: 'cook' })
      ).status,
    ).toBe(404);
    const self = await keeper.agent
      .post(`/api/households/${keeper.householdId}/invitations`)
      .send({ email: keeper.email, role: 'cook' });
    expect(self.status).toBe(409);
  });

  it('answers 404 for a made-up token', async () => {
    const response = await request(ctx.app)
      .post(`/api/invitations/${'x'.repeat(43)}/accept`)
      .send({ name: 'Nobody', password: 'not a real link' });
    expect(response.status).toBe(404);
    expect(response.body.error.message).toMatch(/not valid/);
  });

  it('refuses a signed-in account whose address is not the invited one, unless it confirms, and then tells the keepers', async () => {
    const keeper = await newHousehold(ctx.app, 'UTC');
    const invitedEmail = freshAddress();
    await keeper.agent
      .post(`/api/households/${keeper.householdId}/invitations`)
      .send({ email: invitedEmail, role: 'cook' });
    const token = linkTokenFor(invitedEmail);
    const stranger = await newHousehold(ctx.app, 'UTC');

    const refused = await stranger.agent.post(`/api/invitations/${token}/accept`).send({});
    expect(refused.status).toBe(409);
    expect(refused.body.error.message).toContain(`sent to ${invitedEmail}`);
    expect((await stranger.agent.get('/api/auth/me')).body.memberships).toHaveLength(1);
    expect((await keeper.agent.get(`/api/households/${keeper.householdId}/members`)).body.members).toHaveLength(1);

    const confirmed = await stranger.agent.post(`/api/invitations/${token}/accept`).send({ confirmOtherAddress: true });
    expect(confirmed.status).toBe(200);
    expect(
      (await stranger.agent.get('/api/auth/me')).body.memberships.map((m: { householdId: string }) => m.householdId),
    ).toContain(keeper.householdId);
    const note = standIns.mail.to(keeper.email).at(-1);
    expect(note?.subject).toBe(`Ada Fenwick joined Fenwick Cellar with an invitation sent to ${invitedEmail}`);
    expect(note?.text).toContain(stranger.email);
  });

  it('looks the token up before hashing a password: a made-up link costs no hash', async () => {
    const before = passwordWork().jobs;
    const responses = await Promise.all(
      Array.from({ length: 4 }, (_, i) =>
        request(ctx.app)
          .post(`/api/invitations/${'m'.repeat(40)}${i}/accept`)
          .send({ name: 'Nobody', password: 'not a real link at all' }),
      ),
    );
    expect(responses.map((r) => r.status)).toEqual([404, 404, 404, 404]);
    expect(passwordWork().jobs).toBe(before);
  });

  it('shows the invitation page who invited whom, to which household, and that a used link is used', async () => {
    const keeper = await newHousehold(ctx.app, 'UTC');
    const email = freshAddress();
    await keeper.agent.post(`/api/households/${keeper.householdId}/invitations`).send({ email, role: 'helper' });
    const token = linkTokenFor(email);
    const pending = await request(ctx.app).get(`/api/invitations/${token}`);
    expect(pending.status).toBe(200);
    expect(pending.body.invitation).toMatchObject({
      householdName: 'Fenwick Cellar',
      inviterName: 'Ada Fenwick',
      email,
      role: 'helper',
      state: 'pending',
      message: null,
    });
    await request
      .agent(ctx.app)
      .post(`/api/invitations/${token}/accept`)
      .send({ name: 'Tam Reed', password: 'quince and honey' });
    const used = await request(ctx.app).get(`/api/invitations/${token}`);
    expect(used.body.invitation).toMatchObject({ state: 'used', message: expect.stringMatching(/already been used/) });
    expect((await request(ctx.app).get(`/api/invitations/${'z'.repeat(43)}`)).status).toBe(404);
  });

  it("shows a keeper only the caught mail of the household's members and their own, never another household's invitation", async () => {
    const keeper = await newHousehold(ctx.app, 'UTC');
    const outsider = await newHousehold(ctx.app, 'UTC');
    const invitedElsewhere = freshAddress();
    await keeper.agent
      .post(`/api/households/${keeper.householdId}/invitations`)
      .send({ email: invitedElsewhere, role: 'cook' });
    await outsider.agent
      .post(`/api/households/${outsider.householdId}/invitations`)
      .send({ email: keeper.email, role: 'helper' });
    const seen = await outsider.agent.get(`/api/households/${outsider.householdId}/dev/mail`);
    expect(seen.status).toBe(200);
    const recipients = seen.body.messages.flatMap((m: { to: string[] }) => m.to);
    expect(recipients).not.toContain(invitedElsewhere);
    expect(recipients.every((to: string) => to === outsider.email)).toBe(true);
    const own = await keeper.agent.get(`/api/households/${keeper.householdId}/dev/mail`);
    expect(own.body.messages.map((m: { to: string[] }) => m.to[0])).toContain(keeper.email);
    expect(own.body.messages.map((m: { to: string[] }) => m.to[0])).not.toContain(invitedElsewhere);
  });

  it('has no development mailbox route at all in production', () => {
    const production = bareApp({
      NODE_ENV: 'production',
      SESSION_SECRET: 'a'.repeat(40),
      MAIL_CATCHER_DIR: path.join(catcherDir, 'mail'),
    });
    try {
      const paths = listRoutes(production.app).map((r) => r.path);
      expect(paths.some((p) => p.endsWith('/dev/mail'))).toBe(false);
      expect(listRoutes(ctx.app).some((r) => r.path.endsWith('/dev/mail'))).toBe(true);
    } finally {
      void production.close();
    }
  });

  it('lists caught mail to a keeper on the development mailbox page, and refuses a helper', async () => {
    const keeper = await newHousehold(ctx.app, 'UTC');
    const helper = await newHousehold(ctx.app, 'UTC');
    await keeper.agent
      .post(`/api/households/${keeper.householdId}/invitations`)
      .send({ email: helper.email, role: 'helper' });
    await helper.agent.post(`/api/invitations/${linkTokenFor(helper.email)}/accept`).send({});
    const mailbox = await keeper.agent.get(`/api/households/${keeper.householdId}/dev/mail`);
    expect(mailbox.status).toBe(200);
    expect(mailbox.body.messages.map((m: { to: string[] }) => m.to[0])).toContain(helper.email);
    expect((await helper.agent.get(`/api/households/${keeper.householdId}/dev/mail`)).status).toBe(403);
  });
});

describe('invitation limits', () => {
  it('limits invitations per person (30 a day) and per invited address (5 a day), each e-mail counted', async () => {
    const keeper = await newHousehold(ctx.app, 'UTC');
    const invite = (email: string) =>
      keeper.agent.post(`/api/households/${keeper.householdId}/invitations`).send({ email, role: 'helper' });
    const sameAddress: number[] = [];
    for (let i = 0; i < 6; i += 1) sameAddress.push((await invite('twice.asked@example.test')).status);
    expect(sameAddress).toEqual([201, 201, 201, 201, 201, 429]);
    const others: number[] = [];
    for (let i = 0; i < 25; i += 1) others.push((await invite(`guest-${i}@example.test`)).status);
    // The refused sixth counts against the person too: 5 + 1 + 24 reach the 30 of a day.
    expect(others.slice(0, 24).every((status) => status === 201)).toBe(true);
    expect(others[24]).toBe(429);
    const last = await invite('still-more@example.test');
    expect(last.status).toBe(429);
    expect(last.body.error.message).toBe('Too many invitations today. Wait 24 hours, then try again.');
  });
});
