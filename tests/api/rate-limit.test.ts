import request from 'supertest';
import { afterAll, beforeAll, beforeEach, describe, expect, it } from 'vitest';
import { createApp } from '../../server/app';
import { passwordWork } from '../../server/auth/passwords';
import { loadConfig } from '../../server/config';
import { demoApp, DEMO_PASSWORD } from '../support/app';
import { startStandIns, type StandIns } from '../support/stand-ins';

let limited: Awaited<ReturnType<typeof demoApp>>;
// Sign-up mails its link, so these apps send through the local catcher.
let standIns: StandIns;
beforeAll(async () => {
  standIns = await startStandIns();
  limited = await demoApp(standIns.env, { authLimit: 3 });
});
afterAll(async () => {
  await limited.close();
  await standIns.close();
});
beforeEach(async () => {
  await limited.sequelize.query('DELETE FROM rate_limit_hits');
});

const wrongPassword = (app = limited.app) =>
  request(app).post('/api/auth/login').send({ email: 'keeper@larderly.test', password: 'guess' });

describe('rate limits on sign-in', () => {
  it('answers 429 with a clear message after too many attempts', async () => {
    const statuses = [];
    let last;
    for (let i = 0; i < 4; i += 1) {
      last = await wrongPassword();
      statuses.push(last.status);
    }
    expect(statuses).toEqual([401, 401, 401, 429]);
    expect(last!.body.error.message).toMatch(/Too many attempts/);
  });

  it('counts failed sign-ins only: a household signing in all day is never locked out', async () => {
    for (let i = 0; i < 5; i += 1) {
      const ok = await request(limited.app)
        .post('/api/auth/login')
        .send({ email: 'cook@larderly.test', password: DEMO_PASSWORD });
      expect(ok.status).toBe(200);
    }
    expect([
      (await wrongPassword()).status,
      (await wrongPassword()).status,
      (await wrongPassword()).status,
      (await wrongPassword()).status,
    ]).toEqual([401, 401, 401, 429]);
  });

  it('holds across app processes: the counts live in PostgreSQL', async () => {
    const second = createApp(loadConfig({ ...process.env, NODE_ENV: 'test', BCRYPT_COST: '4', STATIC_DIR: 'none' }), {
      authLimit: 3,
    });
    try {
      expect([
        (await wrongPassword()).status,
        (await wrongPassword(second.app)).status,
        (await wrongPassword()).status,
      ]).toEqual([401, 401, 401]);
      expect((await wrongPassword(second.app)).status).toBe(429);
    } finally {
      await second.close();
    }
  });
});

describe('rate limits on every route that hashes a password', () => {
  it('limits sign-ups per address, successful or not', async () => {
    const statuses = [];
    for (let i = 0; i < 4; i += 1) {
      const response = await request(limited.app)
        .post('/api/auth/signup')
        .send({
          email: `limit-${i}-${Date.now()}@example.test`,
          password: 'long enough password',
          name: 'Pip',
          householdName: 'Pip Larder',
        });
      statuses.push(response.status);
    }
    expect(statuses).toEqual([202, 202, 202, 429]);
  });

  it('limits invitation accepts, which may create an account', async () => {
    const statuses = [];
    for (let i = 0; i < 4; i += 1) {
      statuses.push(
        (
          await request(limited.app)
            .post(`/api/invitations/${'q'.repeat(42)}${i}/accept`)
            .send({ name: 'Nobody', password: 'not a real link at all' })
        ).status,
      );
    }
    expect(statuses).toEqual([404, 404, 404, 429]);
  });
});

describe('password hashing off the event loop', () => {
  it(
    'hashes in worker threads, and /api/health keeps answering while four cost-10 hashes run',
    { timeout: 90_000 },
    async () => {
      const hashing = createApp(
        loadConfig({ ...process.env, ...standIns.env, NODE_ENV: 'test', BCRYPT_COST: '10', STATIC_DIR: 'none' }),
        { authLimit: 1000 },
      );
      try {
        let settled = false;
        const signUps = Promise.all(
          Array.from({ length: 4 }, (_, i) =>
            request(hashing.app)
              .post('/api/auth/signup')
              .send({
                email: `slow-${i}-${Date.now()}@example.test`,
                password: 'long enough password',
                name: 'Pip',
                householdName: 'Pip Larder',
              }),
          ),
        ).finally(() => {
          settled = true;
        });
        // The floor: with hashing on the event loop, each health answer waits for whole hashes (the probe saw 868 ms).
        let healthAnswers = 0;
        while (!settled) {
          const health = await request(hashing.app).get('/api/health');
          expect(health.status).toBe(200);
          if (!settled) healthAnswers += 1;
        }
        expect((await signUps).map((r) => r.status)).toEqual(Array(4).fill(202));
        expect(healthAnswers).toBeGreaterThanOrEqual(10);
        // The main thread is thread 0; every hash of this run came back from another one.
        const { threads } = passwordWork();
        expect(threads.length).toBeGreaterThan(0);
        expect(threads).not.toContain(0);
      } finally {
        await hashing.close();
      }
    },
  );
});
