import type { RequestHandler } from 'express';
import { AppError } from './errors';

const SAFE = new Set(['GET', 'HEAD', 'OPTIONS']);

const LOOPBACK_HOSTS = new Set(['127.0.0.1', 'localhost', '[::1]']);

/** The request's own origin, trusted only for a loopback host: any other Host header can be forged. */
function loopbackOrigin(protocol: string, host: string | undefined) {
  if (!host) return undefined;
  const hostname = host.startsWith('[') ? host.slice(0, host.indexOf(']') + 1) : host.split(':')[0];
  return LOOPBACK_HOSTS.has(hostname.toLowerCase()) ? `${protocol}://${host}` : undefined;
}

/**
 * Refuses unsafe requests sent by a browser from another origin (cross-site request forgery).
 * Browsers always send Origin on such requests; clients without one are not browsers. The app's
 * own origins are the configured ones (APP_ORIGIN), or, when none is set, a loopback address.
 */
export function sameOriginOnly(appOrigins: string[]): RequestHandler {
  return (req, _res, next) => {
    if (SAFE.has(req.method)) return next();
    const origin = req.get('origin');
    const fetchSite = req.get('sec-fetch-site');
    const own = appOrigins.length > 0 ? undefined : loopbackOrigin(req.protocol, req.get('host'));
    const allowed = origin === undefined ? fetchSite !== 'cross-site' : origin === own || appOrigins.includes(origin);
    if (allowed) return next();
    next(
      new AppError(
        403,
        'forbidden',
        'This request came from another site, so it was refused. Use Larderly from its own address.',
      ),
    );
  };
}
