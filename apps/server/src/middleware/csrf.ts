import type { RequestHandler } from 'express';
import { AppError } from '../lib/errors';
import { randomToken, safeEqual } from '../lib/tokens';

const SAFE_METHODS = new Set(['GET', 'HEAD', 'OPTIONS']);
export const CSRF_HEADER = 'x-csrf-token';

/**
 * Synchronizer token (OWASP CSRF Prevention Cheat Sheet): one random token per session, sent
 * back in a header on every state-changing request. A cross-site form cannot set the header.
 */
export const csrfProtection: RequestHandler = (req, _res, next) => {
  if (SAFE_METHODS.has(req.method)) {
    next();
    return;
  }
  const sent = req.get(CSRF_HEADER);
  const expected = req.session.csrfToken;
  if (!sent || !expected || !safeEqual(sent, expected)) {
    next(new AppError(403, 'csrf_invalid', 'The page was open too long or the request did not come from Chuckkey. Reload and try again.'));
    return;
  }
  next();
};

export function csrfToken(session: Express.Request['session']): string {
  session.csrfToken ??= randomToken();
  return session.csrfToken;
}
