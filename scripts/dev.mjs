// `npm run dev`: Vite with hot reload beside the API, which restarts when server code changes.
import { ensureNodeModules, startChild } from './lib/system.mjs';
import { startCluster } from './lib/postgres.mjs';
import { startStandIns } from './lib/stand-ins.mjs';

ensureNodeModules();
const { ensureDatabase, persistentSecret, setUpSchema } = await import('./lib/database.mjs');
const cluster = startCluster();
await ensureDatabase(cluster, 'larderly');
setUpSchema(cluster.url('larderly'), { seedDemo: true });
const standIns = process.env.SMTP_HOST ? null : await startStandIns(cluster);

const apiPort = process.env.API_PORT ?? '3001';
const api = startChild(process.execPath, ['--import', 'tsx', '--watch', 'server/index.ts'], {
  env: {
    ...process.env,
    NODE_ENV: 'development',
    DATABASE_URL: cluster.url('larderly'),
    SESSION_SECRET: persistentSecret(cluster, 'session-secret'),
    PORT: apiPort,
    STATIC_DIR: 'no-static-in-dev',
    ...standIns?.env,
  },
});
const vite = startChild(process.execPath, ['node_modules/vite/bin/vite.js'], {
  env: { ...process.env, API_PORT: apiPort },
});
const stop = () => {
  api.kill('SIGTERM');
  vite.kill('SIGTERM');
  standIns?.child.kill('SIGTERM');
  cluster.stop();
  process.exit(0);
};
process.on('SIGINT', stop);
process.on('SIGTERM', stop);
