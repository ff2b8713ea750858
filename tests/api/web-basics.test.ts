import express from 'express';
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createApp } from '../../server/app';
import { loadConfig } from '../../server/config';
import { errorHandler } from '../../server/http/errors';
import { helmetPerRequest, securityHeaders } from '../../server/http/security-headers';
import { demoApp, DEMO_PASSWORD } from '../support/app';

let ctx: Awaited<ReturnType<typeof demoApp>>;
beforeAll(async () => {
  ctx = await demoApp({ SESSION_SECRET: 'a-test-secret-that-is-long-enough-1234567890' });
});
afterAll(() => ctx.close());

describe('security headers', () => {
  it('sends a content security policy that allows only the app itself and no framing', async () => {
    const response = await ctx.request.get('/api/health');
    const csp = response.headers['content-security-policy'];
    expect(csp).toContain("default-src 'self'");
    expect(csp).toContain("frame-ancestors 'none'");
    expect(csp).toContain("script-src 'self'");
    expect(csp).not.toMatch(/unsafe-eval|\*/);
    expect(response.headers['x-content-type-options']).toBe('nosniff');
    expect(response.headers['referrer-policy']).toBe('no-referrer');
    expect(response.headers['x-powered-by']).toBeUndefined();
  });

  // helmet's headers are worked out once at start (server/http/security-headers.ts): an answer carries exactly the
  // headers helmet itself sets on a request, over http and over https.
  it("sends exactly helmet's own headers, over http and https", async () => {
    for (const origin of ['http://127.0.0.1:3000', 'https://larder.example']) {
      const config = loadConfig({
        ...process.env,
        NODE_ENV: 'production',
        APP_ORIGIN: origin,
        SESSION_SECRET: 'x'.repeat(40),
      });
      const own = express();
      own.disable('x-powered-by');
      own.use(helmetPerRequest(config));
      own.get('/probe', (_req, res) => res.end());
      const ours = express();
      ours.disable('x-powered-by');
      ours.use(securityHeaders(config));
      ours.get('/probe', (_req, res) => res.end());
      const names = (headers: Record<string, string>) =>
        Object.fromEntries(
          Object.entries(headers).filter(
            ([name]) => !/^(date|connection|content-length|keep-alive|x-larderly-instance)$/.test(name),
          ),
        );
      const expected = names((await request(own).get('/probe')).headers);
      const answered = await request(ours).get('/probe');
      expect(names(answered.headers)).toEqual(expected);
      expect(Object.keys(expected).length).toBeGreaterThan(10);
      expect(answered.headers['x-larderly-instance']).toBe(config.instanceName);
    }
  });

  it('marks the session cookie Secure when the public origin is https', async () => {
    const secure = createApp(
      loadConfig({
        ...process.env,
        NODE_ENV: 'test',
        BCRYPT_COST: '4',
        STATIC_DIR: 'none',
        APP_ORIGIN: 'https://larder.example',
        TRUST_PROXY: '1',
      }),
    );
    try {
      const response = await request(secure.app)
        .post('/api/auth/login')
        .set('X-Forwarded-Proto', 'https')
        .set('Host', 'larder.example')
        .set('Origin', 'https://larder.example')
        .send({ email: 'keeper@larderly.test', password: DEMO_PASSWORD });
      expect(response.status).toBe(200);
      expect(String(response.headers['set-cookie'])).toMatch(/Secure/);
      expect(response.headers['strict-transport-security']).toBeDefined();
    } finally {
      await secure.close();
    }
  });
});

describe('request limits', () => {
  it('refuses a JSON body over 1 MB with 413 in the JSON error shape', async () => {
    const keeper = await ctx.signedIn('keeper@larderly.test');
    const response = await keeper.patch(`/api/households/${ctx.householdId}`).send({ name: 'x'.repeat(1_100_000) });
    expect(response.status).toBe(413);
    expect(response.body.error.code).toBe('too_large');
  });
});

describe('error bodies', () => {
  it('never carries a stack trace in production', async () => {
    const app = express();
    app.get('/boom', () => {
      throw new Error('secret internals at /srv/larderly/server.ts:12');
    });
    app.use(errorHandler({ exposeInternals: false }));
    const response = await request(app).get('/boom');
    expect(response.status).toBe(500);
    expect(response.body.error.code).toBe('internal');
    expect(JSON.stringify(response.body)).not.toMatch(/secret internals|server\.ts|\bat /);
  });
});

describe('sessions', () => {
  it('survive a restart of the app, because they live in PostgreSQL', async () => {
    const login = await request(ctx.app)
      .post('/api/auth/login')
      .send({ email: 'cook@larderly.test', password: DEMO_PASSWORD });
    const sessionCookie = String(login.headers['set-cookie']).split(';')[0];
    expect(sessionCookie).toMatch(/^larderly\.sid=/);

    const restarted = createApp(
      loadConfig({
        ...process.env,
        NODE_ENV: 'test',
        STATIC_DIR: 'none',
        SESSION_SECRET: 'a-test-secret-that-is-long-enough-1234567890',
      }),
    );
    try {
      const me = await request(restarted.app).get('/api/auth/me').set('Cookie', sessionCookie);
      expect(me.status).toBe(200);
      expect(me.body.user.email).toBe('cook@larderly.test');
    } finally {
      await restarted.close();
    }
  });
});
