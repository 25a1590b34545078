import { rateLimit } from 'express-rate-limit';
import { ERROR_CODES } from '../../shared/types/errors';

/** A limiter whose refusal is our JSON error body with the seconds to wait. */
export function jsonRateLimit(options: { windowMs: number; max: number }) {
  return rateLimit({
    windowMs: options.windowMs,
    limit: options.max,
    standardHeaders: 'draft-7',
    legacyHeaders: false,
    handler: (req, res, _next, opts) => {
      const resetTime = (req as typeof req & { rateLimit?: { resetTime?: Date } }).rateLimit?.resetTime;
      const retryAfterSeconds = resetTime
        ? Math.max(1, Math.ceil((resetTime.getTime() - Date.now()) / 1000))
        : Math.ceil(opts.windowMs / 1000);
      res.status(429).json({
        error: {
          code: ERROR_CODES.rateLimited,
          message: `Too many requests. Try again in ${retryAfterSeconds} s.`,
          details: { retryAfterSeconds },
        },
      });
    },
  });
}
