import { z } from 'zod';

const schema = z.object({
  NODE_ENV: z.enum(['development', 'production', 'test']).default('development'),
  HOST: z.string().default('127.0.0.1'),
  PORT: z.coerce.number().int().min(0).max(65535).default(3000),
  DATABASE_URL: z.string().url({ message: 'DATABASE_URL must be a postgres:// URL' }),
  SESSION_SECRET: z.string().min(32, 'SESSION_SECRET must be at least 32 characters').optional(),
  APP_ORIGIN: z.string().optional(),
  TRUST_PROXY: z.string().optional(),
  DB_POOL_MAX: z.coerce.number().int().min(1).max(100).default(10),
  STATIC_DIR: z.string().default('dist/client'),
  BCRYPT_COST: z.coerce.number().int().min(4).max(15).default(12),
});

export type Config = ReturnType<typeof loadConfig>;

/** Reads every environment variable once, at start-up, and refuses to start on a bad value. */
export function loadConfig(env: NodeJS.ProcessEnv = process.env) {
  const parsed = schema.safeParse(env);
  if (!parsed.success) {
    const problems = parsed.error.issues.map((i) => `  ${i.path.join('.')}: ${i.message}`).join('\n');
    throw new Error(`Larderly cannot start; fix these settings:\n${problems}`);
  }
  const c = parsed.data;
  if (c.NODE_ENV === 'production' && !c.SESSION_SECRET) {
    throw new Error('Larderly cannot start: set SESSION_SECRET (32+ random characters) in production.');
  }
  return {
    env: c.NODE_ENV,
    isProduction: c.NODE_ENV === 'production',
    host: c.HOST,
    port: c.PORT,
    databaseUrl: c.DATABASE_URL,
    sessionSecret: c.SESSION_SECRET ?? 'development-only-secret-not-for-production-use',
    appOrigins: (c.APP_ORIGIN ?? '').split(',').map((o) => o.trim()).filter(Boolean),
    trustProxy: c.TRUST_PROXY,
    dbPoolMax: c.DB_POOL_MAX,
    staticDir: c.STATIC_DIR,
    bcryptCost: c.BCRYPT_COST,
  };
}
