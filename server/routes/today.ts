import { Router } from 'express';
import { currentMembership, householdAccess } from '../auth/guards';
import type { AppContext } from '../context';
import { todayView } from '../services/today';

export function todayRouter({ readCache }: AppContext) {
  const router = Router({ mergeParams: true });

  router.get('/today', householdAccess('read'), async (req, res) => {
    // My to-dos make the answer each person's own.
    const { household, versions } = currentMembership(req);
    await readCache.send(req, res, `today ${req.user!.id}`, () => todayView(household, req.user!.id, versions));
  });

  return router;
}
