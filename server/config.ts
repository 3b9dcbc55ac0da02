import crypto from 'node:crypto';
import os from 'node:os';
import path from 'node:path';
import { z } from 'zod';

const bool = z
  .enum(['1', '0', 'true', 'false', 'yes', 'no'])
  .transform((v) => v === '1' || v === 'true' || v === 'yes');

const envSchema = z
  .object({
    NODE_ENV: z.enum(['development', 'production', 'test']).default('development'),
    HOST: z.string().default('127.0.0.1'),
    PORT: z.coerce.number().int().min(0).max(65535).default(8080),
    PUBLIC_URL: z.url().optional(),
    DB_HOST: z.string().default('127.0.0.1'),
    DB_PORT: z.coerce.number().int().min(1).max(65535).default(3307),
    DB_NAME: z
      .string()
      .regex(/^[A-Za-z0-9_]+$/)
      .default('soundframe'),
    DB_USER: z.string().min(1).default('soundframe'),
    DB_PASSWORD: z.string().default(''),
    DB_POOL_MAX: z.coerce.number().int().min(1).max(50).default(5),
    JWT_SECRET: z.string().optional(),
    JWT_TTL_MINUTES: z.coerce
      .number()
      .int()
      .min(1)
      .max(24 * 60)
      .default(60),
    BCRYPT_COST: z.coerce.number().int().min(10).max(15).default(10),
    SMTP_HOST: z.string().default('127.0.0.1'),
    SMTP_PORT: z.coerce.number().int().min(1).max(65535).default(2525),
    MAIL_FROM: z.string().default('Soundframe <no-reply@soundframe.invalid>'),
    MAIL_SINK_DIR: z.string().default('.data/mail'),
    STORAGE_DRIVER: z.enum(['local', 's3']).default('local'),
    STORAGE_DIR: z.string().default('.data/storage'),
    S3_ENDPOINT: z.string().optional(),
    S3_BUCKET: z.string().default('soundframe'),
    S3_REGION: z.string().default('us-east-1'),
    S3_ACCESS_KEY_ID: z.string().default(''),
    S3_SECRET_ACCESS_KEY: z.string().default(''),
    WEB_DIST: z.string().default('dist'),
    OUTBOX_ENABLED: bool.optional(),
    SIGN_IN_RATE_LIMIT: z.coerce.number().int().min(1).default(10),
    TRUST_PROXY: bool.default(false),
    REMINDERS_ENABLED: bool.optional(),
    REMINDER_INTERVAL_SECONDS: z.coerce
      .number()
      .int()
      .min(1)
      .max(24 * 60 * 60)
      .default(900),
    REMINDER_MAX_ATTEMPTS: z.coerce.number().int().min(1).max(20).default(5),
    INSTANCE_ID: z.string().trim().min(1).max(100).optional(),
    REPORT_MAX_IN_FLIGHT: z.coerce.number().int().min(1).max(50).default(3),
    REPORT_CONCURRENCY: z.coerce.number().int().min(1).max(16).default(2),
    PUBLIC_RATE_LIMIT: z.coerce.number().int().min(1).default(300),
  })
  .superRefine((env, ctx) => {
    if (env.NODE_ENV === 'production' && (!env.JWT_SECRET || env.JWT_SECRET.length < 32))
      ctx.addIssue({
        code: 'custom',
        path: ['JWT_SECRET'],
        message: 'set JWT_SECRET (32+ characters) in production',
      });
    if (env.STORAGE_DRIVER === 's3' && (!env.S3_ACCESS_KEY_ID || !env.S3_SECRET_ACCESS_KEY))
      ctx.addIssue({
        code: 'custom',
        path: ['S3_ACCESS_KEY_ID'],
        message: 'S3 storage needs S3_ACCESS_KEY_ID and S3_SECRET_ACCESS_KEY',
      });
  });

export type Config = ReturnType<typeof loadConfig>;

const DEV_JWT_SECRET = 'soundframe-development-secret-not-for-production-use';

/** Validate the environment once at start-up and return a typed config. */
export function loadConfig(env: NodeJS.ProcessEnv = process.env) {
  const parsed = envSchema.safeParse(env);
  if (!parsed.success) {
    const lines = parsed.error.issues.map((i) => `  ${i.path.join('.')}: ${i.message}`);
    throw new Error(`Invalid configuration:\n${lines.join('\n')}`);
  }
  const e = parsed.data;
  const root = process.cwd();
  const production = e.NODE_ENV === 'production';
  return {
    env: e.NODE_ENV,
    production,
    host: e.HOST,
    port: e.PORT,
    /** Without a trailing slash, so paths are appended as they are. */
    publicUrl: e.PUBLIC_URL?.replace(/\/+$/, ''),
    db: {
      host: e.DB_HOST,
      port: e.DB_PORT,
      name: e.DB_NAME,
      user: e.DB_USER,
      password: e.DB_PASSWORD,
      poolMax: e.DB_POOL_MAX,
    },
    jwt: {
      secret: e.JWT_SECRET ?? DEV_JWT_SECRET,
      ttlMinutes: e.JWT_TTL_MINUTES,
      issuer: 'soundframe',
      audience: 'soundframe-app',
    },
    bcryptCost: e.BCRYPT_COST,
    mail: {
      host: e.SMTP_HOST,
      port: e.SMTP_PORT,
      from: e.MAIL_FROM,
      sinkDir: path.resolve(root, e.MAIL_SINK_DIR),
    },
    storage:
      e.STORAGE_DRIVER === 's3'
        ? {
            driver: 's3' as const,
            endpoint: e.S3_ENDPOINT,
            bucket: e.S3_BUCKET,
            region: e.S3_REGION,
            accessKeyId: e.S3_ACCESS_KEY_ID,
            secretAccessKey: e.S3_SECRET_ACCESS_KEY,
            forcePathStyle: !!e.S3_ENDPOINT,
          }
        : { driver: 'local' as const, dir: path.resolve(root, e.STORAGE_DIR) },
    webDist: path.resolve(root, e.WEB_DIST),
    outboxEnabled: e.OUTBOX_ENABLED ?? !production,
    signInRateLimit: e.SIGN_IN_RATE_LIMIT,
    trustProxy: e.TRUST_PROXY,
    reminders: {
      // Off in tests so a test app never mails on its own; reminder tests turn it on or call the cycle.
      enabled: e.REMINDERS_ENABLED ?? e.NODE_ENV !== 'test',
      intervalMs: e.REMINDER_INTERVAL_SECONDS * 1000,
      maxAttempts: e.REMINDER_MAX_ATTEMPTS,
    },
    reports: {
      /** Queued + rendering reports one workshop may have at once (more → 429). */
      maxInFlight: e.REPORT_MAX_IN_FLIGHT,
      /** PDFs this process renders at the same time, across workshops. */
      concurrency: e.REPORT_CONCURRENCY,
    },
    /** Requests per IP in 15 minutes to the signed-out share and verification routes. */
    publicRateLimit: e.PUBLIC_RATE_LIMIT,
    /** Names this process in job claims; unique per process unless set. */
    instanceId:
      e.INSTANCE_ID ?? `${os.hostname()}-${process.pid}-${crypto.randomBytes(3).toString('hex')}`,
  };
}
