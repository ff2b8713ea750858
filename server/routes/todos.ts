import { Router } from 'express';
import { z } from 'zod';
import { todoCreate, todoListQuery, todoPatch } from '../../shared/schemas/todos';
import { currentMembership, householdAccess } from '../auth/guards';
import type { AppContext } from '../context';
import { idempotent } from '../http/idempotency';
import { body, params, query } from '../http/validate';
import { createTodo, deleteTodo, findTodo, listTodos, updateTodo } from '../services/todos';

const todoParams = z.object({ hid: z.string(), id: z.uuid({ error: 'That to-do was not found.' }) });

export function todosRouter({ sequelize, readCache }: AppContext) {
  const router = Router({ mergeParams: true });

  router.get('/todos', householdAccess('read'), async (req, res) => {
    const { filter } = query(req, todoListQuery);
    const userId = req.user!.id;
    // Kept until the household's data moves (to-dos, recipes, products and stock are versioned); only "mine" is per person.
    await readCache.send(
      req,
      res,
      `todos ${filter} ${filter === 'mine' ? userId : ''}`,
      async () => ({
        todos: await listTodos(currentMembership(req).household, filter, userId, currentMembership(req).versions),
      }),
      { plan: false },
    );
  });

  router.get('/todos/:id', householdAccess('read'), async (req, res) => {
    const { id } = params(req, todoParams);
    const { household, versions } = currentMembership(req);
    res.json({ todo: await findTodo(household, id, versions) });
  });

  router.post('/todos', householdAccess('cook'), idempotent(sequelize), async (req, res) => {
    const input = body(req, todoCreate);
    res.status(201).json({ todo: await createTodo(sequelize, currentMembership(req).household, req.user!.id, input) });
  });

  // Helpers pass this guard to tick a to-do; the service refuses them anything else.
  router.patch('/todos/:id', householdAccess('handleJars'), idempotent(sequelize), async (req, res) => {
    const { id } = params(req, todoParams);
    const patch = body(req, todoPatch);
    const { household, role, versions } = currentMembership(req);
    res.json({ todo: await updateTodo(sequelize, household, role, id, patch, versions) });
  });

  router.delete('/todos/:id', householdAccess('cook'), async (req, res) => {
    const { id } = params(req, todoParams);
    await deleteTodo(sequelize, currentMembership(req).householdId, id);
    res.status(204).end();
  });

  return router;
}
