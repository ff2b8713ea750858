// The local stand-ins `npm start` runs beside the app: an SMTP catcher and a Web Push endpoint.
// Prints one JSON line with their addresses, then keeps running until stopped.
import path from 'node:path';
import { ensureCertificate } from './certificate.mjs';
import { startMailCatcher } from './mail-catcher';
import { startPushEndpoint } from './push-endpoint';

const dir = process.env.STAND_IN_DIR;
if (!dir) throw new Error('STAND_IN_DIR is not set');
const { certFile, keyFile } = ensureCertificate(dir);
const mail = await startMailCatcher({ dir: path.join(dir, 'mail') });
const push = await startPushEndpoint({ certFile, keyFile, dir: path.join(dir, 'push') });
process.stdout.write(`${JSON.stringify({ smtpPort: mail.port, mailDir: path.join(dir, 'mail'), pushOrigin: push.origin, certFile })}\n`);

const stop = () => void Promise.all([mail.close(), push.close()]).then(() => process.exit(0));
process.on('SIGTERM', stop);
process.on('SIGINT', stop);
