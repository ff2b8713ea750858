// Starts the local SMTP catcher, Web Push endpoint and object store beside the app (development only).
import path from 'node:path';
import { createInterface } from 'node:readline';
import { startChild } from './system.mjs';

/**
 * Runs dev/stand-ins/main.ts with its files beside the database cluster, waits for its
 * addresses, and returns the settings the server needs to send through it.
 */
export async function startStandIns(cluster) {
  const dir = path.join(path.dirname(cluster.dataDir), 'stand-ins');
  const child = startChild(process.execPath, ['--import', 'tsx', 'dev/stand-ins/main.ts'], {
    env: { ...process.env, STAND_IN_DIR: dir },
    stdio: ['ignore', 'pipe', 'inherit'],
  });
  const lines = createInterface({ input: child.stdout });
  const ready = await new Promise((resolve, reject) => {
    lines.once('line', (line) => resolve(JSON.parse(line)));
    child.once('exit', (code) =>
      reject(new Error(`the local mail catcher and push endpoint stopped while starting (exit ${code}).`)),
    );
  });
  lines.on('line', (line) => process.stdout.write(`${line}\n`));
  // A mail server or bucket set in the environment wins over its stand-in.
  const mail = process.env.SMTP_HOST
    ? {}
    : {
        SMTP_HOST: '127.0.0.1',
        SMTP_PORT: String(ready.smtpPort),
        SMTP_SECURE: 'false',
        MAIL_CATCHER_DIR: ready.mailDir,
      };
  const objects = process.env.S3_BUCKET ? {} : ready.objectStore.env;
  return {
    child,
    env: { ...mail, PUSH_CA_FILE: ready.certFile, PUSH_LOCAL_ORIGIN: ready.pushOrigin, ...objects },
    describe: [
      process.env.SMTP_HOST ? null : `mail catcher on 127.0.0.1:${ready.smtpPort}`,
      `push endpoint at ${ready.pushOrigin}`,
      process.env.S3_BUCKET
        ? null
        : `object store (S3) at ${ready.objectStore.env.S3_ENDPOINT}, bucket ${ready.objectStore.env.S3_BUCKET}, objects in ${ready.objectStore.directory}`,
    ]
      .filter(Boolean)
      .join(', '),
  };
}
