import { createApp } from './app';
import { loadConfig } from './config';
import { migrate } from './db/migrate';
import { startJobs } from './jobs';

const config = loadConfig();
const { app, ctx, sequelize, logger, beginStopping, close } = createApp(config);

// Set once each is running; a signal may come before.
const running: { jobs?: Awaited<ReturnType<typeof startJobs>>; server?: ReturnType<typeof app.listen> } = {};
let stopping: Promise<void> | undefined;

/**
 * Stop taking connections, let the requests in flight finish, stop the job runner, close the
 * pools, exit 0. All of it within SHUTDOWN_TIMEOUT_MS; past that the open connections are cut
 * and the process exits 1, so a supervisor sees that something was cut short.
 */
function shutdown(reason: string, exitCode = 0) {
  if (stopping) return stopping;
  logger.info(
    { reason, timeoutMs: config.shutdownTimeoutMs },
    `stopping (${reason}): finishing the requests in flight`,
  );
  beginStopping();
  const deadline = setTimeout(() => {
    logger.error({ reason }, `stopping: not done after ${config.shutdownTimeoutMs} ms; cutting the open connections`);
    running.server?.closeAllConnections();
    logger.flush();
    process.exit(1);
  }, config.shutdownTimeoutMs);
  deadline.unref();
  stopping = (async () => {
    const { jobs, server } = running;
    if (server) {
      const closed = new Promise<void>((resolve) => server.close(() => resolve()));
      // Keep-alive connections with nothing in flight would hold close() open: end each once its answer is out.
      server.closeIdleConnections();
      const idle = setInterval(() => server.closeIdleConnections(), 100);
      await closed;
      clearInterval(idle);
    }
    logger.info('stopping: no request in flight; stopping the job runner');
    await jobs?.stop().catch((error: Error) => logger.warn({ err: error }, 'the job runner did not stop cleanly'));
    await close();
    logger.info({ exitCode }, 'stopped');
    logger.flush(() => process.exit(exitCode));
  })();
  return stopping;
}

process.on('SIGINT', () => void shutdown('SIGINT'));
process.on('SIGTERM', () => void shutdown('SIGTERM'));
// A promise nobody awaited failed: the process may hold a half-done state, so it is logged and stopped.
process.on('unhandledRejection', (reason) => {
  logger.fatal({ err: reason }, 'unhandled promise rejection; stopping');
  void shutdown('unhandledRejection', 1);
});
process.on('uncaughtException', (error) => {
  logger.fatal({ err: error }, 'uncaught exception; stopping');
  void shutdown('uncaughtException', 1);
});

await migrate(sequelize);
// The VAPID key pair is made on the first start (unless the environment gives one) and kept.
await ctx.push.publicKey();
running.jobs = await startJobs(ctx);

const server = app.listen(config.port, config.host, () => {
  const address = server.address();
  const port = typeof address === 'object' && address ? address.port : config.port;
  logger.info({ port }, `serving on http://${config.host}:${port}`);
});
// Answers in flight are finished before close() returns; a client that sends nothing is not waited for long.
server.headersTimeout = 20_000;
server.requestTimeout = 60_000;
running.server = server;
