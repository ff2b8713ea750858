// Types for the http_ece package (1.2.1 ships none); only the decryption the push tests use.
declare module 'http_ece' {
  import type { ECDH } from 'node:crypto';
  export function decrypt(
    buffer: Buffer,
    params: { version: 'aes128gcm'; privateKey: ECDH; authSecret: string | Buffer },
  ): Buffer;
}
