import path from 'node:path';
import { z } from 'zod';

const booleanish = z
  .enum(['true', 'false', '1', '0', 'yes', 'no'])
  .transform((v) => v === 'true' || v === '1' || v === 'yes');

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
  version: string;
};

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
    version: process.env.npm_package_version ?? '0.1.0',
  };
}
