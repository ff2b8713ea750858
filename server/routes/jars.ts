import { Router } from 'express';
import { z } from 'zod';
import { JAR_ACTIONS, jarGiveBody, jarStateQuery, jarUndoBody } from '../../shared/schemas/batches';
import { jarActionBody } from '../../shared/schemas/stock';
import { currentMembership, householdAccess, requireUser } from '../auth/guards';
import type { AppContext } from '../context';
import { idempotent } from '../http/idempotency';
import { body, params, query } from '../http/validate';
import { undoJarEvent } from '../services/shelf/jar-undo';
import {
  actOnJar,
  giftsThisYear,
  giveJar,
  jarByCode,
  jarInHousehold,
  listJars,
  openingAdvice,
} from '../services/shelf/jars';

const jarAction = z.object({
  hid: z.string(),
  jarId: z.uuid({ error: 'That jar was not found.' }),
  action: z.enum(JAR_ACTIONS, { error: 'A jar can be opened, finished or discarded.' }),
});
const jarParams = z.object({ hid: z.string(), jarId: z.uuid({ error: 'That jar was not found.' }) });
const codeParams = z.object({ code: z.string().max(20) }).loose();

export function jarsRouter(ctx: AppContext) {
  const router = Router({ mergeParams: true });

  router.get('/jars', householdAccess('read'), async (req, res) => {
    const filter = query(req, jarStateQuery);
    await ctx.readCache.send(
      req,
      res,
      `jars ${JSON.stringify(filter)}`,
      async () => ({
        jars: await listJars(currentMembership(req).household, filter),
      }),
      { plan: false },
    );
  });

  router.get('/jars/by-code/:code', householdAccess('read'), async (req, res) => {
    res.json({ jar: await jarInHousehold(currentMembership(req).household, params(req, codeParams).code) });
  });

  router.get('/jars/:jarId/opening-advice', householdAccess('read'), async (req, res) => {
    res.json({ advice: await openingAdvice(currentMembership(req).household, params(req, jarParams).jarId) });
  });

  router.get('/gifts', householdAccess('read'), async (req, res) => {
    res.json({ gifts: await giftsThisYear(currentMembership(req).household) });
  });

  // Before '/:action', like undo: any member may give a sealed jar away, and undo it as they would an open.
  router.post('/jars/:jarId/give', householdAccess('handleJars'), idempotent(ctx.sequelize), async (req, res) => {
    const { jarId } = params(req, jarParams);
    const { to } = body(req, jarGiveBody);
    res.json(await giveJar(ctx.sequelize, currentMembership(req).household, jarId, to, req.user!.id));
  });

  // Before '/:action': any member may try; the service lets helpers undo only their own recent change.
  router.post('/jars/:jarId/undo', householdAccess('handleJars'), idempotent(ctx.sequelize), async (req, res) => {
    const { jarId } = params(req, jarParams);
    const { eventId } = body(req, jarUndoBody);
    const { household, role } = currentMembership(req);
    res.json(await undoJarEvent(ctx.sequelize, household, role, req.user!.id, jarId, eventId));
  });

  router.post('/jars/:jarId/:action', householdAccess('handleJars'), idempotent(ctx.sequelize), async (req, res) => {
    const { jarId, action } = params(req, jarAction);
    const { kept } = body(req, jarActionBody);
    res.json(await actOnJar(ctx.sequelize, currentMembership(req).household, jarId, action, req.user!.id, { kept }));
  });

  return router;
}

/** /api/jars/by-code/:code for a label's page, which knows the code but not the household. */
export function jarCodesRouter() {
  const router = Router();
  router.get('/by-code/:code', requireUser, async (req, res) => {
    res.json(await jarByCode(params(req, codeParams).code, req.user!.id));
  });
  return router;
}
