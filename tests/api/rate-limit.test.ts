import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { demoApp } from '../support/app';

let limited: Awaited<ReturnType<typeof demoApp>>;
beforeAll(async () => {
  limited = await demoApp({}, { authLimit: 3 });
});
afterAll(() => limited.close());

describe('rate limits on sign-in', () => {
  it('answers 429 with a clear message after too many attempts', async () => {
    const statuses = [];
    let last;
    for (let i = 0; i < 4; i += 1) {
      last = await limited.request.post('/api/auth/login').send({ email: 'keeper@larderly.test', password: 'guess' });
      statuses.push(last.status);
    }
    expect(statuses).toEqual([401, 401, 401, 429]);
    expect(last!.body.error.message).toMatch(/Too many attempts/);
  });
});
