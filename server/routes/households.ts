import { Router } from 'express';
import type { Sequelize } from 'sequelize';
import { z } from 'zod';
import { householdPatchIn, memberPatch } from '../../shared/schemas/households';
import { currentMembership, householdAccess } from '../auth/guards';
import { body, params } from '../http/validate';
import {
  changeRole,
  leaveHousehold,
  listMembers,
  removeMember,
  updateHousehold,
  viewHousehold,
} from '../services/households';

export function householdsRouter(sequelize: Sequelize) {
  const router = Router({ mergeParams: true });

  router.get('/:hid', householdAccess('read'), (req, res) => {
    const { household, role } = currentMembership(req);
    res.json({ household: viewHousehold(household, role) });
  });

  router.patch('/:hid', householdAccess('manage'), async (req, res) => {
    const { household, role } = currentMembership(req);
    // The refusals name the altitude's limits in the household's units (or the units this patch chooses).
    const patch = body(req, householdPatchIn(household.unitSystem, req.body));
    const updated = await updateHousehold(household, patch);
    res.json({ household: viewHousehold(updated, role) });
  });

  router.get('/:hid/members', householdAccess('read'), async (req, res) => {
    res.json({ members: await listMembers(currentMembership(req).householdId) });
  });

  router.patch('/:hid/members/:userId', householdAccess('manage'), async (req, res) => {
    const { userId } = params(
      req,
      z.object({ hid: z.string(), userId: z.uuid({ error: 'That member was not found.' }) }),
    );
    const { role } = body(req, memberPatch);
    await changeRole(sequelize, currentMembership(req).householdId, userId, role);
    res.json({ members: await listMembers(currentMembership(req).householdId) });
  });

  router.delete('/:hid/members/:userId', householdAccess('manage'), async (req, res) => {
    const { userId } = params(
      req,
      z.object({ hid: z.string(), userId: z.uuid({ error: 'That member was not found.' }) }),
    );
    await removeMember(sequelize, currentMembership(req).householdId, req.user!.id, userId);
    res.json({ members: await listMembers(currentMembership(req).householdId) });
  });

  router.post('/:hid/leave', householdAccess('read'), async (req, res) => {
    await leaveHousehold(sequelize, currentMembership(req).householdId, req.user!.id);
    res.status(204).end();
  });

  return router;
}
