import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { demoApp } from '../support/app';

let ctx: Awaited<ReturnType<typeof demoApp>>;
beforeAll(async () => {
  ctx = await demoApp({ APP_ORIGIN: 'https://larder.example.test,https://larder-two.example.test' });
});
afterAll(() => ctx.close());

describe('the configuration the client reads', () => {
  it('gives the first APP_ORIGIN as the public origin label QR codes point at, to anybody', async () => {
    const answer = await ctx.request.get('/api/config');
    expect(answer.status).toBe(200);
    expect(answer.body).toEqual({ publicOrigin: 'https://larder.example.test' });
  });
});
