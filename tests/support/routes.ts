import type { Express } from 'express';

export interface RouteInfo {
  method: string;
  /** the Express path, e.g. /api/households/:hid/jars/:jarId/open */
  path: string;
}

interface Layer {
  rawPath?: string | string[];
  route?: { path: string | string[]; methods: Record<string, boolean> };
  handle: { stack?: Layer[] };
}

/** Every route the app answers, read from Express's own router, so a new route cannot be missed. */
export function listRoutes(app: Express): RouteInfo[] {
  const routes: RouteInfo[] = [];
  const walk = (stack: Layer[], prefix: string) => {
    for (const layer of stack) {
      if (layer.route) {
        for (const path of [layer.route.path].flat()) {
          for (const method of Object.keys(layer.route.methods)) {
            if (method !== '_all') routes.push({ method: method.toUpperCase(), path: join(prefix, path) });
          }
        }
      } else if (layer.handle.stack) {
        const mount = [layer.rawPath ?? ''].flat()[0] ?? '';
        walk(layer.handle.stack, join(prefix, typeof mount === 'string' ? mount : ''));
      }
    }
  };
  walk((app as unknown as { router: { stack: Layer[] } }).router.stack, '');
  const seen = new Set<string>();
  return routes.filter((r) => {
    const key = `${r.method} ${r.path}`;
    if (seen.has(key)) return false;
    seen.add(key);
    return true;
  });
}

function join(prefix: string, path: string) {
  const joined = `${prefix}/${path}`.replace(/\/+/g, '/');
  return joined.length > 1 ? joined.replace(/\/$/, '') : joined;
}
