// The local push endpoint's self-signed certificate, made once with the openssl command.
import { spawnSync } from 'node:child_process';
import { existsSync, mkdirSync } from 'node:fs';
import path from 'node:path';

/** Makes (or reuses) a certificate for 127.0.0.1 and localhost in `dir`; returns the two PEM files. */
export function ensureCertificate(dir) {
  const certFile = path.join(dir, 'push-endpoint-cert.pem');
  const keyFile = path.join(dir, 'push-endpoint-key.pem');
  if (existsSync(certFile) && existsSync(keyFile)) return { certFile, keyFile };
  mkdirSync(dir, { recursive: true });
  const result = spawnSync(
    'openssl',
    [
      'req',
      '-x509',
      '-newkey',
      'ec',
      '-pkeyopt',
      'ec_paramgen_curve:prime256v1',
      '-nodes',
      '-days',
      '825',
      '-subj',
      '/CN=Larderly local push endpoint',
      '-addext',
      'subjectAltName=IP:127.0.0.1,DNS:localhost',
      '-keyout',
      keyFile,
      '-out',
      certFile,
    ],
    { encoding: 'utf8' },
  );
  if (result.error || result.status !== 0) {
    throw new Error(
      `openssl could not make the local push endpoint's certificate (install it with: apt-get install -y openssl).\n${result.stderr ?? result.error}`,
    );
  }
  return { certFile, keyFile };
}
