// The local S3-compatible object store `npm start` and `npm test` run on loopback (s3rver),
// with its objects in a folder of the project's data directory and the photo bucket made.
import { spawn } from 'node:child_process';
import { mkdirSync } from 'node:fs';
import { createRequire } from 'node:module';
import { createInterface } from 'node:readline';
import { fileURLToPath } from 'node:url';

export const LOCAL_BUCKET = 'larderly-photos';
// s3rver knows one account; any S3 client signs with these.
const LOCAL_KEY = 'S3RVER';

/**
 * Starts s3rver on a free loopback port. The real store's bucket is private, and s3rver
 * would answer unsigned requests, so this one refuses them too: only signed requests
 * (the app's own) read or write.
 */
export async function startObjectStore(directory, port = 0) {
  mkdirSync(directory, { recursive: true });
  const S3rver = createRequire(import.meta.url)('s3rver');
  const store = new S3rver({
    address: '127.0.0.1',
    port,
    silent: true,
    directory,
    configureBuckets: [{ name: LOCAL_BUCKET }],
  });
  store.middleware.unshift(async (ctx, next) => {
    const signed = 'authorization' in ctx.headers || 'X-Amz-Algorithm' in ctx.query;
    if (!signed) {
      ctx.status = 403;
      ctx.type = 'application/xml';
      ctx.body =
        '<?xml version="1.0" encoding="UTF-8"?>\n<Error><Code>AccessDenied</Code><Message>Access Denied</Message></Error>';
      return;
    }
    await next();
  });
  const { port: boundPort } = await store.run();
  const endpoint = `http://127.0.0.1:${boundPort}`;
  return {
    endpoint,
    directory,
    env: {
      S3_ENDPOINT: endpoint,
      S3_BUCKET: LOCAL_BUCKET,
      S3_REGION: 'us-east-1',
      S3_ACCESS_KEY_ID: LOCAL_KEY,
      S3_SECRET_ACCESS_KEY: LOCAL_KEY,
      S3_FORCE_PATH_STYLE: 'true',
    },
    close: () => store.close(),
  };
}

/** The same store in a child process, for callers that block their own event loop (`npm test` waits on vitest). */
export async function spawnObjectStore(directory) {
  const child = spawn(process.execPath, [fileURLToPath(import.meta.url), directory], {
    stdio: ['ignore', 'pipe', 'inherit'],
  });
  const ready = await new Promise((resolve, reject) => {
    createInterface({ input: child.stdout }).once('line', (line) => resolve(JSON.parse(line)));
    child.once('exit', (code) => reject(new Error(`the local object store stopped while starting (exit ${code}).`)));
  });
  return {
    ...ready,
    close: () =>
      new Promise((resolve) => {
        if (child.exitCode !== null) return resolve();
        child.once('exit', resolve);
        child.kill('SIGTERM');
      }),
  };
}

if (process.argv[1] === fileURLToPath(import.meta.url)) {
  const store = await startObjectStore(process.argv[2]);
  process.stdout.write(`${JSON.stringify({ endpoint: store.endpoint, directory: store.directory, env: store.env })}\n`);
  const stop = () => void store.close().then(() => process.exit(0));
  process.on('SIGTERM', stop);
  process.on('SIGINT', stop);
}
