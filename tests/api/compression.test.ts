import { mkdirSync, mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import path from 'node:path';
import zlib from 'node:zlib';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { demoApp } from '../support/app';

// A built client in miniature: a script with the brotli and gzip copies the build puts beside it.
const staticDir = mkdtempSync(path.join(tmpdir(), 'larderly-static-'));
const script = `export const shelf = ${JSON.stringify(Array.from({ length: 200 }, (_, i) => `jar ${i}`))};\n`;
writeFileSync(
  path.join(staticDir, 'index.html'),
  '<!doctype html><head><title>Larderly</title><script type="module" crossorigin src="/main-abc123.js"></script></head><div id="root"></div>',
);
// The build manifest the page hints are computed from: the entry, the offline restore, the layouts and two screens.
mkdirSync(path.join(staticDir, '.vite'));
writeFileSync(
  path.join(staticDir, '.vite', 'manifest.json'),
  JSON.stringify({
    'index.html': { file: 'main-abc123.js', imports: ['_common.js'] },
    _common: { file: 'common-1.js' },
    '_common.js': { file: 'common-1.js' },
    'src/app/restore-offline.ts': { file: 'restore-offline-1.js', imports: ['_common.js'] },
    'src/app/layouts/require-auth.tsx': { file: 'require-auth-1.js' },
    'src/app/layouts/app-layout.tsx': { file: 'app-layout-1.js' },
    'src/app/routes/shelf.tsx': { file: 'shelf-1.js', imports: ['_fuse.js'] },
    '_fuse.js': { file: 'fuse-1.js' },
    'src/app/routes/sign-in.tsx': { file: 'sign-in-1.js' },
  }),
);
writeFileSync(path.join(staticDir, 'main-abc123.js'), script);
writeFileSync(path.join(staticDir, 'main-abc123.js.br'), zlib.brotliCompressSync(script));
writeFileSync(path.join(staticDir, 'main-abc123.js.gz'), zlib.gzipSync(script));

let ctx: Awaited<ReturnType<typeof demoApp>>;
beforeAll(async () => {
  ctx = await demoApp({ STATIC_DIR: staticDir });
});
afterAll(async () => {
  await ctx.close();
  rmSync(staticDir, { recursive: true, force: true });
});

// supertest decodes br and gzip as a browser does, so a body read here is what the page gets.

describe('the built client goes out precompressed', () => {
  it('sends the brotli copy to a browser that accepts br, with Content-Encoding, Vary and the script type', async () => {
    const response = await ctx.request.get('/main-abc123.js').set('Accept-Encoding', 'gzip, deflate, br');
    expect(response.status).toBe(200);
    expect(response.headers['content-encoding']).toBe('br');
    expect(response.headers.vary).toMatch(/Accept-Encoding/i);
    expect(response.headers['content-type']).toMatch(/javascript/);
    expect(response.headers['cache-control']).toMatch(/immutable/);
    expect(response.text).toBe(script);
  });

  it('sends the gzip copy to a browser that accepts only gzip, and the file as it is to one that accepts neither', async () => {
    const gzipped = await ctx.request.get('/main-abc123.js').set('Accept-Encoding', 'gzip');
    expect(gzipped.headers['content-encoding']).toBe('gzip');
    expect(gzipped.text).toBe(script);
    const plain = await ctx.request.get('/main-abc123.js').set('Accept-Encoding', 'identity');
    expect(plain.headers['content-encoding']).toBeUndefined();
    expect(plain.text).toBe(script);
  });

  it('still answers every screen address with index.html, never cached', async () => {
    const response = await ctx.request.get('/h/some-household/week');
    expect(response.status).toBe(200);
    expect(response.headers['cache-control']).toBe('no-cache');
    expect(response.text).toContain('<div id="root">');
  });
});

describe("each screen's page names its code and first reads, so they load at once", () => {
  const hid = '7d0c3c1e-2b1a-4c5d-9e8f-0a1b2c3d4e5f';

  it("links a signed-in screen's chunks, with their imports, and its first API reads, but not what the entry loads", async () => {
    const response = await ctx.request.get(`/h/${hid}/shelf`);
    expect(response.status).toBe(200);
    expect(response.headers['cache-control']).toBe('no-cache');
    const links = [...response.text.matchAll(/<link rel="(\w+)"(?: as="fetch")? crossorigin href="([^"]+)">/g)].map(
      ([, rel, href]) => `${rel} ${href}`,
    );
    expect(links).toEqual([
      'modulepreload /restore-offline-1.js',
      'modulepreload /require-auth-1.js',
      'modulepreload /app-layout-1.js',
      'modulepreload /shelf-1.js',
      'modulepreload /fuse-1.js',
      'preload /api/auth/me',
      `preload /api/households/${hid}`,
      `preload /api/households/${hid}/jars`,
      `preload /api/households/${hid}/products`,
      `preload /api/households/${hid}/gifts`,
      `preload /api/households/${hid}/places`,
    ]);
  });

  it('gives sign-in only its own chunk and the session read, none of the signed-in screens', async () => {
    const response = await ctx.request.get('/sign-in');
    expect(response.text).toContain('href="/sign-in-1.js"');
    expect(response.text).toContain('href="/api/auth/me"');
    expect(response.text).not.toMatch(/app-layout|require-auth|households/);
  });

  it('writes no hint for an address whose household is not an id, and answers a repeated request with 304', async () => {
    const odd = await ctx.request.get('/h/<script>/shelf');
    expect(odd.text).not.toContain('modulepreload');
    expect(odd.text).not.toContain('<script>/');
    const first = await ctx.request.get(`/h/${hid}`);
    expect(first.headers.etag).toBeTruthy();
    const again = await ctx.request.get(`/h/${hid}`).set('If-None-Match', first.headers.etag!);
    expect(again.status).toBe(304);
  });
});

describe('JSON answers go out compressed', () => {
  it('compresses a household read over 1 KB for a browser that asks, and the body is the same answer', async () => {
    const cook = await ctx.signedIn('cook@larderly.test');
    const week = `/api/households/${ctx.householdId}/week`;
    const plain = await cook.get(week).set('Accept-Encoding', 'identity');
    expect(plain.headers['content-encoding']).toBeUndefined();
    expect(plain.text.length).toBeGreaterThan(1024);
    const compressed = await cook.get(week).set('Accept-Encoding', 'br, gzip');
    expect(compressed.headers['content-encoding']).toBe('br');
    expect(compressed.headers.vary).toMatch(/Accept-Encoding/i);
    expect(compressed.body).toEqual(plain.body);
  });

  it('compresses other JSON answers over 1 KB with gzip through the middleware', async () => {
    const cook = await ctx.signedIn('cook@larderly.test');
    const response = await cook.get(`/api/households/${ctx.householdId}/products`).set('Accept-Encoding', 'gzip');
    expect(response.status).toBe(200);
    expect(response.headers['content-encoding']).toBe('gzip');
    expect(response.body.products.length).toBeGreaterThan(0);
  });
});

describe('answers sent whole are compressed in one call', () => {
  it('compresses a write’s answer, a large answer and a CSV for a client that asks, each the same as sent plain', async () => {
    const keeper = await ctx.signedIn('keeper@larderly.test');
    const base = `/api/households/${ctx.householdId}`;
    const todo = ((await keeper.get(`${base}/todos`)).body.todos as { id: string; kind: string; position: number }[])
      .filter((t) => t.kind === 'restock')
      .at(0)!;
    const move = (encoding: string) =>
      keeper.patch(`${base}/todos/${todo.id}`).set('Accept-Encoding', encoding).send({ position: todo.position });
    const [plain, br, gzip] = [await move('identity'), await move('br'), await move('gzip, deflate')];
    expect(plain.headers['content-encoding']).toBeUndefined();
    expect(plain.text.length).toBeGreaterThan(1024);
    expect([br.headers['content-encoding'], gzip.headers['content-encoding']]).toEqual(['br', 'gzip']);
    expect(br.headers.vary).toMatch(/Accept-Encoding/i);
    expect(br.headers['content-type']).toBe('application/json; charset=utf-8');
    expect([br.body, gzip.body]).toEqual([plain.body, plain.body]);

    // The household's backup is over 64 KB: compressed on zlib's threads, the same JSON.
    const backupPlain = await keeper.get(`${base}/backup`).set('Accept-Encoding', 'identity');
    expect(backupPlain.status).toBe(200);
    expect(backupPlain.text.length).toBeGreaterThan(64 * 1024);
    const backupBr = await keeper.get(`${base}/backup`).set('Accept-Encoding', 'br');
    expect(backupBr.headers['content-encoding']).toBe('br');
    expect(Number(backupBr.headers['content-length'])).toBeLessThan(backupPlain.text.length / 3);
    // Two downloads differ only in when each was made.
    expect({ ...backupBr.body, exportedAt: null }).toEqual({ ...backupPlain.body, exportedAt: null });

    const csv = await keeper.get(`${base}/shelf.csv`).set('Accept-Encoding', 'gzip');
    expect(csv.headers['content-type']).toMatch(/^text\/csv; charset=utf-8/);
    expect(csv.headers['content-encoding']).toBe('gzip');
    expect(csv.text).toBe((await keeper.get(`${base}/shelf.csv`).set('Accept-Encoding', 'identity')).text);
  });
});
