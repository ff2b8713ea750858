import type { NextFunction, Request, RequestHandler, Response } from 'express';
import { QueryTypes, type Sequelize } from 'sequelize';
import { can, type Permission, type Role } from '../../shared/roles';
import { Household } from '../db/models';
import { AppError, forbidden, notFound } from '../http/errors';
import type { HouseholdVersions } from '../services/household-memo';
import { joinedMembership } from './session';

declare global {
  // eslint-disable-next-line @typescript-eslint/no-namespace
  namespace Express {
    interface Request {
      membership?: {
        householdId: string;
        role: Role;
        household: Household;
        /** The household's versions as read with this request: the key of cached reads (household-memo.ts). */
        versions: HouseholdVersions;
      };
    }
  }
}

const UUID = /^[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}$/i;

export const requireUser: RequestHandler = (req, _res, next) => {
  if (!req.user) return next(new AppError(401, 'signed_out', 'Please sign in first.'));
  next();
};

type MembershipRow = Record<string, unknown> & { member_role: Role; data_version: string; plan_version: string };

/** A membership row (the household's columns and `member_role`) as the guard's membership. */
function membershipFromRow(row: MembershipRow) {
  const attributes = Object.fromEntries(
    Object.entries(Household.getAttributes()).map(([name, column]) => [name, row[column.field ?? name]]),
  );
  return {
    role: row.member_role,
    versions: { data: String(row.data_version), plan: String(row.plan_version) },
    household: Household.build(attributes as Household['_creationAttributes'], { isNewRecord: false, raw: true }),
  };
}

/**
 * The person's membership and its household: as the session read joined it in the same round trip
 * (session.ts), else in one indexed read of its own (memberships_household_id_user_id).
 */
async function membershipOf(req: Request, sequelize: Sequelize, householdId: string, userId: string) {
  const joined = joinedMembership(req, householdId, userId);
  if (joined) return joined.row ? membershipFromRow(joined.row as MembershipRow) : null;
  // Raw SQL: every household request pays for this read, and a Sequelize include costs more than the query itself.
  const [row] = await sequelize.query<MembershipRow>(
    `SELECT m.role AS member_role, h.*
       FROM memberships m JOIN households h ON h.id = m.household_id
      WHERE m.household_id = :householdId AND m.user_id = :userId`,
    { replacements: { householdId, userId }, type: QueryTypes.SELECT },
  );
  return row ? membershipFromRow(row) : null;
}

/**
 * The one guard for every household route: the signed-in person must belong to the household
 * in the path (404 otherwise, never a hint that it exists) and hold a role with the permission.
 */
export function householdAccess(permission: Permission): RequestHandler {
  return async (req: Request, _res: Response, next: NextFunction) => {
    try {
      if (!req.user) throw new AppError(401, 'signed_out', 'Please sign in first.');
      const householdId = String(req.params.hid ?? '');
      if (!UUID.test(householdId)) throw notFound('That household');
      // Read fresh on every request (with the session, or here), never cached: a removed member loses access on
      // their next request, on every process.
      const membership = await membershipOf(req, Household.sequelize!, householdId, req.user.id);
      if (!membership) throw notFound('That household');
      req.membership = { householdId, ...membership };
      if (!can(membership.role, permission)) throw forbidden();
      next();
    } catch (error) {
      next(error);
    }
  };
}

export function currentMembership(req: Request) {
  if (!req.membership) throw new Error('householdAccess must run before this handler');
  return req.membership;
}
