import { Router } from 'express';
import { currentMembership, householdAccess } from '../auth/guards';
import type { AppContext } from '../context';
import { todayView } from '../services/today';

export function todayRouter({ readCache }: AppContext) {
  const router = Router({ mergeParams: true });

  router.get('/today', householdAccess('read'), async (req, res) => {
    // My to-dos make the answer each person's own.
    await readCache.send(req, res, `today ${req.user!.id}`, () =>
      todayView(currentMembership(req).household, req.user!.id, currentMembership(req).versions),
    );
  });

  return router;
}
