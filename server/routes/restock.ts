import { Router } from 'express';
import { z } from 'zod';
import { restockTodoCreate } from '../../shared/schemas/todos';
import { currentMembership, householdAccess } from '../auth/guards';
import type { AppContext } from '../context';
import { body, params } from '../http/validate';
import { addRestockTodo } from '../services/restock/todo-batch-plan';
import { restockView } from '../services/restock/view';

const productParams = z.object({ hid: z.string(), productId: z.uuid({ error: 'That product was not found.' }) });

export function restockRouter({ sequelize, readCache }: AppContext) {
  const router = Router({ mergeParams: true });

  router.get('/restock', householdAccess('read'), async (req, res) => {
    const { household, versions } = currentMembership(req);
    await readCache.send(req, res, 'restock', () => restockView(household, versions));
  });

  router.post('/restock/:productId/todo', householdAccess('cook'), async (req, res) => {
    const { productId } = params(req, productParams);
    const input = body(req, restockTodoCreate);
    const todo = await addRestockTodo(sequelize, currentMembership(req).household, req.user!.id, productId, input);
    res.status(201).json({ todo });
  });

  return router;
}
