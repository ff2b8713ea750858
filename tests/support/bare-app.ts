import request from 'supertest';
import { createApp } from '../../server/app';
import { loadConfig } from '../../server/config';

/** The real app on this file's own database without the demo households: each test makes the people it needs. */
export function bareApp(overrides: Record<string, string> = {}) {
  const config = loadConfig({
    ...process.env,
    NODE_ENV: 'test',
    BCRYPT_COST: '4',
    STATIC_DIR: 'no-static-in-api-tests',
    ...overrides,
  });
  const built = createApp(config, { authLimit: 1000 });
  return { ...built, request: request(built.app) };
}
