import { rateLimit } from 'express-rate-limit';
import { AppError } from '../errors';

/** Slows password guessing: a budget of attempts per client address per window. */
export function authRateLimit(limit: number) {
  return rateLimit({
    windowMs: 15 * 60 * 1000,
    limit,
    standardHeaders: 'draft-8',
    legacyHeaders: false,
    handler: (_req, _res, next) => next(new AppError(429, 'too_many_attempts', 'Too many attempts from this address: wait a few minutes and try again')),
  });
}
