import { Router } from 'express';
import type { AppContext } from '../context';

/**
 * Every household-scoped feature router, mounted under /api/households/:hid.
 * Each route runs the householdAccess guard with the permission it needs.
 */
export function householdFeatureRouters(_ctx: AppContext) {
  const router = Router({ mergeParams: true });
  return router;
}
