import { Router } from 'express';
import { z } from 'zod';
import { mealBody, mealPatch } from '../../shared/schemas/week';
import { currentMembership, householdAccess } from '../auth/guards';
import type { AppContext } from '../context';
import { body, params } from '../http/validate';
import { createMeal, deleteMeal, listMeals, updateMeal } from '../services/week/meals';

const mealParams = z.object({ id: z.uuid({ error: 'That meal was not found.' }) });

/** The meal library: /api/households/:hid/meals */
export function mealsRouter({ sequelize }: AppContext) {
  const router = Router({ mergeParams: true });

  router.get('/meals', householdAccess('read'), async (req, res) => {
    res.json({ meals: await listMeals(currentMembership(req).householdId) });
  });

  router.post('/meals', householdAccess('cook'), async (req, res) => {
    res
      .status(201)
      .json({ meal: await createMeal(sequelize, currentMembership(req).householdId, body(req, mealBody)) });
  });

  router.patch('/meals/:id', householdAccess('cook'), async (req, res) => {
    const { id } = params(req, mealParams.extend({ hid: z.string() }));
    res.json({ meal: await updateMeal(sequelize, currentMembership(req).householdId, id, body(req, mealPatch)) });
  });

  router.delete('/meals/:id', householdAccess('cook'), async (req, res) => {
    const { id } = params(req, mealParams.extend({ hid: z.string() }));
    await deleteMeal(currentMembership(req).householdId, id);
    res.status(204).end();
  });

  return router;
}
