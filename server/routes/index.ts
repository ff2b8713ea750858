import { Router } from 'express';
import type { AppContext } from '../context';
import { restockRouter } from './restock';
import { todayRouter } from './today';
import { todosRouter } from './todos';

/**
 * Every household-scoped feature router, mounted under /api/households/:hid.
 * Each route runs the householdAccess guard with the permission it needs.
 */
export function householdFeatureRouters(ctx: AppContext) {
  const router = Router({ mergeParams: true });
  router.use(restockRouter(ctx));
  router.use(todosRouter(ctx));
  router.use(todayRouter());
  return router;
}
