import { hostname } from 'node:os';
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
  AUTH_RATE_LIMIT: z.coerce.number().int().min(1).max(100_000).default(20),
  UPLOAD_DIR: z.string().default('.data/uploads'),
  SMTP_HOST: z.string().optional(),
  SMTP_PORT: z.coerce.number().int().min(1).max(65535).default(587),
  SMTP_SECURE: z.enum(['true', 'false']).optional(),
  SMTP_USER: z.string().optional(),
  SMTP_PASS: z.string().optional(),
  SMTP_FROM: z.string().default('Larderly <reminders@larderly.test>'),
  VAPID_PUBLIC_KEY: z.string().optional(),
  VAPID_PRIVATE_KEY: z.string().optional(),
  VAPID_SUBJECT: z
    .string()
    .regex(/^(mailto:|https:)/, 'VAPID_SUBJECT must start with mailto: or https:')
    .optional(),
  PUSH_CA_FILE: z.string().optional(),
  PUSH_LOCAL_ORIGIN: z
    .union([z.literal(''), z.url({ protocol: /^https$/, error: 'PUSH_LOCAL_ORIGIN must be an https:// origin' })])
    .optional(),
  MAIL_CATCHER_DIR: z.string().optional(),
  S3_ENDPOINT: z.string().url({ message: 'S3_ENDPOINT must be an http:// or https:// URL' }).optional(),
  S3_BUCKET: z
    .string()
    .regex(
      /^[a-z0-9][a-z0-9.-]{1,61}[a-z0-9]$/,
      'S3_BUCKET must be a bucket name: 3-63 lower-case letters, digits, dots and hyphens',
    )
    .optional(),
  S3_REGION: z.string().min(1).default('us-east-1'),
  S3_ACCESS_KEY_ID: z.string().min(1).optional(),
  S3_SECRET_ACCESS_KEY: z.string().min(1).optional(),
  S3_FORCE_PATH_STYLE: z.enum(['true', 'false']).default('false'),
  SHUTDOWN_TIMEOUT_MS: z.coerce.number().int().min(1_000).max(120_000).default(10_000),
  LOG_LEVEL: z.enum(['fatal', 'error', 'warn', 'info', 'debug', 'trace', 'silent']).optional(),
  INSTANCE_NAME: z
    .string()
    .regex(/^[\w.-]{1,64}$/, 'INSTANCE_NAME may hold letters, digits, dots, hyphens and underscores (64 at most)')
    .optional(),
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
  if (Boolean(c.VAPID_PUBLIC_KEY) !== Boolean(c.VAPID_PRIVATE_KEY)) {
    throw new Error(
      'Larderly cannot start: set both VAPID_PUBLIC_KEY and VAPID_PRIVATE_KEY, or neither (then keys are generated and kept).',
    );
  }
  if (Boolean(c.S3_ACCESS_KEY_ID) !== Boolean(c.S3_SECRET_ACCESS_KEY)) {
    throw new Error(
      'Larderly cannot start: set both S3_ACCESS_KEY_ID and S3_SECRET_ACCESS_KEY, or neither (then the SDK looks for credentials itself).',
    );
  }
  if (!c.S3_BUCKET && (c.S3_ENDPOINT || c.S3_ACCESS_KEY_ID)) {
    throw new Error(
      'Larderly cannot start: S3 settings are given without S3_BUCKET; name the bucket the photos go to.',
    );
  }
  return {
    env: c.NODE_ENV,
    isProduction: c.NODE_ENV === 'production',
    host: c.HOST,
    port: c.PORT,
    databaseUrl: c.DATABASE_URL,
    sessionSecret: c.SESSION_SECRET ?? 'development-only-secret-not-for-production-use',
    appOrigins: (c.APP_ORIGIN ?? '')
      .split(',')
      .map((o) => o.trim())
      .filter(Boolean),
    trustProxy: parseTrustProxy(c.TRUST_PROXY),
    dbPoolMax: c.DB_POOL_MAX,
    staticDir: c.STATIC_DIR,
    bcryptCost: c.BCRYPT_COST,
    /** sign-in and sign-up attempts per address per 15 minutes */
    authRateLimit: c.AUTH_RATE_LIMIT,
    /** batch photos on local disk when no object store is set (and photos from before it) */
    uploadDir: c.UPLOAD_DIR,
    /** the S3-compatible object store for batch photos; unset keeps them on local disk */
    s3: c.S3_BUCKET
      ? {
          bucket: c.S3_BUCKET,
          endpoint: c.S3_ENDPOINT,
          region: c.S3_REGION,
          forcePathStyle: c.S3_FORCE_PATH_STYLE === 'true',
          credentials:
            c.S3_ACCESS_KEY_ID && c.S3_SECRET_ACCESS_KEY
              ? { accessKeyId: c.S3_ACCESS_KEY_ID, secretAccessKey: c.S3_SECRET_ACCESS_KEY }
              : undefined,
        }
      : undefined,
    /** how long a stopping process finishes what it has in hand before it exits */
    shutdownTimeoutMs: c.SHUTDOWN_TIMEOUT_MS,
    /** JSON lines on stdout; silent under NODE_ENV=test unless LOG_LEVEL is set */
    logLevel: c.LOG_LEVEL ?? (c.NODE_ENV === 'test' ? 'silent' : 'info'),
    /** this process's name in logs and the X-Larderly-Instance header: the host name and process id unless set */
    instanceName: c.INSTANCE_NAME ?? `${hostname()}-${process.pid}`,
    /** where links in e-mails point: the first APP_ORIGIN, else this server's own address */
    publicOrigin: (c.APP_ORIGIN ?? '').split(',')[0].trim() || `http://${c.HOST}:${c.PORT}`,
    mail: {
      host: c.SMTP_HOST,
      port: c.SMTP_PORT,
      secure: c.SMTP_SECURE ? c.SMTP_SECURE === 'true' : c.SMTP_PORT === 465,
      user: c.SMTP_USER,
      pass: c.SMTP_PASS,
      from: c.SMTP_FROM,
      /** the local catcher's folder, read by the development-only mailbox page */
      catcherDir: c.NODE_ENV === 'production' ? undefined : c.MAIL_CATCHER_DIR,
    },
    push: {
      vapidPublicKey: c.VAPID_PUBLIC_KEY,
      vapidPrivateKey: c.VAPID_PRIVATE_KEY,
      vapidSubject: c.VAPID_SUBJECT ?? `mailto:${c.SMTP_FROM.match(/<([^>]+)>/)?.[1] ?? c.SMTP_FROM}`,
      /** the local push endpoint's certificate; trusted for loopback endpoints outside production only */
      caFile: c.NODE_ENV === 'production' ? undefined : c.PUSH_CA_FILE,
      /** the local push endpoint (development setting): the only origin allowed that is not a public address */
      localOrigin: c.PUSH_LOCAL_ORIGIN ? new URL(c.PUSH_LOCAL_ORIGIN).origin : undefined,
    },
  };
}

/** Express reads a number as a hop count and a string as addresses, so '1' must become 1. */
function parseTrustProxy(value: string | undefined): boolean | number | string | undefined {
  if (value === undefined || value === '') return undefined;
  if (value === 'true' || value === 'false') return value === 'true';
  return /^\d+$/.test(value) ? Number(value) : value;
}
