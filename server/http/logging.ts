import { randomUUID } from 'node:crypto';
import type { Request, RequestHandler } from 'express';
import { pino, type DestinationStream, type Logger } from 'pino';
import type { Config } from '../config';

export type { Logger } from 'pino';

/**
 * Anything that could let a reader of the logs act as someone: cookies, credentials, tokens and
 * passwords, wherever an object logged by mistake carries them. The request lines below carry
 * none of these in the first place; this is the second lock.
 */
export const REDACTED_PATHS = [
  'req.headers.cookie',
  'req.headers.authorization',
  'req.headers["x-csrf-token"]',
  'res.headers["set-cookie"]',
  'headers.cookie',
  'headers.authorization',
  '*.password',
  '*.currentPassword',
  '*.newPassword',
  '*.token',
  '*.secret',
  '*.sessionSecret',
  '*.cookie',
  'password',
  'token',
  'cookie',
];

/** One logger per process: JSON lines on stdout (or the stream a test gives), named by the instance. */
export function createLogger(
  config: Pick<Config, 'logLevel' | 'instanceName'>,
  destination?: DestinationStream,
): Logger {
  return pino(
    {
      level: config.logLevel,
      base: { instance: config.instanceName },
      timestamp: pino.stdTimeFunctions.isoTime,
      redact: { paths: REDACTED_PATHS, censor: '[redacted]' },
    },
    destination ?? pino.destination({ dest: 1, sync: false }),
  );
}

const REQUEST_ID = /^[A-Za-z0-9._:-]{8,128}$/;

/**
 * An invitation's token and a calendar address's secret are keys: the path keeps where the request
 * went, not the key. Query strings are left out.
 */
export function loggedPath(url: string): string {
  const path = url.split('?')[0]!;
  return path
    .replace(/^(\/api\/invitations\/)[^/]+/, '$1[token]')
    .replace(/^(\/api\/calendar\/)[^/]+?(\.ics)?$/, '$1[secret]$2');
}

/**
 * One JSON line per request when its answer is sent: id, method, path, status, time, person and
 * process. The id is the one a trusted proxy (TRUST_PROXY) gave in X-Request-Id, else a new
 * UUID; the answer carries it in X-Request-Id, so a person reporting a problem can quote it.
 *
 * Our own middleware rather than pino-http's: that one made three child loggers per request (each
 * serializing its bindings) and built the line even when its level was off, about a fifth of a cached
 * read's CPU in `npm run bench:week`. Here `req.log` (the request's child logger, for errors) is made only
 * when something logs through it, and the line only when its level is on.
 */
export function requestLogger(logger: Logger, trusts: (address: string) => boolean): RequestHandler {
  return (req, res, next) => {
    const given = req.headers['x-request-id'];
    const fromProxy = typeof given === 'string' && REQUEST_ID.test(given) && trusts(req.socket.remoteAddress ?? '');
    const id = fromProxy ? given : randomUUID();
    res.setHeader('X-Request-Id', id);
    const started = Date.now();
    withLazyLog(req);
    (req as LoggedRequest)[LOGGING] = { logger, id };
    // 'close' comes once per answer, after 'finish' or when the connection went first: one listener for both.
    res.once('close', () => {
      const level = res.statusCode >= 500 ? 'error' : 'info';
      if (!logger.isLevelEnabled(level)) return;
      const path = loggedPath(req.originalUrl ?? req.url);
      const userId = (req.user as { id?: string } | undefined)?.id;
      logger[level](
        {
          reqId: id,
          req: { method: req.method, path, remoteAddress: req.ip },
          res: { statusCode: res.statusCode },
          responseTime: Date.now() - started,
          ...(userId ? { userId } : {}),
        },
        `${req.method} ${path} ${res.statusCode}`,
      );
    });
    next();
  };
}

const LOGGING = Symbol('larderly.logging');
type LoggedRequest = Request & { [LOGGING]?: { logger: Logger; id: string; child?: Logger } };

/**
 * `req.log` as a getter on the app's request prototype (each Express app has its own), set up by its first
 * request: defining it on every request cost more than the rest of the logger's work.
 */
function withLazyLog(req: Request) {
  const prototype = Object.getPrototypeOf(req) as object;
  if (Object.prototype.hasOwnProperty.call(prototype, 'log')) return;
  Object.defineProperty(prototype, 'log', {
    configurable: true,
    get(this: LoggedRequest) {
      const logging = this[LOGGING];
      if (!logging) throw new Error('req.log is there once requestLogger has run');
      return (logging.child ??= logging.logger.child({ reqId: logging.id }));
    },
  });
}

declare global {
  // eslint-disable-next-line @typescript-eslint/no-namespace
  namespace Express {
    interface Request {
      /** The request's logger: its lines carry the request's id (see requestLogger). */
      log: Logger;
    }
  }
}
