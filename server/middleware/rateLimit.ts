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
 * counts the same hits. Windows are fixed per client, like express-rate-limit's MemoryStore, and
 * timed by the database clock so servers with drifting clocks agree.
 *
 * Near the limit every hit is one atomic upsert: the row lock of INSERT … ON CONFLICT makes
 * concurrent increments from any number of servers serialise, and a window that has run out starts
 * again in the same statement, so a client is refused at exactly the limit.
 *
 * Far below the limit, writing every hit would cost a database round trip per request and make
 * all requests from one address queue on one row lock. So while this server's view of the count
 * (the total at its last write plus its own hits since) is under `batchBelow` of the limit, and
 * that view is fresher than `syncMs`, a hit is counted in memory and the hits are written
 * together at most `syncMs` later. With two servers each batching only below half the limit,
 * the true count is under the limit whenever either server stops batching; past that every hit
 * is written at once. Hits batched in a server that then crashes are lost (under half a limit of
 * one client's requests), the usual trade of a write-behind counter.
 */
export class PostgresRateLimitStore implements Store {
  /** Counts are shared between processes, so express-rate-limit must not assume they are local. */
  readonly localKeys = false;
  prefix = '';
  private windowMs = 60_000;
  private limit = Infinity;
  /** Per key: the shared total at the last write, hits since, and when the window ends. */
  private readonly local = new Map<string, { total: number; pending: number; resetAt: Date; syncedAt: number }>();
  private flushTimer: NodeJS.Timeout | null = null;

  constructor(
    private readonly pool: Pool,
    private readonly name?: string,
    private readonly batching: { batchBelow: number; syncMs: number } = { batchBelow: 0.5, syncMs: 200 },
  ) {}

  init(options: Options): void {
    this.windowMs = options.windowMs;
    const limit = typeof options.limit === 'number' ? options.limit : 'dynamic';
    this.limit = typeof options.limit === 'number' ? options.limit : 0;
    this.prefix = `${this.name ? `${this.name}:` : ''}${options.windowMs}/${limit}:`;
  }

  async increment(key: string): Promise<ClientRateLimitInfo> {
    const now = Date.now();
    const seen = this.local.get(key);
    if (
      seen &&
      seen.resetAt.getTime() > now &&
      now - seen.syncedAt < this.batching.syncMs &&
      seen.total + seen.pending + 1 < this.limit * this.batching.batchBelow
    ) {
      seen.pending += 1;
      this.scheduleFlush();
      return { totalHits: seen.total + seen.pending, resetTime: seen.resetAt };
    }
    // Written now, together with any hits still waiting for this key (unless their window has
    // ended: they counted against a window nobody is limited by any more).
    const carried = seen && seen.resetAt.getTime() > now ? seen.pending : 0;
    const hits = 1 + carried;
    if (seen) seen.pending = 0;
    try {
      const row = await this.write(key, hits);
      // Hits batched while the write was out stay waiting.
      this.local.set(key, { total: row.hits, pending: this.local.get(key)?.pending ?? 0, resetAt: row.reset_at, syncedAt: Date.now() });
      return { totalHits: row.hits, resetTime: row.reset_at };
    } catch (error) {
      if (seen) seen.pending += carried;
      throw error;
    }
  }

  private async write(key: string, hits: number): Promise<{ hits: number; reset_at: Date }> {
    const { rows } = await this.pool.query<{ hits: number; reset_at: Date }>({
      name: 'rate-limit-increment',
      text: `INSERT INTO rate_limit_hits AS r (key, hits, reset_at)
       VALUES ($1, $3, now() + $2 * interval '1 millisecond')
       ON CONFLICT (key) DO UPDATE SET
         hits = CASE WHEN r.reset_at <= now() THEN EXCLUDED.hits ELSE r.hits + EXCLUDED.hits END,
         reset_at = CASE WHEN r.reset_at <= now() THEN EXCLUDED.reset_at ELSE r.reset_at END
       RETURNING hits, reset_at`,
      values: [this.prefix + key, this.windowMs, hits],
    });
    return rows[0];
  }

  private scheduleFlush(): void {
    if (this.flushTimer) return;
    this.flushTimer = setTimeout(() => {
      this.flushTimer = null;
      void this.flush();
    }, this.batching.syncMs);
    // Waiting hits never keep a process alive.
    this.flushTimer.unref();
  }

  /** Writes every key's waiting hits; the next hit of a key then reads the fresh total. */
  async flush(): Promise<void> {
    const now = Date.now();
    // Hits of a window that has ended are dropped, not written into the next one.
    for (const entry of this.local.values()) if (entry.pending > 0 && entry.resetAt.getTime() <= now) entry.pending = 0;
    const waiting = [...this.local].filter(([, entry]) => entry.pending > 0);
    await Promise.all(
      waiting.map(async ([key, entry]) => {
        const hits = entry.pending;
        entry.pending = 0;
        try {
          const row = await this.write(key, hits);
          this.local.set(key, { total: row.hits, pending: this.local.get(key)?.pending ?? 0, resetAt: row.reset_at, syncedAt: Date.now() });
        } catch {
          // The database is away: keep the hits for the next attempt.
          entry.pending += hits;
        }
      }),
    );
    // Forget keys whose window ended, so the map holds only active clients.
    const later = Date.now();
    for (const [key, entry] of this.local) if (entry.pending === 0 && entry.resetAt.getTime() <= later) this.local.delete(key);
  }

  async get(key: string): Promise<ClientRateLimitInfo | undefined> {
    await this.flushKey(key);
    const { rows } = await this.pool.query<{ hits: number; reset_at: Date }>(
      'SELECT hits, reset_at FROM rate_limit_hits WHERE key = $1 AND reset_at > now()',
      [this.prefix + key],
    );
    return rows[0] ? { totalHits: rows[0].hits, resetTime: rows[0].reset_at } : undefined;
  }

  private async flushKey(key: string): Promise<void> {
    const entry = this.local.get(key);
    if (!entry?.pending) return;
    const hits = entry.pending;
    entry.pending = 0;
    const row = await this.write(key, hits);
    this.local.set(key, { total: row.hits, pending: this.local.get(key)?.pending ?? 0, resetAt: row.reset_at, syncedAt: Date.now() });
  }

  async decrement(key: string): Promise<void> {
    const entry = this.local.get(key);
    if (entry && entry.pending > 0) {
      entry.pending -= 1;
      return;
    }
    await this.pool.query('UPDATE rate_limit_hits SET hits = GREATEST(hits - 1, 0) WHERE key = $1 AND reset_at > now()', [
      this.prefix + key,
    ]);
    this.local.delete(key);
  }

  async resetKey(key: string): Promise<void> {
    this.local.delete(key);
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
