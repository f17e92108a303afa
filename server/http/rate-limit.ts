// Rate limit for the account routes: after `limit` failed attempts from one address in a
// window the next answers 429. Successful requests do not count and a successful sign-in
// clears the count, so it measures failures in a row.
import type { Request } from 'express';
import { ipKeyGenerator, rateLimit, type RateLimitRequestHandler } from 'express-rate-limit';
import { HttpError } from './http-error.ts';

/** The counter key of a request: its address (IPv6 grouped by /56 as the library advises). */
export const limiterKey = (req: Request) => ipKeyGenerator(req.ip ?? 'unknown');

export function failureLimiter(limit: number, windowMs: number): RateLimitRequestHandler {
  return rateLimit({
    windowMs,
    limit,
    skipSuccessfulRequests: true,
    keyGenerator: limiterKey,
    standardHeaders: 'draft-8',
    legacyHeaders: false,
    handler: (req, res, next) => {
      const reset = (req as typeof req & { rateLimit?: { resetTime?: Date } }).rateLimit?.resetTime;
      const seconds = reset ? Math.max(1, Math.ceil((reset.getTime() - Date.now()) / 1000)) : Math.ceil(windowMs / 1000);
      res.setHeader('Retry-After', String(seconds));
      next(new HttpError(429, 'rate_limited', `Too many failed attempts; try again in ${Math.ceil(seconds / 60)} minute(s).`));
    },
  });
}
