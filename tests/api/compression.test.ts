import { mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import path from 'node:path';
import zlib from 'node:zlib';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { demoApp } from '../support/app';

// A built client in miniature: a script with the brotli and gzip copies the build puts beside it.
const staticDir = mkdtempSync(path.join(tmpdir(), 'larderly-static-'));
const script = `export const shelf = ${JSON.stringify(Array.from({ length: 200 }, (_, i) => `jar ${i}`))};\n`;
writeFileSync(path.join(staticDir, 'index.html'), '<!doctype html><title>Larderly</title><div id="root"></div>');
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
