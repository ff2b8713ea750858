import { randomBytes } from 'node:crypto';
import { Op, UniqueConstraintError, type Sequelize, type Transaction } from 'sequelize';
import { paths } from '../../shared/paths';
import type { MeResponse, SignupBody, SignUpSent } from '../../shared/schemas/auth';
import { hashPassword } from '../auth/passwords';
import type { AppContext } from '../context';
import { Household, Membership, SignUpRequest, User } from '../db/models';
import { AppError, conflict } from '../http/errors';
import { clock } from './clock';
import { hashToken } from './invitations';
import { confirmSignUpMail, signUpWithTakenAddressMail } from './mail/sign-up-mail';

const LINK_HOURS = 24;

/** The one answer to every sign-up, whether or not the address already has an account. */
export const signUpSent = (email: string): SignUpSent => ({
  email,
  message: `Check ${email}: we sent a link to finish creating your household. It works for ${LINK_HOURS} hours.`,
});

/**
 * Mails a link that makes the account, or, when the address already has one, tells its owner that someone tried.
 * Both ways hash the password and send one e-mail, so the answer and its timing say nothing about the address.
 */
export async function requestSignUp(
  ctx: Pick<AppContext, 'config' | 'mailer'>,
  input: SignupBody,
): Promise<SignUpSent> {
  const passwordHash = await hashPassword(input.password, ctx.config.bcryptCost);
  if (!ctx.mailer.enabled)
    throw new AppError(
      503,
      'internal',
      'E-mail is not set up on this server, so sign-up cannot send its link. Ask whoever runs Larderly to set SMTP_HOST.',
    );
  // Expired links go on every sign-up, either way, so the table holds only the last day's.
  await SignUpRequest.destroy({ where: { expiresAt: { [Op.lte]: clock.now() } } });
  const owner = await User.findOne({ where: { email: input.email } });
  let request: SignUpRequest | null = null;
  let mail;
  if (owner) {
    mail = signUpWithTakenAddressMail({
      to: owner.email,
      name: owner.name,
      signInLink: `${ctx.config.publicOrigin}${paths.signIn()}`,
    });
  } else {
    const token = randomBytes(32).toString('base64url');
    const expiresAt = new Date(clock.now().getTime() + LINK_HOURS * 60 * 60 * 1000);
    request = await SignUpRequest.create({
      email: input.email,
      name: input.name,
      householdName: input.householdName,
      passwordHash,
      tokenHash: hashToken(token),
      expiresAt,
    });
    mail = confirmSignUpMail({
      to: input.email,
      name: input.name,
      householdName: input.householdName,
      link: `${ctx.config.publicOrigin}${paths.signUpConfirm(token)}`,
      expiresOn: expiresAt.toISOString().slice(0, 10),
    });
  }
  try {
    await ctx.mailer.send(mail);
  } catch (error) {
    await request?.destroy();
    throw new AppError(
      502,
      'internal',
      `The sign-up e-mail could not be sent (${(error as Error).message}). Nothing was saved; try again later.`,
    );
  }
  return signUpSent(input.email);
}

/** The person and their household, with them as its keeper, inside the caller's transaction. */
export async function createAccount(
  input: { email: string; name: string; householdName: string; passwordHash: string },
  transaction: Transaction,
) {
  const user = await User.create(
    { email: input.email, name: input.name, passwordHash: input.passwordHash },
    { transaction },
  );
  const household = await Household.create({ name: input.householdName }, { transaction });
  await Membership.create({ householdId: household.id, userId: user.id, role: 'keeper' }, { transaction });
  return user.toPublic();
}

const EXPIRED =
  'This sign-up link has expired or was already used. Sign up again for a new one, or sign in if you finished already.';

/** Uses a mailed sign-up link once: the account and household are made, and every other pending link for that address ends. */
export async function confirmSignUp(sequelize: Sequelize, token: string) {
  try {
    return await sequelize.transaction(async (transaction) => {
      const request = await SignUpRequest.findOne({
        where: { tokenHash: hashToken(token), expiresAt: { [Op.gt]: clock.now() } },
        transaction,
        lock: transaction.LOCK.UPDATE,
      });
      if (!request) throw new AppError(410, 'not_allowed', EXPIRED);
      await SignUpRequest.destroy({ where: { email: request.email }, transaction });
      if (await User.findOne({ where: { email: request.email }, transaction })) {
        throw conflict(`${request.email} already has an account. Sign in with it instead.`);
      }
      return await createAccount(request, transaction);
    });
  } catch (error) {
    if (error instanceof UniqueConstraintError)
      throw conflict('That address already has an account. Sign in with it instead.');
    throw error;
  }
}

export async function describeMe(user: Express.User): Promise<MeResponse> {
  const memberships = await Membership.findAll({
    where: { userId: user.id },
    include: [{ model: Household, as: 'household', required: true }],
    order: [['createdAt', 'ASC']],
  });
  return {
    user: { id: user.id, email: user.email, name: user.name },
    memberships: memberships.map((m) => ({
      householdId: m.householdId,
      householdName: m.household!.name,
      role: m.role,
    })),
  };
}
