import { randomInt } from 'node:crypto';

/** Crockford's base32: no I, L, O or U, so a code read off a label cannot be mistaken. */
const CROCKFORD = '0123456789ABCDEFGHJKMNPQRSTVWXYZ';
export const JAR_CODE_LENGTH = 6;

export function newJarCode(): string {
  let code = '';
  for (let i = 0; i < JAR_CODE_LENGTH; i += 1) code += CROCKFORD[randomInt(CROCKFORD.length)];
  return code;
}

/** Reads a code the way Crockford decoding does: any case, O as 0, I and L as 1, hyphens ignored. */
export function normaliseJarCode(raw: string): string | null {
  const code = raw.toUpperCase().replaceAll('-', '').replaceAll('O', '0').replace(/[IL]/g, '1');
  return code.length === JAR_CODE_LENGTH && [...code].every((c) => CROCKFORD.includes(c)) ? code : null;
}
