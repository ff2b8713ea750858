import { Router } from 'express';
import type { Sequelize } from 'sequelize';
import type { PhotoStorage } from '../services/photo-storage';

/** /health: the process and its database; /ready: also the photo store, so a balancer sends work only where all of it answers. */
export function healthRouter(sequelize: Sequelize, photos: PhotoStorage, isStopping: () => boolean = () => false) {
  const router = Router();
  const databaseUp = () =>
    sequelize.query('SELECT 1').then(
      () => true,
      () => false,
    );
  router.get('/health', async (_req, res) => {
    if (await databaseUp()) res.json({ ok: true, db: 'up' });
    else res.status(503).json({ ok: false, db: 'down' });
  });
  router.get('/ready', async (_req, res) => {
    const [db, store] = await Promise.all([
      databaseUp(),
      photos.check().then(
        () => true,
        () => false,
      ),
    ]);
    const ready = db && store && !isStopping();
    res
      .status(ready ? 200 : 503)
      .set('Cache-Control', 'no-store')
      .json({
        ready,
        db: db ? 'up' : 'down',
        photoStore: { kind: photos.kind, state: store ? 'up' : 'down' },
        ...(isStopping() ? { stopping: true } : {}),
      });
  });
  return router;
}
