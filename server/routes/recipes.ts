import { Router } from 'express';
import { z } from 'zod';
import { recipeShapesIn } from '../../shared/schemas/recipes';
import { currentMembership, householdAccess } from '../auth/guards';
import { body, params } from '../http/validate';
import { createRecipe, listRecipes, updateRecipe, viewRecipe } from '../services/shelf/recipes';

const recipeParams = z.object({ hid: z.string(), recipeId: z.uuid({ error: 'That recipe was not found.' }) });

export function recipesRouter() {
  const router = Router({ mergeParams: true });

  router.get('/recipes', householdAccess('read'), async (req, res) => {
    res.json({ recipes: await listRecipes(currentMembership(req).householdId) });
  });

  router.get('/recipes/:recipeId', householdAccess('read'), async (req, res) => {
    const { recipeId } = params(req, recipeParams);
    res.json({ recipe: await viewRecipe(currentMembership(req).householdId, recipeId) });
  });

  router.post('/recipes', householdAccess('cook'), async (req, res) => {
    const { household, householdId } = currentMembership(req);
    const input = body(req, recipeShapesIn(household.unitSystem).create);
    res.status(201).json({ recipe: await createRecipe(householdId, input) });
  });

  router.patch('/recipes/:recipeId', householdAccess('cook'), async (req, res) => {
    const { recipeId } = params(req, recipeParams);
    const { household, householdId } = currentMembership(req);
    const input = body(req, recipeShapesIn(household.unitSystem).patch);
    res.json({ recipe: await updateRecipe(householdId, recipeId, input) });
  });

  return router;
}
