import { existsSync } from 'node:fs';
import type { ServerResponse } from 'node:http';
import path from 'node:path';
import { Router } from 'express';
import expressStaticGzip from 'express-static-gzip';
import { firstScreenPages } from './first-screen';

/**
 * The built client: each file as the brotli or gzip copy the build made beside it (vite.config.ts)
 * when the browser accepts it, with Content-Encoding and Vary: Accept-Encoding; index.html for every
 * other address outside /api, with the hints that let the screen's code and first reads load at once
 * (first-screen.ts). Null when there is no build.
 */
export function staticClient(staticDir: string) {
  const root = path.resolve(staticDir);
  if (!existsSync(path.join(root, 'index.html'))) return null;
  const pageFor = firstScreenPages(root);
  const router = Router();
  router.use(
    expressStaticGzip(root, {
      enableBrotli: true,
      orderPreference: ['br', 'gz'],
      index: false,
      serveStatic: { index: false, maxAge: '1y', immutable: true, setHeaders: noCacheForHtml },
    }),
  );
  router.get(/^\/(?!api\/).*/, (req, res) => {
    res.set('Cache-Control', 'no-cache').type('html').send(pageFor(req.path));
  });
  return router;
}

function noCacheForHtml(res: ServerResponse, filePath: string) {
  if (filePath.endsWith('.html') || filePath.endsWith('sw.js') || filePath.endsWith('.webmanifest')) {
    res.setHeader('Cache-Control', 'no-cache');
  }
}
