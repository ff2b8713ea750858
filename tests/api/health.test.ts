import { rmSync } from 'node:fs';
import path from 'node:path';
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { pgCtl, startCluster } from '../../scripts/lib/postgres.mjs';
import { createApp } from '../../server/app';
import { loadConfig } from '../../server/config';
import { freePort } from '../support/ports';

// A cluster of this file's own, so stopping it cannot disturb the other test files.
let cluster: ReturnType<typeof startCluster>;
let built: ReturnType<typeof createApp>;

beforeAll(async () => {
  const port = await freePort();
  cluster = startCluster({ name: `outage-${process.pid}-${port}`, port });
  built = createApp(
    loadConfig({ ...process.env, NODE_ENV: 'test', DATABASE_URL: cluster.url('postgres'), STATIC_DIR: 'none' }),
  );
});

afterAll(async () => {
  await built?.close();
  cluster?.stop();
  if (cluster) rmSync(path.dirname(cluster.dataDir), { recursive: true, force: true });
});

describe('GET /api/health', () => {
  it('answers 200 with the database up', async () => {
    const response = await request(built.app).get('/api/health');
    expect(response.status).toBe(200);
    expect(response.body).toEqual({ ok: true, db: 'up' });
  });

  it('answers 503 while PostgreSQL is stopped, and API requests get a clear 503, then 200 once it is back', async () => {
    pgCtl(cluster.bin, cluster.dataDir, 'stop', cluster.port);
    const down = await request(built.app).get('/api/health');
    expect(down.status).toBe(503);
    expect(down.body).toEqual({ ok: false, db: 'down' });
    const notReady = await request(built.app).get('/api/ready');
    expect(notReady.status).toBe(503);
    expect(notReady.body).toEqual({ ready: false, db: 'down', photoStore: { kind: 's3', state: 'up' } });

    const login = await request(built.app)
      .post('/api/auth/login')
      .send({ email: 'keeper@larderly.test', password: 'pantry-demo-2026' });
    expect(login.status).toBe(503);
    expect(login.body.error).toMatchObject({
      code: 'database_unavailable',
      message: expect.stringMatching(/try again/),
    });

    pgCtl(cluster.bin, cluster.dataDir, 'start', cluster.port);
    const up = await request(built.app).get('/api/health');
    expect(up.status).toBe(200);
    expect(up.body).toEqual({ ok: true, db: 'up' });
  });
});

describe('GET /api/ready', () => {
  it('answers 200 only when both the database and the photo store answer', async () => {
    const ready = await request(built.app).get('/api/ready');
    expect(ready.status).toBe(200);
    expect(ready.body).toEqual({ ready: true, db: 'up', photoStore: { kind: 's3', state: 'up' } });
  });

  it('answers 503 while the object store does not answer', async () => {
    const nowhere = `http://127.0.0.1:${await freePort()}`;
    const storeDown = createApp(
      loadConfig({
        ...process.env,
        NODE_ENV: 'test',
        DATABASE_URL: cluster.url('postgres'),
        STATIC_DIR: 'none',
        S3_ENDPOINT: nowhere,
      }),
    );
    try {
      const response = await request(storeDown.app).get('/api/ready');
      expect(response.status).toBe(503);
      expect(response.body).toEqual({ ready: false, db: 'up', photoStore: { kind: 's3', state: 'down' } });
    } finally {
      await storeDown.close();
    }
  });
});
