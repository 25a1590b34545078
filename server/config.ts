import { createHmac } from 'node:crypto';
import path from 'node:path';
import { z } from 'zod';

const booleanish = z
  .enum(['true', 'false', '1', '0', 'yes', 'no'])
  .transform((v) => v === 'true' || v === '1' || v === 'yes');

function isTimeZone(tz: string): boolean {
  try {
    new Intl.DateTimeFormat('en', { timeZone: tz });
    return true;
  } catch {
    return false;
  }
}

const envSchema = z.object({
  NODE_ENV: z.enum(['development', 'test', 'production']).default('development'),
  HOST: z.string().min(1).default('127.0.0.1'),
  PORT: z.coerce.number().int().min(1).max(65535).default(8080),
  DATABASE_URL: z
    .string({ error: 'DATABASE_URL is required (npm start sets it for the embedded database)' })
    .regex(/^postgres(ql)?:\/\//, 'DATABASE_URL must start with postgres:// or postgresql://'),
  LOG_LEVEL: z.enum(['fatal', 'error', 'warn', 'info', 'debug', 'trace', 'silent']).optional(),
  JSON_BODY_LIMIT: z
    .string()
    .regex(/^\d+(b|kb|mb)$/, 'JSON_BODY_LIMIT must look like 100kb or 1mb')
    .default('100kb'),
  API_RATE_LIMIT_MAX: z.coerce.number().int().min(1).default(600),
  API_RATE_LIMIT_WINDOW_MS: z.coerce.number().int().min(1000).default(60_000),
  WEB_DIST_DIR: z.string().default('dist'),
  TRUST_PROXY: booleanish.default(false),
  PUBLIC_URL: z.url({ error: 'PUBLIC_URL must be the address people open, e.g. https://tunefork.example' }).optional(),
  SESSION_SECRET: z.string().min(32, 'SESSION_SECRET must be at least 32 characters').optional(),
  BCRYPT_COST: z.coerce.number().int().min(4).max(15).optional(),
  GITHUB_CLIENT_ID: z.string().min(1).optional(),
  GITHUB_CLIENT_SECRET: z.string().min(1).optional(),
  FAKE_GITHUB: booleanish.optional(),
  SMTP_URL: z.string().regex(/^smtps?:\/\//, 'SMTP_URL must start with smtp:// or smtps://').optional(),
  MAIL_FROM: z.string().min(3).default('Tunefork <no-reply@tunefork.invalid>'),
  FAKE_SMTP_PORT: z.coerce.number().int().min(0).max(65535).default(0),
  AUTH_RATE_LIMIT_MAX: z.coerce.number().int().min(1).default(20),
  AUTH_RATE_LIMIT_WINDOW_MS: z.coerce.number().int().min(1000).default(15 * 60_000),
  COMMENT_RATE_LIMIT_PER_MINUTE: z.coerce.number().int().min(1).default(6),
  COMMENT_RATE_LIMIT_PER_HOUR: z.coerce.number().int().min(1).default(60),
  DATA_DIR: z.string().min(1).default('.data'),
  STORAGE_DRIVER: z.enum(['local', 's3']).default('local'),
  S3_ENDPOINT: z.url({ error: 'S3_ENDPOINT must be a URL such as http://127.0.0.1:4569' }).optional(),
  S3_REGION: z.string().min(1).default('us-east-1'),
  S3_BUCKET: z.string().min(3).optional(),
  S3_ACCESS_KEY_ID: z.string().min(1).optional(),
  S3_SECRET_ACCESS_KEY: z.string().min(1).optional(),
  PHOTO_MAX_BYTES: z.coerce.number().int().min(10_000).default(12 * 1024 * 1024),
  PHOTO_MAX_PIXELS: z.coerce.number().int().min(10_000).default(40_000_000),
  JOB_WORKERS: booleanish.default(true),
  JOB_POLL_INTERVAL_SECONDS: z.coerce.number().min(0.5, 'JOB_POLL_INTERVAL_SECONDS must be at least 0.5').max(60).default(2),
  MAIL_RETRY_LIMIT: z.coerce.number().int().min(0).max(20).default(8),
  MAIL_RETRY_DELAY_SECONDS: z.coerce.number().int().min(1).max(3600).default(30),
  DIGEST_CRON: z
    .string()
    .regex(/^\S+( \S+){4}$/, 'DIGEST_CRON must be a five-field cron expression such as "0 7 * * *"')
    .default('0 7 * * *'),
  DIGEST_TIMEZONE: z
    .string()
    .refine(isTimeZone, 'DIGEST_TIMEZONE must be an IANA time zone such as UTC or Europe/Berlin')
    .default('UTC'),
  UNSUBSCRIBE_SECRET: z.string().min(32, 'UNSUBSCRIBE_SECRET must be at least 32 characters').optional(),
  /** Development only: the Expo dev server's origin, allowed to call the API with cookies. */
  DEV_WEB_ORIGIN: z.url({ error: 'DEV_WEB_ORIGIN must be a URL such as http://127.0.0.1:8081' }).optional(),
});

export type Config = {
  nodeEnv: 'development' | 'test' | 'production';
  host: string;
  port: number;
  databaseUrl: string;
  logLevel: 'fatal' | 'error' | 'warn' | 'info' | 'debug' | 'trace' | 'silent';
  jsonBodyLimit: string;
  apiRateLimit: { max: number; windowMs: number };
  webDistDir: string;
  trustProxy: boolean;
  devWebOrigin: string | null;
  publicUrl: string;
  sessionSecret: string;
  bcryptCost: number;
  github: { clientId: string; clientSecret: string; useFakeProvider: boolean } | null;
  mail: { smtpUrl: string | null; from: string; fakeSmtpPort: number };
  authRateLimit: { max: number; windowMs: number };
  /** Comments one racer may post: a short window against bursts, a long one against a steady drip. */
  commentRateLimit: { burst: { max: number; windowMs: number }; sustained: { max: number; windowMs: number } };
  dataDir: string;
  storage:
    | { driver: 'local'; directory: string }
    | { driver: 's3'; endpoint: string | null; region: string; bucket: string; accessKeyId: string | null; secretAccessKey: string | null };
  photos: { maxBytes: number; maxPixels: number };
  /** The pg-boss queue: whether this process runs workers, and how often idle workers poll. */
  jobs: { runWorkers: boolean; pollIntervalSeconds: number };
  /** Notification e-mail: retries with exponential backoff, the digest's schedule, link signing. */
  notificationMail: {
    retryLimit: number;
    retryDelaySeconds: number;
    digestCron: string;
    digestTimezone: string;
    unsubscribeSecret: string;
  };
  version: string;
};

function storageSettings(e: z.infer<typeof envSchema>): Config['storage'] {
  if (e.STORAGE_DRIVER === 'local') return { driver: 'local', directory: path.resolve(e.DATA_DIR, 'photos') };
  if (!e.S3_BUCKET) throw new ConfigError(['S3_BUCKET: required when STORAGE_DRIVER=s3']);
  return {
    driver: 's3',
    endpoint: e.S3_ENDPOINT ?? null,
    region: e.S3_REGION,
    bucket: e.S3_BUCKET,
    accessKeyId: e.S3_ACCESS_KEY_ID ?? null,
    secretAccessKey: e.S3_SECRET_ACCESS_KEY ?? null,
  };
}

/** Used only outside production, where a fixed secret is harmless and keeps sessions across restarts. */
const DEVELOPMENT_SESSION_SECRET = 'tunefork-development-session-secret-not-for-production';
const FAKE_GITHUB_CLIENT = { clientId: 'tunefork-local', clientSecret: 'tunefork-local-secret' };

function githubSettings(e: z.infer<typeof envSchema>): Config['github'] {
  if (e.GITHUB_CLIENT_ID && e.GITHUB_CLIENT_SECRET) {
    return { clientId: e.GITHUB_CLIENT_ID, clientSecret: e.GITHUB_CLIENT_SECRET, useFakeProvider: false };
  }
  // The local fake provider never runs in production unless explicitly enabled.
  const fake = e.FAKE_GITHUB ?? e.NODE_ENV !== 'production';
  return fake ? { ...FAKE_GITHUB_CLIENT, useFakeProvider: true } : null;
}

function productionProblems(e: z.infer<typeof envSchema>): string[] {
  if (e.NODE_ENV !== 'production') return [];
  const problems: string[] = [];
  if (!e.SESSION_SECRET) problems.push('SESSION_SECRET: required in production (32+ random characters)');
  if (e.BCRYPT_COST !== undefined && e.BCRYPT_COST < 10) problems.push('BCRYPT_COST: must be at least 10 in production');
  return problems;
}

export class ConfigError extends Error {
  constructor(public readonly problems: string[]) {
    super(`Invalid configuration:\n${problems.map((p) => `  - ${p}`).join('\n')}`);
    this.name = 'ConfigError';
  }
}

/** Parses the environment once at boot. Throws ConfigError naming each bad variable. */
export function loadConfig(env: NodeJS.ProcessEnv = process.env): Config {
  const parsed = envSchema.safeParse(env);
  if (!parsed.success) {
    throw new ConfigError(
      parsed.error.issues.map((issue) => `${issue.path.join('.')}: ${issue.message}`),
    );
  }
  const e = parsed.data;
  const problems = productionProblems(e);
  if (problems.length) throw new ConfigError(problems);
  return {
    nodeEnv: e.NODE_ENV,
    host: e.HOST,
    port: e.PORT,
    databaseUrl: e.DATABASE_URL,
    logLevel: e.LOG_LEVEL ?? (e.NODE_ENV === 'test' ? 'silent' : 'info'),
    jsonBodyLimit: e.JSON_BODY_LIMIT,
    apiRateLimit: { max: e.API_RATE_LIMIT_MAX, windowMs: e.API_RATE_LIMIT_WINDOW_MS },
    webDistDir: path.resolve(e.WEB_DIST_DIR),
    trustProxy: e.TRUST_PROXY,
    devWebOrigin: e.NODE_ENV === 'production' ? null : (e.DEV_WEB_ORIGIN ?? null),
    publicUrl: (e.PUBLIC_URL ?? `http://${e.HOST}:${e.PORT}`).replace(/\/$/, ''),
    sessionSecret: e.SESSION_SECRET ?? DEVELOPMENT_SESSION_SECRET,
    bcryptCost: e.BCRYPT_COST ?? (e.NODE_ENV === 'test' ? 4 : 12),
    github: githubSettings(e),
    mail: { smtpUrl: e.SMTP_URL ?? null, from: e.MAIL_FROM, fakeSmtpPort: e.FAKE_SMTP_PORT },
    authRateLimit: { max: e.AUTH_RATE_LIMIT_MAX, windowMs: e.AUTH_RATE_LIMIT_WINDOW_MS },
    commentRateLimit: {
      burst: { max: e.COMMENT_RATE_LIMIT_PER_MINUTE, windowMs: 60_000 },
      sustained: { max: e.COMMENT_RATE_LIMIT_PER_HOUR, windowMs: 60 * 60_000 },
    },
    dataDir: path.resolve(e.DATA_DIR),
    storage: storageSettings(e),
    photos: { maxBytes: e.PHOTO_MAX_BYTES, maxPixels: e.PHOTO_MAX_PIXELS },
    jobs: { runWorkers: e.JOB_WORKERS, pollIntervalSeconds: e.JOB_POLL_INTERVAL_SECONDS },
    notificationMail: {
      retryLimit: e.MAIL_RETRY_LIMIT,
      retryDelaySeconds: e.MAIL_RETRY_DELAY_SECONDS,
      digestCron: e.DIGEST_CRON,
      digestTimezone: e.DIGEST_TIMEZONE,
      // A key of its own, derived when not given, so an unsubscribe signature never doubles as a cookie signature.
      unsubscribeSecret:
        e.UNSUBSCRIBE_SECRET ?? createHmac('sha256', e.SESSION_SECRET ?? DEVELOPMENT_SESSION_SECRET).update('tunefork unsubscribe links').digest('hex'),
    },
    version: process.env.npm_package_version ?? '0.1.0',
  };
}
