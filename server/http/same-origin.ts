import type { RequestHandler } from 'express';
import { AppError } from './errors';

const SAFE = new Set(['GET', 'HEAD', 'OPTIONS']);

/**
 * Refuses unsafe requests sent by a browser from another origin (cross-site request forgery).
 * Browsers always send Origin on such requests; clients without one are not browsers.
 */
export function sameOriginOnly(extraOrigins: string[]): RequestHandler {
  return (req, _res, next) => {
    if (SAFE.has(req.method)) return next();
    const origin = req.get('origin');
    const fetchSite = req.get('sec-fetch-site');
    const own = `${req.protocol}://${req.get('host')}`;
    const allowed = origin === undefined ? fetchSite !== 'cross-site' : origin === own || extraOrigins.includes(origin);
    if (allowed) return next();
    next(new AppError(403, 'forbidden', 'This request came from another site, so it was refused. Use Larderly from its own address.'));
  };
}
