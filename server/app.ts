import express, { Router } from 'express';
import pg from 'pg';
import { configurePassport } from './auth/passport';
import { sessionMiddleware } from './auth/session';
import type { Config } from './config';
import { acquireDatabase } from './db/sequelize';
import { compressAnswers } from './http/compress-answers';
import { errorHandler, notFoundHandler } from './http/errors';
import { createLogger, requestLogger, type Logger } from './http/logging';
import { createReadCache } from './http/read-cache';
import { sameOriginOnly } from './http/same-origin';
import { securityHeaders } from './http/security-headers';
import { staticClient } from './http/static-client';
import { authRouter } from './routes/auth';
import { backupImportRouter, IMPORT_PATH } from './routes/backup';
import { healthRouter } from './routes/health';
import { publicConfigRouter } from './routes/public-config';
import { calendarFeedRouter } from './routes/calendar';
import { householdsRouter } from './routes/households';
import { jarCodesRouter } from './routes/jars';
import { householdFeatureRouters } from './routes/index';
import { acceptInvitationRouter } from './routes/invitations';
import { meNotificationsRouter } from './routes/me-notifications';
import { pushRouter } from './routes/push';
import { createMailer } from './services/mail/mailer';
import { photoStorageFor } from './services/photo-storage';
import { createPushSender } from './services/push/push-sender';
import type { AppContext } from './context';

/** Builds the Express app and its connections; tests mount it without listening. */
export function createApp(config: Config, options: { authLimit?: number; logger?: Logger } = {}) {
  const logger = options.logger ?? createLogger(config);
  let stopping = false;
  const database = acquireDatabase(config.databaseUrl, config.dbPoolMax);
  const { sequelize } = database;
  const sessionPool = new pg.Pool({ connectionString: config.databaseUrl, max: 5, connectionTimeoutMillis: 3_000 });
  sessionPool.on('error', () => {});
  const passport = configurePassport(config.bcryptCost);
  const ctx: AppContext = {
    config,
    sequelize,
    mailer: createMailer(config),
    push: createPushSender(config, logger),
    photos: photoStorageFor(config),
    readCache: createReadCache(),
    log: logger,
  };

  const app = express();
  app.disable('x-powered-by');
  if (config.trustProxy !== undefined) app.set('trust proxy', config.trustProxy);
  // Express's own reading of TRUST_PROXY: X-Forwarded-* and X-Request-Id count only from those peers.
  const trusts = app.get('trust proxy fn') as (address: string, hop: number) => boolean;
  app.use(requestLogger(logger, (address) => trusts(address, 0)));
  app.use(securityHeaders(config));

  // Answers over 1 KB go out compressed (engaged by res.send once the size is known); the built client's files
  // were compressed at build time, and the middleware covers the rest of what it sends.
  const compressFiles = compressAnswers(app);
  const api = Router();
  // Health checks and the public configuration read no session (and are asked for by their exact address).
  const unsigned = Router();
  unsigned.use(healthRouter(sequelize, ctx.photos, () => stopping));
  unsigned.use(publicConfigRouter(config));
  // Their addresses, read from the routers themselves: /health, /ready and /config.
  type Layer = { handle: { stack?: Layer[] }; route?: { path?: unknown } };
  const UNSIGNED = new Set(
    (unsigned.stack as Layer[]).flatMap((router) => (router.handle.stack ?? []).map((layer) => layer.route?.path)),
  );
  const unsignedOnly: express.RequestHandler = (req, res, next) =>
    UNSIGNED.has(req.path) ? unsigned(req, res, next) : next();
  // Listed like a router's own layers, so whoever walks the app's routes (the authorization matrix) finds them.
  api.use(Object.assign(unsignedOnly, { stack: [{ handle: unsigned }] }));
  // Calendar apps fetch with the secret in the address and no session: no cookie is read or set.
  api.use('/calendar', calendarFeedRouter(config));
  const json = express.json({ limit: '1mb' });
  const sameOrigin = sameOriginOnly(config.appOrigins);
  api.use((req, res, next) => {
    // Household answers are one person's view: never kept by a shared cache or the browser's back-forward store.
    res.setHeader('Cache-Control', 'private, no-store');
    // A GET or HEAD has no body to read and is never refused for its origin (same-origin.ts); a backup import may
    // be up to 10 MB, and its own route reads it once the person is signed in.
    if (req.method === 'GET' || req.method === 'HEAD') return next();
    sameOrigin(req, res, (refused?: unknown) => {
      if (refused) return next(refused);
      if (req.method === 'POST' && req.path === IMPORT_PATH) return next();
      json(req, res, next);
    });
  });
  api.use(
    sessionMiddleware({
      pool: sessionPool,
      secret: config.sessionSecret,
      secure: config.appOrigins.some((o) => o.startsWith('https:')),
      passport,
    }),
  );
  const authLimit = options.authLimit ?? config.authRateLimit;
  api.use('/auth', authRouter(ctx, { authLimit }));
  api.use('/households', householdsRouter(sequelize));
  api.use('/households', backupImportRouter(ctx));
  api.use('/jars', jarCodesRouter());
  api.use('/households/:hid', householdFeatureRouters(ctx));
  api.use('/push', pushRouter(ctx));
  api.use('/me', meNotificationsRouter());
  api.use('/invitations', acceptInvitationRouter(ctx, { authLimit }));
  api.use(notFoundHandler);
  app.use('/api', api);

  const client = staticClient(config.staticDir);
  if (client) app.use(compressFiles, client);
  app.use(errorHandler({ exposeInternals: !config.isProduction }));

  return {
    app,
    ctx,
    sequelize,
    logger,
    /** From now on /api/ready answers 503, so a balancer stops sending new work here. */
    beginStopping() {
      stopping = true;
    },
    async close() {
      ctx.mailer.close();
      await Promise.allSettled([database.release(), sessionPool.end()]);
    },
  };
}
