import os from 'node:os';
import path from 'node:path';
import { ensureCertificate } from '../../dev/stand-ins/certificate.mjs';
import { startMailCatcher } from '../../dev/stand-ins/mail-catcher';
import { startPushEndpoint } from '../../dev/stand-ins/push-endpoint';
import { freePort } from './ports';

/** The local SMTP catcher and push endpoint on free loopback ports, inside the test process. */
export async function startStandIns(dir?: string) {
  const { certFile, keyFile } = ensureCertificate(path.join(os.tmpdir(), 'larderly-test-push-certificate'));
  const mail = await startMailCatcher({ port: await freePort(), dir: dir && path.join(dir, 'mail') });
  const push = await startPushEndpoint({
    certFile,
    keyFile,
    port: await freePort(),
    dir: dir && path.join(dir, 'push'),
  });
  return {
    mail,
    push,
    certFile,
    /** what the app needs to send through them */
    env: {
      SMTP_HOST: '127.0.0.1',
      SMTP_PORT: String(mail.port),
      SMTP_SECURE: 'false',
      SMTP_FROM: 'Larderly <reminders@larderly.test>',
      PUSH_CA_FILE: certFile,
      PUSH_LOCAL_ORIGIN: push.origin,
    },
    close: () => Promise.all([mail.close(), push.close()]),
  };
}

export type StandIns = Awaited<ReturnType<typeof startStandIns>>;
