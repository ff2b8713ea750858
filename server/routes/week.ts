import { Router, type Request } from 'express';
import { z } from 'zod';
import {
  pairingCreate,
  pairingPatch,
  planEntryCreate,
  planEntryPatch,
  preferencesPatch,
  weekCopy,
  weekQuery,
  weekStartOf,
} from '../../shared/schemas/week';
import { currentMembership, householdAccess } from '../auth/guards';
import type { AppContext } from '../context';
import { body, params, query } from '../http/validate';
import { todayIn } from '../services/clock';
import { copyWeek } from '../services/week/copy-week';
import { addPairing, deletePairing, updatePairing } from '../services/week/pairings';
import { clearDay, createPlanEntry, deletePlanEntry, updatePlanEntry } from '../services/week/plan-entries';
import { updatePreferences } from '../services/week/preferences';
import { readWeek } from '../services/week/read-week';

const withId = (what: string) => z.object({ hid: z.string(), id: z.uuid({ error: `${what} was not found.` }) });
const dayParams = z.object({ hid: z.string(), date: z.iso.date({ error: 'Use a date written YYYY-MM-DD.' }) });
const memberParams = z.object({ hid: z.string(), userId: z.uuid({ error: 'That member was not found.' }) });

/**
 * The week board, under /api/households/:hid (cooks and keepers write, helpers read):
 * GET /week?start=YYYY-MM-DD (snapped to the household's week start; this week when left out),
 * POST /week/copy { from, to }, DELETE /week/days/:date,
 * POST /plan-entries, PATCH|DELETE /plan-entries/:id, POST /plan-entries/:id/pairings, PATCH|DELETE /pairings/:id,
 * PATCH /members/:userId/preferences { heatTolerance?, dietTags? }: the member themselves, or a keeper.
 */
export function weekRouter({ sequelize, readCache }: AppContext) {
  const router = Router({ mergeParams: true });
  const householdOf = (req: Request) => currentMembership(req).household;
  const hid = (req: Request) => currentMembership(req).householdId;

  router.get('/week', householdAccess('read'), async (req, res) => {
    const household = householdOf(req);
    const { start } = query(req, weekQuery);
    const weekStart = weekStartOf(start ?? todayIn(household.timeZone), household.weekStartsOn);
    await readCache.send(req, res, `week ${weekStart}`, () => readWeek(sequelize, household, weekStart));
  });

  router.post('/week/copy', householdAccess('cook'), async (req, res) => {
    const { from, to } = body(req, weekCopy);
    const { weekStartsOn } = householdOf(req);
    const copied = await copyWeek(sequelize, hid(req), weekStartOf(from, weekStartsOn), weekStartOf(to, weekStartsOn));
    res.status(201).json({ copied });
  });

  router.delete('/week/days/:date', householdAccess('cook'), async (req, res) => {
    const { date } = params(req, dayParams);
    res.json({ removed: await clearDay(sequelize, hid(req), date) });
  });

  router.post('/plan-entries', householdAccess('cook'), async (req, res) => {
    res.status(201).json({ id: await createPlanEntry(sequelize, hid(req), body(req, planEntryCreate)) });
  });

  router.patch('/plan-entries/:id', householdAccess('cook'), async (req, res) => {
    const { id } = params(req, withId('That planned meal'));
    res.json({ id: await updatePlanEntry(sequelize, hid(req), id, body(req, planEntryPatch)) });
  });

  router.delete('/plan-entries/:id', householdAccess('cook'), async (req, res) => {
    const { id } = params(req, withId('That planned meal'));
    await deletePlanEntry(sequelize, hid(req), id);
    res.status(204).end();
  });

  router.post('/plan-entries/:id/pairings', householdAccess('cook'), async (req, res) => {
    const { id } = params(req, withId('That planned meal'));
    const { productId, tbspPerServing } = body(req, pairingCreate);
    const pairing = await addPairing(sequelize, hid(req), id, productId, tbspPerServing);
    res
      .status(201)
      .json({ pairing: { id: pairing.id, productId: pairing.productId, tbspPerServing: pairing.tbspPerServing } });
  });

  router.patch('/pairings/:id', householdAccess('cook'), async (req, res) => {
    const { id } = params(req, withId('That pairing'));
    await updatePairing(hid(req), id, body(req, pairingPatch).tbspPerServing);
    res.json({ id });
  });

  router.delete('/pairings/:id', householdAccess('cook'), async (req, res) => {
    const { id } = params(req, withId('That pairing'));
    await deletePairing(hid(req), id);
    res.status(204).end();
  });

  // Read access: each member keeps their own; a keeper may set anyone's (checked in the service).
  router.patch('/members/:userId/preferences', householdAccess('read'), async (req, res) => {
    const { userId } = params(req, memberParams);
    const { householdId, role } = currentMembership(req);
    res.json({
      preferences: await updatePreferences(
        householdId,
        { userId: req.user!.id, role },
        userId,
        body(req, preferencesPatch),
      ),
    });
  });

  return router;
}
