import type { Request } from 'express';
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

/** The refusal of a station's badge scans over its limit, at a machine and at the crib alike. */
export const TOO_MANY_SCANS = 'Too many scans at this station. Wait a minute and try again.';

/**
 * A per-process limit a minute on one paired device, keyed by `key` (the station routes pass
 * the hashed device credential, as they are limited before the station is looked up: several
 * stations may share one address behind the shop's router). `words` is the refusal's message.
 */
export function perDeviceLimit(limit: number, words: string, key: (req: Request) => string) {
  return rateLimit({
    windowMs: 60_000,
    limit,
    // No RateLimit headers on every scan: a station never reads them, and making them (the draft-8
    // form hashes a partition key) was a measurable share of a scan's cost. A refusal says
    // Retry-After (RFC 9110 §10.2.3), in whole seconds and at least one.
    standardHeaders: false,
    legacyHeaders: false,
    keyGenerator: key,
    handler: (req, res, next) => {
      const resetTime = (req as typeof req & { rateLimit?: { resetTime?: Date } }).rateLimit?.resetTime;
      res.setHeader('Retry-After', String(Math.max(1, Math.ceil(((resetTime?.getTime() ?? Date.now() + 60_000) - Date.now()) / 1000))));
      next(new AppError(429, 'too_many_requests', words));
    },
  });
}
