import { Router } from 'express';
import { stockCorrection } from '../../shared/schemas/stock';
import { currentMembership, householdAccess } from '../auth/guards';
import type { AppContext } from '../context';
import { idempotent } from '../http/idempotency';
import { body } from '../http/validate';
import { correctStock, stockView } from '../services/stock/jar-stock';

/** The household's empty jars and new lids, and the hand count that corrects them. */
export function stockRouter(ctx: AppContext) {
  const router = Router({ mergeParams: true });

  router.get('/stock', householdAccess('read'), async (req, res) => {
    res.json({ stock: await stockView(ctx.sequelize, currentMembership(req).householdId) });
  });

  router.post('/stock/correction', householdAccess('cook'), idempotent(ctx.sequelize), async (req, res) => {
    const input = body(req, stockCorrection);
    res.json({ stock: await correctStock(ctx.sequelize, currentMembership(req).household, input, req.user!.id) });
  });

  return router;
}
