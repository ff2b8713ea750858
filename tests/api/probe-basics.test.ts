import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { demoApp } from '../support/app';
import { bareApp } from '../support/bare-app';

let ctx: Awaited<ReturnType<typeof demoApp>>;
let keeper: Awaited<ReturnType<typeof ctx.signedIn>>;
beforeAll(async () => {
  ctx = await demoApp();
  keeper = await ctx.signedIn('keeper@larderly.test');
});
afterAll(() => ctx.close());

describe('calendar dates', () => {
  it('refuses 2026-02-30 in a to-do and a batch with a clear 400, never a database error', async () => {
    const todo = await keeper
      .post(`/api/households/${ctx.householdId}/todos`)
      .send({ title: 'Buy lids', dueOn: '2026-02-30' });
    expect(todo.status).toBe(400);
    expect(todo.body.error.fields.dueOn).toMatch(/real date/);
    const products = (await keeper.get(`/api/households/${ctx.householdId}/products`)).body.products;
    const batch = await keeper.post(`/api/households/${ctx.householdId}/batches`).send({
      productId: products[0].id,
      cannedOn: '2026-02-30',
      jarSize: 'pint',
      jarsFilled: 2,
      jarsSealed: 2,
      method: 'boiling-water',
    });
    expect(batch.status).toBe(400);
    expect(batch.body.error.fields.cannedOn).toMatch(/real date/);
    expect(
      (await keeper.post(`/api/households/${ctx.householdId}/todos`).send({ title: 'Buy lids', dueOn: '2028-02-29' }))
        .status,
    ).toBe(201);
  });
});

describe('household answers and caches', () => {
  it('marks household API answers Cache-Control: private, no-store', async () => {
    for (const path of ['', '/members', '/todos', '/fridge']) {
      const response = await keeper.get(`/api/households/${ctx.householdId}${path}`);
      expect(response.status, path).toBe(200);
      expect(response.headers['cache-control'], path).toBe('private, no-store');
    }
  });
});

describe('same-origin check without APP_ORIGIN', () => {
  it("refuses an Origin that only matches a forged Host header, and allows the loopback host's own", async () => {
    const forged = await ctx.request
      .post('/api/auth/login')
      .set('Host', 'larder.attacker.example')
      .set('Origin', 'http://larder.attacker.example')
      .send({ email: 'keeper@larderly.test', password: 'x' });
    expect(forged.status).toBe(403);
    const own = await ctx.request
      .post('/api/auth/login')
      .set('Host', '127.0.0.1:3000')
      .set('Origin', 'http://127.0.0.1:3000')
      .send({ email: 'keeper@larderly.test', password: 'x' });
    expect(own.status).toBe(401);
  });

  it('allows only the configured origin when APP_ORIGIN is set', async () => {
    const configured = bareApp({ APP_ORIGIN: 'https://larder.example.org' });
    try {
      const other = await configured.request
        .post('/api/auth/login')
        .set('Host', '127.0.0.1:3000')
        .set('Origin', 'http://127.0.0.1:3000')
        .send({ email: 'a@b.example', password: 'x' });
      expect(other.status).toBe(403);
      const mine = await configured.request
        .post('/api/auth/login')
        .set('Origin', 'https://larder.example.org')
        .send({ email: 'a@b.example', password: 'x' });
      expect(mine.status).toBe(401);
    } finally {
      await configured.close();
    }
  });
});

describe('imports per person', () => {
  it('limits backup imports to 10 an hour for one person', async () => {
    const backup = (await keeper.get(`/api/households/${ctx.householdId}/backup`)).body;
    const statuses: number[] = [];
    for (let i = 0; i < 11; i += 1)
      statuses.push((await keeper.post('/api/households/import').send(i < 10 ? { nonsense: true } : backup)).status);
    expect(statuses.slice(0, 10).every((s) => s === 400)).toBe(true);
    expect(statuses[10]).toBe(429);
  });
});
