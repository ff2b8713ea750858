import { Router } from 'express';
import { currentMembership, householdAccess } from '../auth/guards';
import { todayView } from '../services/today';

export function todayRouter() {
  const router = Router({ mergeParams: true });

  router.get('/today', householdAccess('read'), async (req, res) => {
    res.json(await todayView(currentMembership(req).household, req.user!.id));
  });

  return router;
}
