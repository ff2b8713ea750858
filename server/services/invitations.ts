import { createHash, randomBytes } from 'node:crypto';
import { Op, UniqueConstraintError } from 'sequelize';
import type {
  AcceptedInvitation,
  InvitationBody,
  InvitationPreview,
  InvitationView,
} from '../../shared/schemas/invitations';
import { hashPassword } from '../auth/passwords';
import type { AppContext } from '../context';
import { Household, Invitation, Membership, User } from '../db/models';
import { AppError, conflict, notFound } from '../http/errors';
import { clock } from './clock';
import { invitationMail, invitationUsedElsewhereMail } from './mail/invitation-mail';
import { paths } from '../../shared/paths';

export const INVITATION_DAYS = 7;

export const hashToken = (token: string) => createHash('sha256').update(token).digest('hex');

function view(invitation: Invitation, inviterName: string | null): InvitationView {
  return {
    id: invitation.id,
    email: invitation.email,
    role: invitation.role,
    invitedBy: inviterName,
    expiresAt: invitation.expiresAt.toISOString(),
    createdAt: invitation.createdAt.toISOString(),
  };
}

export async function listPending(householdId: string): Promise<InvitationView[]> {
  const pending = await Invitation.findAll({
    where: { householdId, acceptedAt: null, revokedAt: null, expiresAt: { [Op.gt]: clock.now() } },
    order: [['createdAt', 'ASC']],
  });
  const inviters = new Map(
    (await User.findAll({ where: { id: pending.flatMap((i) => (i.invitedBy ? [i.invitedBy] : [])) } })).map((u) => [
      u.id,
      u.name,
    ]),
  );
  return pending.map((i) => view(i, i.invitedBy ? (inviters.get(i.invitedBy) ?? null) : null));
}

/** Records the invitation and e-mails its single-use link; the link's token is never stored. */
export async function invite(
  ctx: Pick<AppContext, 'config' | 'mailer'>,
  household: Household,
  inviter: Express.User,
  input: InvitationBody,
) {
  const alreadyMember = await Membership.count({
    where: { householdId: household.id },
    include: [{ model: User, as: 'user', where: { email: input.email }, required: true }],
  });
  if (alreadyMember) throw conflict(`${input.email} already belongs to ${household.name}.`);
  if (!ctx.mailer.enabled)
    throw new AppError(
      503,
      'internal',
      'E-mail is not set up on this server, so the invitation could not be sent. Ask whoever runs Larderly to set SMTP_HOST.',
    );
  const token = randomBytes(32).toString('base64url');
  const expiresAt = new Date(clock.now().getTime() + INVITATION_DAYS * 24 * 60 * 60 * 1000);
  const invitation = await Invitation.create({
    householdId: household.id,
    email: input.email,
    role: input.role,
    tokenHash: hashToken(token),
    invitedBy: inviter.id,
    expiresAt,
  });
  try {
    await ctx.mailer.send(
      invitationMail({
        to: input.email,
        householdName: household.name,
        inviterName: inviter.name,
        role: input.role,
        link: `${ctx.config.publicOrigin}${paths.invitation(token)}`,
        expiresOn: expiresAt.toISOString().slice(0, 10),
      }),
    );
  } catch (error) {
    await invitation.destroy();
    throw new AppError(
      502,
      'internal',
      `The invitation e-mail could not be sent (${(error as Error).message}). Nothing was saved; try again later.`,
    );
  }
  return view(invitation, inviter.name);
}

export async function revoke(householdId: string, invitationId: string) {
  const [count] = await Invitation.update(
    { revokedAt: clock.now() },
    { where: { id: invitationId, householdId, acceptedAt: null, revokedAt: null } },
  );
  if (count === 0) throw notFound('That pending invitation');
}

/** Why a token cannot be used, in words the invitee can act on. */
function refusal(invitation: Invitation | null): AppError {
  if (!invitation)
    return new AppError(
      404,
      'not_found',
      'This invitation link is not valid. Check that you copied the whole link, or ask for a new invitation.',
    );
  if (invitation.acceptedAt)
    return new AppError(
      410,
      'not_allowed',
      'This invitation has already been used. Sign in instead, or ask a keeper for a new invitation.',
    );
  if (invitation.revokedAt)
    return new AppError(
      410,
      'not_allowed',
      'This invitation was withdrawn. Ask a keeper of the household for a new one.',
    );
  return new AppError(
    410,
    'not_allowed',
    `This invitation expired on ${invitation.expiresAt.toISOString().slice(0, 10)}. Ask a keeper of the household to invite you again.`,
  );
}

const isUsable = (invitation: Invitation | null): invitation is Invitation =>
  Boolean(invitation && !invitation.acceptedAt && !invitation.revokedAt && invitation.expiresAt > clock.now());

function stateOf(invitation: Invitation): InvitationPreview['state'] {
  if (invitation.acceptedAt) return 'used';
  if (invitation.revokedAt) return 'withdrawn';
  return invitation.expiresAt <= clock.now() ? 'expired' : 'pending';
}

/** What the invitation page shows before anyone joins: who invited whom, to which household, and whether the link still works. */
export async function preview(token: string): Promise<InvitationPreview> {
  const invitation = await Invitation.findOne({
    where: { tokenHash: hashToken(token) },
    include: [{ model: Household, as: 'household', required: true }],
  });
  if (!invitation) throw refusal(null);
  const inviter = invitation.invitedBy ? await User.findByPk(invitation.invitedBy) : null;
  const state = stateOf(invitation);
  return {
    householdName: invitation.household!.name,
    inviterName: inviter?.name ?? null,
    email: invitation.email,
    role: invitation.role,
    state,
    expiresAt: invitation.expiresAt.toISOString(),
    message: state === 'pending' ? null : refusal(invitation).message,
  };
}

export type Invitee = { user: Express.User; confirmOtherAddress: boolean } | { name: string; password: string };

/**
 * Joins the household with the invitation's role, as the signed-in person or as a new account
 * for the invited address; the token works once, even when two people try at the same moment.
 * A signed-in person with another address joins only after confirming it, and the keeper is told.
 */
export async function accept(
  ctx: Pick<AppContext, 'sequelize' | 'config' | 'mailer'>,
  token: string,
  who: Invitee,
): Promise<{ accepted: AcceptedInvitation; user: Express.User }> {
  const tokenHash = hashToken(token);
  // The token first: a made-up link costs one indexed read, never a password hash.
  const found = await Invitation.findOne({ where: { tokenHash } });
  if (!isUsable(found)) throw refusal(found);
  const otherAddress = 'user' in who && who.user.email.toLowerCase() !== found.email.toLowerCase();
  if (otherAddress && !who.confirmOtherAddress) {
    throw new AppError(
      409,
      'conflict',
      `This invitation was sent to ${found.email}, and you are signed in as ${who.user.email}. Sign in with ${found.email}, or confirm that you want to join with this account; the keeper will be told.`,
      undefined,
      {
        invitedEmail: found.email,
      },
    );
  }
  const passwordHash = 'password' in who ? await hashPassword(who.password, ctx.config.bcryptCost) : null;
  let joined: { accepted: AcceptedInvitation; user: Express.User };
  try {
    joined = await ctx.sequelize.transaction(async (transaction) => {
      const invitation = await Invitation.findOne({
        where: { tokenHash },
        include: [{ model: Household, as: 'household', required: true }],
        transaction,
        lock: { level: transaction.LOCK.UPDATE, of: Invitation },
      });
      if (!isUsable(invitation)) throw refusal(invitation);
      let user: Express.User;
      if ('user' in who) user = who.user;
      else {
        if (await User.findOne({ where: { email: invitation.email }, transaction })) {
          throw conflict(
            `An account for ${invitation.email} already exists. Sign in with it, then open this link again.`,
          );
        }
        user = (
          await User.create({ email: invitation.email, name: who.name, passwordHash: passwordHash! }, { transaction })
        ).toPublic();
      }
      if (await Membership.findOne({ where: { householdId: invitation.householdId, userId: user.id }, transaction })) {
        throw conflict(`You already belong to ${invitation.household!.name}.`);
      }
      await Membership.create(
        { householdId: invitation.householdId, userId: user.id, role: invitation.role },
        { transaction },
      );
      await invitation.update({ acceptedAt: clock.now(), acceptedBy: user.id }, { transaction });
      return {
        accepted: {
          householdId: invitation.householdId,
          householdName: invitation.household!.name,
          role: invitation.role,
        },
        user,
      };
    });
  } catch (error) {
    if (error instanceof UniqueConstraintError)
      throw conflict('That account or membership already exists. Sign in and open the link again.');
    throw error;
  }
  if (otherAddress) await tellKeepers(ctx, found, joined.user, joined.accepted.householdName);
  return joined;
}

/** The keepers learn that their invitation was used by an account with another address. */
async function tellKeepers(
  ctx: Pick<AppContext, 'config' | 'mailer' | 'log'>,
  invitation: Invitation,
  joiner: Express.User,
  householdName: string,
) {
  if (!ctx.mailer.enabled) return;
  const keepers = await Membership.findAll({
    where: { householdId: invitation.householdId, role: 'keeper' },
    include: [{ model: User, as: 'user', required: true }],
  });
  for (const keeper of keepers) {
    await ctx.mailer
      .send(
        invitationUsedElsewhereMail({
          to: keeper.user!.email,
          householdName,
          invitedEmail: invitation.email,
          joinerName: joiner.name,
          joinerEmail: joiner.email,
          role: invitation.role,
          link: `${ctx.config.publicOrigin}${paths.household(invitation.householdId)}`,
        }),
      )
      .catch((error: Error) =>
        ctx.log
          ? ctx.log.warn(
              { err: error, userId: keeper.userId },
              'the note to a keeper about a used invitation could not be sent',
            )
          : console.warn(
              `larderly: the note to ${keeper.user!.email} about an invitation could not be sent: ${error.message}`,
            ),
      );
  }
}
