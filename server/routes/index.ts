import { Router } from 'express';
import type { AppContext } from '../context';
import { householdBackupRouter } from './backup';
import { householdCalendarRouter } from './calendar';
import { devMailRouter } from './dev-mail';
import { fridgeRouter } from './fridge';
import { householdInvitationsRouter } from './invitations';
import { batchesRouter } from './batches';
import { jarsRouter } from './jars';
import { mealsRouter } from './meals';
import { placesRouter } from './places';
import { productsRouter } from './products';
import { recipesRouter } from './recipes';
import { restockRouter } from './restock';
import { stockRouter } from './stock';
import { shelfRouter } from './shelf';
import { todayRouter } from './today';
import { todosRouter } from './todos';
import { weekRouter } from './week';
import { weekProposalRouter } from './week-proposal';

/**
 * Every household-scoped feature router, mounted under /api/households/:hid.
 * Each route runs the householdAccess guard with the permission it needs.
 */
export function householdFeatureRouters(ctx: AppContext) {
  const router = Router({ mergeParams: true });
  router.use(productsRouter());
  router.use(recipesRouter());
  router.use(batchesRouter(ctx));
  router.use(placesRouter(ctx));
  router.use(jarsRouter(ctx));
  router.use(shelfRouter(ctx));
  router.use(mealsRouter(ctx));
  router.use(weekRouter(ctx));
  router.use(weekProposalRouter(ctx));
  router.use(restockRouter(ctx));
  router.use(stockRouter(ctx));
  router.use(todosRouter(ctx));
  router.use(todayRouter(ctx));
  router.use(fridgeRouter(ctx));
  router.use(householdInvitationsRouter(ctx));
  if (!ctx.config.isProduction) router.use(devMailRouter(ctx));
  router.use(householdBackupRouter(ctx));
  router.use(householdCalendarRouter(ctx));
  return router;
}
