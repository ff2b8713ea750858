// The local stand-ins `npm start` runs beside the app: an SMTP catcher, a Web Push endpoint and an S3-compatible object store.
// Prints one JSON line with their addresses, then keeps running until stopped.
import path from 'node:path';
import { ensureCertificate } from './certificate.mjs';
import { startObjectStore } from './object-store.mjs';
import { startMailCatcher } from './mail-catcher';
import { startPushEndpoint } from './push-endpoint';

const dir = process.env.STAND_IN_DIR;
if (!dir) throw new Error('STAND_IN_DIR is not set');
const { certFile, keyFile } = ensureCertificate(dir);
const mail = await startMailCatcher({ dir: path.join(dir, 'mail') });
const push = await startPushEndpoint({ certFile, keyFile, dir: path.join(dir, 'push') });
const objects = await startObjectStore(path.join(dir, 'object-store'));
process.stdout.write(
  `${JSON.stringify({ smtpPort: mail.port, mailDir: path.join(dir, 'mail'), pushOrigin: push.origin, certFile, objectStore: { env: objects.env, directory: objects.directory } })}\n`,
);

const stop = () => void Promise.all([mail.close(), push.close(), objects.close()]).then(() => process.exit(0));
process.on('SIGTERM', stop);
process.on('SIGINT', stop);
