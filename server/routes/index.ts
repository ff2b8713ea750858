import { Router, type RequestHandler } from 'express';
import type { AppContext } from '../context';
import { householdBackupRouter } from './backup';
import { householdCalendarRouter } from './calendar';
import { devMailRouter } from './dev-mail';
import { fridgeRouter } from './fridge';
import { householdInvitationsRouter } from './invitations';
import { batchesRouter } from './batches';
import { jarsRouter } from './jars';
import { mealsRouter } from './meals';
import { placesRouter } from './places';
import { productsRouter } from './products';
import { recipesRouter } from './recipes';
import { restockRouter } from './restock';
import { stockRouter } from './stock';
import { shelfRouter } from './shelf';
import { todayRouter } from './today';
import { todosRouter } from './todos';
import { weekRouter } from './week';
import { weekProposalRouter } from './week-proposal';

type RouteLayer = { route?: { path?: unknown } };

/** The literal first segment a route's path starts with ('week' for '/week/copy'), or null when it has none. */
function firstSegment(path: unknown) {
  if (typeof path !== 'string') return null;
  return /^\/([A-Za-z0-9._-]+)(?:\/|$)/.exec(path)?.[1]?.toLowerCase() ?? null;
}

/**
 * Every household-scoped feature router, mounted under /api/households/:hid.
 * Each route runs the householdAccess guard with the permission it needs.
 *
 * A request is handed only to the routers that have a route under its first path segment (in their
 * order here, so which route answers is as before): walking all eighteen routers' ninety routes one by
 * one was the largest share of the request path's own CPU in `npm run bench:week`. A router with a
 * route whose path starts with no literal segment (or a middleware of its own) stays in every list.
 */
export function householdFeatureRouters(ctx: AppContext) {
  const features = [
    productsRouter(ctx),
    recipesRouter(),
    batchesRouter(ctx),
    placesRouter(ctx),
    jarsRouter(ctx),
    shelfRouter(ctx),
    mealsRouter(ctx),
    weekRouter(ctx),
    weekProposalRouter(ctx),
    restockRouter(ctx),
    stockRouter(ctx),
    todosRouter(ctx),
    todayRouter(ctx),
    fridgeRouter(ctx),
    householdInvitationsRouter(ctx),
    ...(ctx.config.isProduction ? [] : [devMailRouter(ctx)]),
    householdBackupRouter(ctx),
    householdCalendarRouter(ctx),
  ];
  const servedBy = features.map((feature) => {
    const segments = (feature as unknown as { stack: RouteLayer[] }).stack.map((layer) =>
      firstSegment(layer.route?.path),
    );
    return segments.includes(null) ? null : new Set(segments as string[]);
  });
  const everySegment = new Set(servedBy.flatMap((segments) => [...(segments ?? [])]));
  const routerFor = (segment: string | null) => {
    const router = Router({ mergeParams: true });
    features.forEach((feature, i) => {
      if (servedBy[i] === null || (segment !== null && servedBy[i]!.has(segment))) router.use(feature);
    });
    return router;
  };
  const bySegment = new Map([...everySegment].map((segment) => [segment, routerFor(segment)]));
  const elsewhere = routerFor(null);
  const dispatch: RequestHandler = (req, res, next) => {
    const segment = /^\/([^/]+)/.exec(req.path)?.[1]?.toLowerCase();
    (bySegment.get(segment ?? '') ?? elsewhere)(req, res, next);
  };
  // Listed like a router's own layers, so whoever walks the app's routes (the authorization matrix) finds them all.
  return Object.assign(dispatch, { stack: features.map((feature) => ({ handle: feature })) });
}
