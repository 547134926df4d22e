/**
 * Rate limits on sign-in and password-reset requests (express-rate-limit,
 * per client address, in memory). Limits come from the environment so a test
 * can run with a limit of a few requests without slowing everything else.
 */
import { rateLimit } from 'express-rate-limit';
import type { RequestHandler } from 'express';
import type { Config } from '../config';
import { Problem } from '../errors';

export function rateLimiter(config: Pick<Config, 'rateLimits'>, limit: number, what: string): RequestHandler {
  const windowSeconds = config.rateLimits.windowSeconds;
  return rateLimit({
    windowMs: windowSeconds * 1000,
    limit,
    standardHeaders: 'draft-7',
    legacyHeaders: false,
    handler: (_req, _res, next) => {
      next(new Problem(429, 'Too many requests', `Too many ${what} attempts; try again later.`, [], { 'Retry-After': String(windowSeconds) }));
    },
  });
}
