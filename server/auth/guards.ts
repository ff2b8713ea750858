import type { NextFunction, Request, RequestHandler, Response } from 'express';
import { QueryTypes, type Sequelize } from 'sequelize';
import { can, type Permission, type Role } from '../../shared/roles';
import { Household } from '../db/models';
import { AppError, forbidden, notFound } from '../http/errors';
import { deepFrozen, householdMemo, type HouseholdVersions } from '../services/household-memo';
import { joinedMembership, type JoinedMembership } from './session';

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

type MembershipRow = Record<string, unknown> & NonNullable<JoinedMembership['row']>;

/** The model's attribute names and their columns, read once. */
let columns: [attribute: string, field: string][] | undefined;
const attributesOf = (row: Record<string, unknown>) =>
  Object.fromEntries(
    (columns ??= Object.entries(Household.getAttributes()).map(([name, column]) => [name, column.field ?? name])).map(
      ([name, field]) => [name, row[field]],
    ),
  );

const buildHousehold = (attributes: Record<string, unknown>) =>
  Household.build({ ...attributes } as Household['_creationAttributes'], { isNewRecord: false, raw: true });

/** The guard's membership: the role and the household's versions of a membership row, with its household. */
const membershipWith = (row: NonNullable<JoinedMembership['row']>, household: Household) => ({
  role: row.member_role,
  versions: { data: String(row.data_version), plan: String(row.plan_version) },
  household,
});

/**
 * Each household's columns as last read, by its id and data version: every change to a households row but its plan
 * version moves its data version (migrations 0085 and 0200, household_settings_changed), so the session read
 * brings only the versions and the row is read again only after a change, in any process. Small (a household's
 * settings), so many are kept.
 */
const householdColumns = householdMemo<Readonly<Record<string, unknown>> | null>(10_000);

async function householdAt(sequelize: Sequelize, householdId: string, dataVersion: string) {
  const attributes = await householdColumns(householdId, dataVersion, async () => {
    const [row] = await sequelize.query<Record<string, unknown>>('SELECT * FROM households WHERE id = :householdId', {
      replacements: { householdId },
      type: QueryTypes.SELECT,
    });
    // Frozen through and through (the JSON columns too): the memo's copy is shared by every request.
    return row ? deepFrozen(attributesOf(row)) : null;
  });
  return attributes && buildHousehold(attributes);
}

/**
 * The person's membership and its household: the membership and the household's versions as the session read
 * joined them in the same round trip (session.ts) with the household's columns as of that version, else in one
 * indexed read of its own (memberships_household_id_user_id).
 */
async function membershipOf(req: Request, sequelize: Sequelize, householdId: string, userId: string) {
  const joined = joinedMembership(req, householdId, userId);
  if (joined) {
    if (!joined.row) return null;
    const household = await householdAt(sequelize, householdId, String(joined.row.data_version));
    return household ? membershipWith(joined.row, household) : null;
  }
  // Raw SQL: every household request pays for this read, and a Sequelize include costs more than the query itself.
  const [row] = await sequelize.query<MembershipRow>(
    `SELECT m.role AS member_role, h.*
       FROM memberships m JOIN households h ON h.id = m.household_id
      WHERE m.household_id = :householdId AND m.user_id = :userId`,
    { replacements: { householdId, userId }, type: QueryTypes.SELECT },
  );
  return row ? membershipWith(row, buildHousehold(attributesOf(row))) : null;
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
