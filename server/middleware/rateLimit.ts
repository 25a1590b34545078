import type { Express, Request, RequestHandler } from 'express';
import { rateLimit, type ClientRateLimitInfo, type Options, type Store } from 'express-rate-limit';
import type { Pool } from 'pg';
import { ERROR_CODES } from '../../shared/types/errors';
import type { Logger } from '../logger';

type LimitOptions = {
  windowMs: number;
  max: number;
  /** Who is counted: the client address by default; a racer's account where one account must not spread its posts over many addresses. */
  keyGenerator?: (req: Request) => string;
  /** The refusal's wording, given the seconds to wait. */
  message?: (retryAfterSeconds: number) => string;
  /**
   * The counter's name in the shared store. Defaults to "<windowMs>/<max>", which keeps the
   * limiters of one app apart as long as they differ in window or limit; give a name when two
   * limiters with the same numbers count the same clients.
   */
  name?: string;
};

/**
 * An express-rate-limit store on one PostgreSQL table, so every app server behind a load balancer
 * counts the same hits. One atomic upsert per request: the row lock of INSERT … ON CONFLICT makes
 * concurrent increments from any number of servers serialise, and a window that has run out starts
 * again at 1 in the same statement. Windows are fixed per client, like express-rate-limit's
 * MemoryStore, and timed by the database clock so servers with drifting clocks agree.
 *
 * Written here rather than taken from a package: the PostgreSQL store kept under express-rate-limit's
 * name creates its own pool per limiter from host/port fields (not a connection string), runs its
 * own schema migrations un-awaited from its constructor, and has no way to close its pools; we
 * already have a pool, a migration runner, and tests that must exit cleanly.
 */
export class PostgresRateLimitStore implements Store {
  /** Counts are shared between processes, so express-rate-limit must not assume they are local. */
  readonly localKeys = false;
  prefix = '';
  private windowMs = 60_000;

  constructor(
    private readonly pool: Pool,
    private readonly name?: string,
  ) {}

  init(options: Options): void {
    this.windowMs = options.windowMs;
    const limit = typeof options.limit === 'number' ? options.limit : 'dynamic';
    // The window and limit are part of the key, so a limiter whose numbers change starts afresh.
    this.prefix = `${this.name ? `${this.name}:` : ''}${options.windowMs}/${limit}:`;
  }

  async increment(key: string): Promise<ClientRateLimitInfo> {
    const { rows } = await this.pool.query<{ hits: number; reset_at: Date }>(
      `INSERT INTO rate_limit_hits AS r (key, hits, reset_at)
       VALUES ($1, 1, now() + $2 * interval '1 millisecond')
       ON CONFLICT (key) DO UPDATE SET
         hits = CASE WHEN r.reset_at <= now() THEN 1 ELSE r.hits + 1 END,
         reset_at = CASE WHEN r.reset_at <= now() THEN EXCLUDED.reset_at ELSE r.reset_at END
       RETURNING hits, reset_at`,
      [this.prefix + key, this.windowMs],
    );
    return { totalHits: rows[0].hits, resetTime: rows[0].reset_at };
  }

  async get(key: string): Promise<ClientRateLimitInfo | undefined> {
    const { rows } = await this.pool.query<{ hits: number; reset_at: Date }>(
      'SELECT hits, reset_at FROM rate_limit_hits WHERE key = $1 AND reset_at > now()',
      [this.prefix + key],
    );
    return rows[0] ? { totalHits: rows[0].hits, resetTime: rows[0].reset_at } : undefined;
  }

  async decrement(key: string): Promise<void> {
    await this.pool.query('UPDATE rate_limit_hits SET hits = GREATEST(hits - 1, 0) WHERE key = $1 AND reset_at > now()', [
      this.prefix + key,
    ]);
  }

  async resetKey(key: string): Promise<void> {
    await this.pool.query('DELETE FROM rate_limit_hits WHERE key = $1', [this.prefix + key]);
  }
}

/** Drops counters whose window has ended (a scheduled job runs it); returns how many. */
export async function deleteExpiredRateLimits(pool: Pool): Promise<number> {
  const { rowCount } = await pool.query('DELETE FROM rate_limit_hits WHERE reset_at <= now()');
  return rowCount ?? 0;
}

/** Where an app's limiters count: its PostgreSQL pool, and the logger for store failures. */
export type RateLimitBackend = { pool: Pool; logger: Logger };

const BACKEND_KEY = 'rateLimitBackend';

/**
 * Makes every jsonRateLimit of `app` count in PostgreSQL. The server and the test app call it right
 * after createApp; an app without it counts in process memory, as a single process may.
 */
export function useSharedRateLimits(app: Express, backend: RateLimitBackend): void {
  app.locals[BACKEND_KEY] = backend;
}

/**
 * A limiter whose refusal is our JSON error body with the seconds to wait. The express-rate-limit
 * instance is made on the first request, once the app's store is known (each limiter belongs to
 * the one app whose routers created it).
 */
export function jsonRateLimit(options: LimitOptions): RequestHandler {
  let built: { backend: RateLimitBackend | undefined; limiter: RequestHandler } | undefined;
  return (req, res, next) => {
    const backend = req.app.locals[BACKEND_KEY] as RateLimitBackend | undefined;
    if (!built || built.backend !== backend) built = { backend, limiter: buildLimiter(options, backend) };
    return built.limiter(req, res, next);
  };
}

function buildLimiter(options: LimitOptions, backend: RateLimitBackend | undefined): RequestHandler {
  return rateLimit({
    windowMs: options.windowMs,
    limit: options.max,
    standardHeaders: 'draft-7',
    legacyHeaders: false,
    ...(backend ? { store: new PostgresRateLimitStore(backend.pool, options.name), logger: backend.logger } : {}),
    // With the database unreachable the request goes on unlimited (and is logged): a rate limit
    // must not turn a database hiccup into failures of routes that would have coped, like /health.
    passOnStoreError: true,
    // Made on the first request on purpose (see jsonRateLimit), not inside a request by mistake.
    validate: { creationStack: false },
    ...(options.keyGenerator ? { keyGenerator: options.keyGenerator } : {}),
    handler: (req, res, _next, opts) => {
      const resetTime = (req as typeof req & { rateLimit?: { resetTime?: Date } }).rateLimit?.resetTime;
      const retryAfterSeconds = resetTime
        ? Math.max(1, Math.ceil((resetTime.getTime() - Date.now()) / 1000))
        : Math.ceil(opts.windowMs / 1000);
      res.status(429).json({
        error: {
          code: ERROR_CODES.rateLimited,
          message: options.message ? options.message(retryAfterSeconds) : `Too many requests. Try again in ${retryAfterSeconds} s.`,
          details: { retryAfterSeconds },
        },
      });
    },
  });
}
