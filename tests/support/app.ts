import request from 'supertest';
import { createApp } from '../../server/app';
import { loadConfig } from '../../server/config';
import { seedDemo } from '../../server/demo/demo';
import demo from '../../server/demo/demo-accounts.json' with { type: 'json' };

export const DEMO_PASSWORD = demo.password;
export type DemoEmail =
  'keeper@larderly.test' | 'cook@larderly.test' | 'helper@larderly.test' | 'neighbor@larderly.test';

/** The real app on this file's own database, with the demo households seeded (cheap hashing for speed). */
export async function demoApp(overrides: Record<string, string> = {}, options: { authLimit?: number } = {}) {
  const config = loadConfig({
    ...process.env,
    NODE_ENV: 'test',
    BCRYPT_COST: '4',
    STATIC_DIR: 'no-static-in-api-tests',
    ...overrides,
  });
  const built = createApp(config, { authLimit: options.authLimit ?? 1000 });
  const households = await seedDemo(built.sequelize, 4);
  const [first, neighbour] = Object.values(households);

  /** A supertest agent that keeps the session cookie of one demo person. */
  async function signedIn(email: DemoEmail) {
    const agent = request.agent(built.app);
    const response = await agent.post('/api/auth/login').send({ email, password: DEMO_PASSWORD });
    if (response.status !== 200)
      throw new Error(`demo sign-in failed for ${email}: ${response.status} ${JSON.stringify(response.body)}`);
    return agent;
  }

  return { ...built, request: request(built.app), signedIn, householdId: first.id, neighbourHouseholdId: neighbour.id };
}
