import { createECDH, randomBytes } from 'node:crypto';
import { decrypt } from 'http_ece';
import type { CaughtPush } from '../../dev/stand-ins/push-endpoint';

/** What a browser keeps for one push subscription: a P-256 key pair and an auth secret. */
export function browserPushKeys() {
  const ecdh = createECDH('prime256v1');
  ecdh.generateKeys();
  const auth = randomBytes(16).toString('base64url');
  return {
    keys: { p256dh: ecdh.getPublicKey('base64url'), auth },
    /** Decrypts a caught push as the browser would (RFC 8291, aes128gcm), and reads its JSON. */
    read: (push: CaughtPush) =>
      JSON.parse(
        decrypt(Buffer.from(push.body, 'base64'), {
          version: 'aes128gcm',
          privateKey: ecdh,
          authSecret: auth,
        }).toString('utf8'),
      ),
  };
}
