import type { Request } from 'express';
import { rateLimit } from 'express-rate-limit';
import { ERROR_CODES } from '../../shared/types/errors';

type LimitOptions = {
  windowMs: number;
  max: number;
  /** Who is counted: the client address by default; a racer's account where one account must not spread its posts over many addresses. */
  keyGenerator?: (req: Request) => string;
  /** The refusal's wording, given the seconds to wait. */
  message?: (retryAfterSeconds: number) => string;
};

/** A limiter whose refusal is our JSON error body with the seconds to wait. */
export function jsonRateLimit(options: LimitOptions) {
  return rateLimit({
    windowMs: options.windowMs,
    limit: options.max,
    standardHeaders: 'draft-7',
    legacyHeaders: false,
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
