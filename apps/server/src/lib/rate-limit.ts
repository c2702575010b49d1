import { rateLimit } from 'express-rate-limit';
import { AppError } from './errors';

/**
 * A per-process limit on how often one client address may call a route (express-rate-limit,
 * in memory). For limits that must hold across processes, count in PostgreSQL instead.
 */
export function perAddressLimit(limit: number, windowMinutes = 15, options: { countSuccesses?: boolean } = {}) {
  return rateLimit({
    windowMs: windowMinutes * 60_000,
    limit,
    // Where only failures matter (guessing a code), answers below 400 are not counted.
    skipSuccessfulRequests: options.countSuccesses === false,
    standardHeaders: 'draft-8',
    legacyHeaders: false,
    handler: (_req, _res, next) => next(new AppError(429, 'too_many_requests', 'Too many requests. Wait a few minutes and try again.')),
  });
}
