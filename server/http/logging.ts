import { randomUUID } from 'node:crypto';
import type { IncomingMessage, ServerResponse } from 'node:http';
import type { Request } from 'express';
import { pino, type DestinationStream, type Logger } from 'pino';
import { pinoHttp } from 'pino-http';
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
 */
export function requestLogger(logger: Logger, trusts: (address: string) => boolean) {
  return pinoHttp({
    logger,
    quietReqLogger: true,
    genReqId(req: IncomingMessage, res: ServerResponse) {
      const given = req.headers['x-request-id'];
      const fromProxy = typeof given === 'string' && REQUEST_ID.test(given) && trusts(req.socket.remoteAddress ?? '');
      const id = fromProxy ? given : randomUUID();
      res.setHeader('X-Request-Id', id);
      return id;
    },
    serializers: {
      req: (req: { method: string; url: string; raw: Request }) => ({
        method: req.method,
        path: loggedPath(req.raw.originalUrl ?? req.url),
        remoteAddress: req.raw.ip,
      }),
      res: (res: { statusCode: number }) => ({ statusCode: res.statusCode }),
    },
    customProps: (req: IncomingMessage) => {
      const user = (req as Request).user as { id?: string } | undefined;
      return user?.id ? { userId: user.id } : {};
    },
    customLogLevel: (_req, res, error) => (error || res.statusCode >= 500 ? 'error' : 'info'),
    customSuccessMessage: (req, res) =>
      `${req.method} ${loggedPath((req as Request).originalUrl ?? req.url ?? '')} ${res.statusCode}`,
    customErrorMessage: (req, res) =>
      `${req.method} ${loggedPath((req as Request).originalUrl ?? req.url ?? '')} ${res.statusCode}`,
  });
}
