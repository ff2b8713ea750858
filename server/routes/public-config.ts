import { Router } from 'express';
import type { Config } from '../config';

/** What the client must know of the server's configuration: nothing secret. */
export function publicConfigRouter(config: Pick<Config, 'appOrigins'>) {
  const router = Router();
  // Label QR codes point here, so a phone can open them even when the sheet was printed from a local address.
  router.get('/config', (_req, res) => {
    res.json({ publicOrigin: config.appOrigins[0] ?? null });
  });
  return router;
}
