import type { Express } from 'express';
import request, { type Agent } from 'supertest';
import { hashPassword } from '../../server/auth/passwords';
import { User } from '../../server/db/models';
import { createAccount } from '../../server/services/accounts';
import type { MailCatcher } from '../../dev/stand-ins/mail-catcher';
import type { MeResponse } from '../../shared/schemas/auth';

export interface NewAccount {
  email: string;
  password: string;
  name: string;
  householdName: string;
}

/** The token of the newest sign-up link mailed to `email`. */
export function signUpTokenFor(mail: MailCatcher, email: string) {
  const token = /\/sign-up\/confirm\/([A-Za-z0-9_-]+)/.exec(mail.to(email).at(-1)?.text ?? '')?.[1];
  if (!token) throw new Error(`no sign-up link was mailed to ${email}`);
  return token;
}

/** Signs up the way a person does: the form, then the link from the mail; the agent ends signed in. */
export async function signUpByMail(app: Express, mail: MailCatcher, account: NewAccount) {
  const agent: Agent = request.agent(app);
  const sent = await agent.post('/api/auth/signup').send(account);
  if (sent.status !== 202) throw new Error(`sign-up failed: ${sent.status} ${JSON.stringify(sent.body)}`);
  const confirmed = await agent.post(`/api/auth/signup/confirm/${signUpTokenFor(mail, account.email)}`).send({});
  if (confirmed.status !== 201)
    throw new Error(`sign-up link failed: ${confirmed.status} ${JSON.stringify(confirmed.body)}`);
  return { agent, me: confirmed.body as MeResponse };
}

/** A confirmed account and household made directly, for tests about what comes after sign-up; then signed in. */
export async function accountSignedIn(app: Express, account: NewAccount) {
  const passwordHash = await hashPassword(account.password, 4);
  await User.sequelize!.transaction((transaction) =>
    createAccount({ ...account, email: account.email.toLowerCase(), passwordHash }, transaction),
  );
  const agent: Agent = request.agent(app);
  const login = await agent.post('/api/auth/login').send({ email: account.email, password: account.password });
  if (login.status !== 200) throw new Error(`sign-in failed: ${login.status} ${JSON.stringify(login.body)}`);
  const me = await agent.get('/api/auth/me');
  return { agent, me: me.body as MeResponse };
}
