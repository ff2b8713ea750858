import { createApp } from './app';
import { loadConfig } from './config';
import { migrate } from './db/migrate';
import { startJobs } from './jobs';

const config = loadConfig();
const { app, ctx, sequelize, close } = createApp(config);
await migrate(sequelize);
// The VAPID key pair is made on the first start (unless the environment gives one) and kept.
await ctx.push.publicKey();
const jobs = await startJobs(ctx);

const server = app.listen(config.port, config.host, () => {
  const address = server.address();
  const port = typeof address === 'object' && address ? address.port : config.port;
  console.log(`larderly: serving on http://${config.host}:${port}`);
});

function shutdown(signal: string) {
  console.log(`larderly: ${signal}, closing`);
  server.close(() => void jobs.stop().then(close).then(() => process.exit(0)));
  setTimeout(() => process.exit(0), 5_000).unref();
}
process.on('SIGINT', () => shutdown('SIGINT'));
process.on('SIGTERM', () => shutdown('SIGTERM'));
