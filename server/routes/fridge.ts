import { Router } from 'express';
import { currentMembership, householdAccess } from '../auth/guards';
import type { AppContext } from '../context';
import { todayIn } from '../services/clock';
import { viewFridge } from '../services/fridge';

export function fridgeRouter({ readCache }: AppContext) {
  const router = Router({ mergeParams: true });
  router.get('/fridge', householdAccess('read'), async (req, res) => {
    const { household } = currentMembership(req);
    await readCache.send(req, res, 'fridge', () => viewFridge(household.id, todayIn(household.timeZone)));
  });
  return router;
}
