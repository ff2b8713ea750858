import { readFileSync, readdirSync } from 'node:fs';
import { fileURLToPath } from 'node:url';
import { describe, expect, it } from 'vitest';

const domainFolder = fileURLToPath(new URL('../../shared/domain/', import.meta.url));
const sources = readdirSync(domainFolder).filter((file) => file.endsWith('.ts'));
const importsOf = (file: string) =>
  [...readFileSync(domainFolder + file, 'utf8').matchAll(/\bfrom\s+['"]([^'"]+)['"]|\bimport\s*\(?\s*['"]([^'"]+)['"]/g)].map(
    (match) => match[1] ?? match[2],
  );

// The issue's own condition: the domain core is shared by client and server, so it depends on neither.
describe('shared/domain stays pure', () => {
  it.each(sources)('%s imports only its neighbours (or date-fns)', (file) => {
    for (const specifier of importsOf(file)) {
      expect(specifier.startsWith('./') || specifier === 'date-fns').toBe(true);
    }
  });

  it('has a source file to check', () => {
    expect(sources).toContain('index.ts');
  });
});
