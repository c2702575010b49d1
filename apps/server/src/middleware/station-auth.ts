import type { Request, RequestHandler, Response } from 'express';
import { ipKeyGenerator } from 'express-rate-limit';
import { HEARTBEAT_SILENCE_MINUTES, STATION_COOKIE } from '@chuckkey/core';
import type { Config } from '../config';
import type { Deps } from '../lib/deps';
import { AppError } from '../lib/errors';
import { hashToken } from '../lib/tokens';
import { stationsRepository, type StationRecord } from '../modules/stations/stations.repository';

/**
 * The cookie goes to the whole API so that a board's reaches GET /api/board and the live-updates
 * handshake (docs/decisions/010); it grants rights only where a route reads it.
 */
export const STATION_COOKIE_PATH = '/api';
/**
 * Where the cookie lived before. A device paired then holds it there: left alone, that older
 * cookie would be sent first to the station routes (the longer path comes first, RFC 6265 §5.4)
 * and, once the token changes on re-pairing, refuse the device.
 */
const LEGACY_COOKIE_PATH = '/api/station';
// Browsers keep a cookie at most 400 days (RFC 6265bis); the server refreshes it while in use.
const COOKIE_MAX_AGE_MS = 400 * 24 * 60 * 60 * 1000;
const LAST_SEEN_EVERY_MS = 60_000;
const SILENCE_MS = HEARTBEAT_SILENCE_MINUTES * 60_000;

export const stationRequired = () =>
  new AppError(401, 'station_required', 'This screen is not paired with a station, or its pairing was revoked. An admin can pair it again.');

function cookieOptions(config: Config, req: Request, path = STATION_COOKIE_PATH) {
  return {
    httpOnly: true,
    // The kiosk app lives on the same origin and never follows a link from another site.
    sameSite: 'strict' as const,
    secure: config.COOKIE_SECURE === 'auto' ? req.secure : config.COOKIE_SECURE === 'true',
    path,
  };
}

export function setStationCookie(config: Config, req: Request, res: Response, token: string): void {
  // The old one is removed first: a client that matches cookie paths by prefix (not as RFC 6265
  // §5.3 says, by the exact path) would otherwise drop the new cookie with it.
  res.clearCookie(STATION_COOKIE, cookieOptions(config, req, LEGACY_COOKIE_PATH));
  res.cookie(STATION_COOKIE, token, { ...cookieOptions(config, req), maxAge: COOKIE_MAX_AGE_MS });
}

export function clearStationCookie(config: Config, req: Request, res: Response): void {
  res.clearCookie(STATION_COOKIE, cookieOptions(config, req));
  res.clearCookie(STATION_COOKIE, cookieOptions(config, req, LEGACY_COOKIE_PATH));
}

/** The value of one cookie from the Cookie header (RFC 6265 §5.4 syntax). */
export function readCookie(header: string | undefined, name: string): string | undefined {
  if (!header) return undefined;
  for (const pair of header.split(';')) {
    const separator = pair.indexOf('=');
    if (separator < 0) continue;
    if (pair.slice(0, separator).trim() === name) return pair.slice(separator + 1).trim().replace(/^"(.*)"$/, '$1');
  }
  return undefined;
}

/**
 * The paired station behind the request's device cookie, found by `lookup` (given the token's
 * hash; it may fetch more in the same round trip), or a station_required error. The device
 * credential is independent of any person's sign-in: a station keeps working when nobody is signed
 * in, and nobody's session grants a station's rights.
 */
export async function stationFromRequest(
  { config, db, live }: Deps,
  req: Request,
  res: Response,
  lookup: (deviceTokenHash: string) => Promise<StationRecord | undefined>,
): Promise<StationRecord> {
  const token = readCookie(req.headers.cookie, STATION_COOKIE);
  if (!token) throw stationRequired();
  const station = await lookup(hashToken(token));
  if (!station || station.revokedAt) {
    clearStationCookie(config, req, res);
    throw stationRequired();
  }
  // Writing on every request would make each scan a row update; once a minute is precise
  // enough for "last contact" and for spotting a station that went quiet.
  const silentFor = station.lastSeenAt ? Date.now() - station.lastSeenAt.getTime() : Infinity;
  if (silentFor >= LAST_SEEN_EVERY_MS) {
    station.lastSeenAt = await stationsRepository(db).touch(station.id);
    setStationCookie(config, req, res, token);
    // Heard again after a silence that showed its machine offline: the board shows it back. Known
    // from the contact just read, so the requests of a station in use cost nothing for it.
    if (silentFor > SILENCE_MS && station.machineId) live.machineChanged(station.machineId);
  }
  req.station = station;
  return station;
}

/** The rate-limit key of a request's device: its token's hash, or its address when it has none. */
export function deviceKey(req: Request): string {
  const token = readCookie(req.headers.cookie, STATION_COOKIE);
  // ipKeyGenerator groups an IPv6 address by its /56, as the library's own limits do.
  return token ? hashToken(token) : `address:${ipKeyGenerator(req.ip ?? '')}`;
}

/** Loads the paired station from its device cookie into `req.station`. */
export function requireStation(deps: Deps): RequestHandler {
  const stations = stationsRepository(deps.db);
  return async (req, res, next) => {
    try {
      await stationFromRequest(deps, req, res, (hash) => stations.findByDeviceTokenHash(hash));
      next();
    } catch (error) {
      next(error);
    }
  };
}

export function currentStation(req: Request): StationRecord {
  if (!req.station) throw stationRequired();
  return req.station;
}
