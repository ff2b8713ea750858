import { Router } from 'express';
import { z } from 'zod';
import { recipeCreate, recipePatch } from '../../shared/schemas/recipes';
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
    res.status(201).json({ recipe: await createRecipe(currentMembership(req).householdId, body(req, recipeCreate)) });
  });

  router.patch('/recipes/:recipeId', householdAccess('cook'), async (req, res) => {
    const { recipeId } = params(req, recipeParams);
    res.json({ recipe: await updateRecipe(currentMembership(req).householdId, recipeId, body(req, recipePatch)) });
  });

  return router;
}
