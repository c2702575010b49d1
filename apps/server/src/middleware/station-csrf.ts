import type { RequestHandler } from 'express';
import { STATION_REQUEST_HEADER } from '@chuckkey/core';
import { AppError } from '../lib/errors';

const SAFE_METHODS = new Set(['GET', 'HEAD', 'OPTIONS']);

/**
 * CSRF defence of the station routes, which carry no web session (docs/decisions/008): the
 * device cookie is SameSite=Strict and scoped to /api/station, so another site's page cannot send
 * it, and every state-changing request must also carry a custom header, which a page of another
 * origin can only add after a CORS preflight this server never grants (OWASP CSRF Prevention
 * Cheat Sheet, "Employing Custom Request Headers for AJAX/API"). The header also covers pairing,
 * the one station request made before the device holds a cookie.
 */
export const stationRequestCheck: RequestHandler = (req, _res, next) => {
  if (SAFE_METHODS.has(req.method) || req.get(STATION_REQUEST_HEADER) === '1') {
    next();
    return;
  }
  next(new AppError(403, 'csrf_invalid', 'This request did not come from a Chuckkey station screen. Reload the station page and try again.'));
};
