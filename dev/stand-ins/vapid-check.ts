import { createPublicKey, verify } from 'node:crypto';

export interface VapidClaims {
  aud: string;
  exp: number;
  sub: string;
}

/** Why a push request's VAPID header is not acceptable, or the verified claims and key (RFC 8292). */
export function checkVapid(
  authorization: string | undefined,
  audience: string,
  nowSeconds = Math.floor(Date.now() / 1000),
): { ok: true; claims: VapidClaims; publicKey: string } | { ok: false; reason: string } {
  const match = /^vapid t=([^,\s]+),\s*k=([A-Za-z0-9_-]+)$/.exec(authorization ?? '');
  if (!match) return { ok: false, reason: 'Authorization must be "vapid t=<JWT>, k=<public key>"' };
  const [, jwt, key] = match;
  const raw = Buffer.from(key, 'base64url');
  if (raw.length !== 65 || raw[0] !== 4) return { ok: false, reason: 'k is not an uncompressed P-256 public key' };
  const [head, payload, signature] = jwt.split('.');
  if (!signature) return { ok: false, reason: 't is not a signed JWT' };
  const header = JSON.parse(Buffer.from(head, 'base64url').toString('utf8')) as { alg?: string };
  if (header.alg !== 'ES256') return { ok: false, reason: 'the JWT must be signed with ES256' };
  const publicKey = createPublicKey({
    key: {
      kty: 'EC',
      crv: 'P-256',
      x: raw.subarray(1, 33).toString('base64url'),
      y: raw.subarray(33).toString('base64url'),
    },
    format: 'jwk',
  });
  const signed = verify(
    'sha256',
    Buffer.from(`${head}.${payload}`),
    { key: publicKey, dsaEncoding: 'ieee-p1363' },
    Buffer.from(signature, 'base64url'),
  );
  if (!signed) return { ok: false, reason: 'the JWT signature does not match k' };
  const claims = JSON.parse(Buffer.from(payload, 'base64url').toString('utf8')) as VapidClaims;
  if (claims.aud !== audience) return { ok: false, reason: `aud must be ${audience}` };
  if (typeof claims.exp !== 'number' || claims.exp <= nowSeconds || claims.exp > nowSeconds + 24 * 60 * 60)
    return { ok: false, reason: 'exp must be in the next 24 hours' };
  if (!/^(mailto:|https:)/.test(claims.sub ?? ''))
    return { ok: false, reason: 'sub must be a mailto: or https: contact' };
  return { ok: true, claims, publicKey: key };
}
