import { Router } from 'express';
import { currentMembership, householdAccess } from '../auth/guards';
import { todayIn } from '../services/clock';
import { viewFridge } from '../services/fridge';

export function fridgeRouter() {
  const router = Router({ mergeParams: true });
  router.get('/fridge', householdAccess('read'), async (req, res) => {
    const { household } = currentMembership(req);
    res.json(await viewFridge(household.id, todayIn(household.timeZone)));
  });
  return router;
}
