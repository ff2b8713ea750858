import type { NextFunction, Request, RequestHandler, Response } from 'express';
import { can, type Permission, type Role } from '../../shared/roles';
import { Household, Membership } from '../db/models';
import { AppError, forbidden, notFound } from '../http/errors';

declare global {
  // eslint-disable-next-line @typescript-eslint/no-namespace
  namespace Express {
    interface Request {
      membership?: { householdId: string; role: Role; household: Household };
    }
  }
}

const UUID = /^[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}$/i;

export const requireUser: RequestHandler = (req, _res, next) => {
  if (!req.user) return next(new AppError(401, 'signed_out', 'Please sign in first.'));
  next();
};

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
      // Read fresh on every request, never cached: a removed member loses access on their next request, on every process.
      const membership = await Membership.findOne({
        where: { householdId, userId: req.user.id },
        include: [{ model: Household, as: 'household', required: true }],
      });
      if (!membership?.household) throw notFound('That household');
      req.membership = { householdId, role: membership.role, household: membership.household };
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
