import type { Request } from 'express';
import { rateLimit } from 'express-rate-limit';
import type { Deps } from '../deps';
import { AppError } from '../errors';
import { DatabaseRateLimitStore } from './database-rate-limit-store';

const WINDOW_MS = 15 * 60 * 1000;

/**
 * Slows password guessing: a budget of attempts per client address per window, one budget per
 * `name` (sign-in, sign-up, …). The counts are kept in the database (shared by every server
 * process) unless the config selects the memory store (counts in this process only).
 */
export function authRateLimit({ db, config }: Pick<Deps, 'db' | 'config'>, name: string) {
  return rateLimit({
    windowMs: WINDOW_MS,
    limit: config.authRateLimit,
    standardHeaders: 'draft-8',
    legacyHeaders: false,
    identifier: name,
    store: config.authRateLimitStore === 'database' ? new DatabaseRateLimitStore(db, `${name}:`) : undefined,
    // The Retry-After header is already set; the body says the same in words.
    handler: (req: Request, _res, next) => {
      const resetTime = (req as Request & { rateLimit?: { resetTime?: Date } }).rateLimit?.resetTime;
      const seconds = Math.max(1, Math.ceil(((resetTime?.getTime() ?? Date.now() + WINDOW_MS) - Date.now()) / 1000));
      const minutes = Math.ceil(seconds / 60);
      const wait = seconds < 60 ? `${seconds} s` : `${minutes} min`;
      next(new AppError(429, 'too_many_attempts', `Too many attempts from this address: try again in ${wait}`, undefined, { retryAfterSeconds: seconds }));
    },
  });
}
