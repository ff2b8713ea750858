import { Router } from 'express';
import { z } from 'zod';
import { jarMoveBody, placeBody, placeRemoveQuery } from '../../shared/schemas/places';
import { currentMembership, householdAccess } from '../auth/guards';
import type { AppContext } from '../context';
import { body, params, query } from '../http/validate';
import { createPlace, listPlaces, moveJars, removePlace, renamePlace } from '../services/shelf/places';

const placeParams = z.object({ hid: z.string(), placeId: z.uuid({ error: 'That place was not found.' }) });

/** The household's shelf places (keepers and cooks name them) and moving jars between them (any member). */
export function placesRouter(ctx: AppContext) {
  const router = Router({ mergeParams: true });

  router.get('/places', householdAccess('read'), async (req, res) => {
    res.json({ places: await listPlaces(currentMembership(req).householdId) });
  });

  router.post('/places', householdAccess('cook'), async (req, res) => {
    res.status(201).json({ place: await createPlace(currentMembership(req).householdId, body(req, placeBody)) });
  });

  router.patch('/places/:placeId', householdAccess('cook'), async (req, res) => {
    const { placeId } = params(req, placeParams);
    res.json({ place: await renamePlace(currentMembership(req).householdId, placeId, body(req, placeBody)) });
  });

  router.delete('/places/:placeId', householdAccess('cook'), async (req, res) => {
    const { placeId } = params(req, placeParams);
    const { moveTo } = query(req, placeRemoveQuery);
    res.json(await removePlace(ctx.sequelize, currentMembership(req).household, placeId, moveTo, req.user!.id));
  });

  router.post('/jars/move', householdAccess('handleJars'), async (req, res) => {
    const { jarIds, placeId } = body(req, jarMoveBody);
    res.json(await moveJars(ctx.sequelize, currentMembership(req).household, jarIds, placeId, req.user!.id));
  });

  return router;
}
