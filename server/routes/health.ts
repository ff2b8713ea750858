import { Router } from 'express';
import type { Sequelize } from 'sequelize';

export function healthRouter(sequelize: Sequelize) {
  const router = Router();
  router.get('/health', async (_req, res) => {
    try {
      await sequelize.query('SELECT 1');
      res.json({ ok: true, db: 'up' });
    } catch {
      res.status(503).json({ ok: false, db: 'down' });
    }
  });
  return router;
}
