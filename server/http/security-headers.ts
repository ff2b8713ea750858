import type { RequestHandler } from 'express';
import helmet from 'helmet';
import type { Config } from '../config';

/** helmet's headers for this app: the content security policy, HSTS when served over https, and its other defaults. */
function helmetFor(config: Config) {
  return helmet({
    contentSecurityPolicy: {
      directives: {
        defaultSrc: ["'self'"],
        imgSrc: ["'self'", 'data:', 'blob:'],
        styleSrc: ["'self'", "'unsafe-inline'"],
        fontSrc: ["'self'"],
        connectSrc: ["'self'"],
        workerSrc: ["'self'"],
        frameAncestors: ["'none'"],
        upgradeInsecureRequests:
          config.isProduction && config.appOrigins.some((o) => o.startsWith('https:')) ? [] : null,
      },
    },
    strictTransportSecurity: config.appOrigins.some((o) => o.startsWith('https:')),
  });
}

/**
 * The headers helmet sets, worked out once: with no per-request directive (no nonce) they are the same for every
 * answer, so each request gets them in one loop instead of helmet's fourteen small middlewares. With the
 * instance's own name, which says which app process answered.
 */
export function securityHeaders(config: Config): RequestHandler {
  const headers: [string, string][] = [['X-Larderly-Instance', config.instanceName]];
  const recorder = {
    setHeader: (name: string, value: string | number) => void headers.push([name, String(value)]),
    removeHeader: () => {},
  };
  let ran = false;
  helmetFor(config)({} as never, recorder as never, () => (ran = true));
  if (!ran) throw new Error('helmet did not set its headers at once');
  return (_req, res, next) => {
    for (const [name, value] of headers) res.setHeader(name, value);
    next();
  };
}

/** helmet as it runs per request, for the test that compares the two. */
export const helmetPerRequest = helmetFor;
