import { spawnSync } from 'node:child_process';
import { describe, expect, it } from 'vitest';

describe('the production dependency tree', () => {
  it('is clean by `npm ls --omit=dev`: nothing missing, invalid or extraneous', () => {
    const ls = spawnSync('npm', ['ls', '--omit=dev', '--all'], { encoding: 'utf8' });
    expect(ls.stderr).not.toMatch(/ERR!|missing|invalid|extraneous/i);
    // Optional platform builds (esbuild for other systems, pg-native) are absent by design.
    expect(ls.stdout).not.toMatch(/UNMET (?!OPTIONAL)|invalid|extraneous/i);
    expect(ls.status).toBe(0);
  }, 60_000);
});
