import { Router } from 'express';
import { rateLimit } from 'express-rate-limit';
import {
  pairSchema,
  sessionEndSchema,
  sessionStartSchema,
  stationDutySchema,
  stationInstructorSchema,
  stationMemberLookupSchema,
  stationScanSchema,
  stationSignOffSchema,
} from '@chuckkey/core';
import { z } from 'zod';
import type { Deps } from '../../lib/deps';
import { perAddressLimit } from '../../lib/rate-limit';
import { AppError } from '../../lib/errors';
import { parse } from '../../lib/validate';
import { currentStation, requireStation, setStationCookie } from '../../middleware/station-auth';
import { badgesService } from '../badges/badges.service';
import { machineSessionsService, stationPhotoAllowed } from '../machine-sessions/machine-sessions.service';
import { stationService } from './station.service';

/**
 * Scans one station may send a minute by default: far above a queue of people, well below a
 * stuck scanner. STATION_SCAN_LIMIT_PER_MINUTE changes it (the scan benchmark raises it).
 */
export const SCANS_PER_MINUTE = 60;

const sessionParams = z.object({ id: z.uuid({ error: 'Not a session id.' }) });

/**
 * What a paired device may do. These routes keep CSRF protection like the rest of the API: the
 * kiosk fetches its token from GET /api/auth/csrf, which works without anyone signed in.
 */
export function stationRoutes(deps: Deps): Router {
  const service = stationService(deps);
  const sessions = machineSessionsService(deps);
  // Counted per station, not per address: several stations may share one address behind the shop's router.
  const scanLimit = rateLimit({
    windowMs: 60_000,
    limit: deps.config.STATION_SCAN_LIMIT_PER_MINUTE,
    standardHeaders: 'draft-8',
    legacyHeaders: false,
    keyGenerator: (req) => currentStation(req).id,
    handler: (_req, _res, next) => next(new AppError(429, 'too_many_requests', 'Too many scans at this station. Wait a minute and try again.')),
  });
  const router = Router();

  // Per process, in memory: about 40 bits of code, 10 minutes of life and 10 wrong tries per
  // address per 15 minutes leave nothing to guess. Successful pairings are not counted, so an
  // admin setting up a room of stations behind one address is not held up.
  const pairLimit = perAddressLimit(10, 15, { countSuccesses: false });
  router.post('/pair', pairLimit, async (req, res) => {
    const { pairingCode } = parse(pairSchema, req.body, 'body');
    const { token, stationId } = await service.pair(pairingCode);
    setStationCookie(deps.config, req, res, token);
    res.json(await service.self(stationId));
  });

  router.use(requireStation(deps));

  router.get('/', async (req, res) => {
    res.json(await service.self(currentStation(req).id));
  });

  router.post('/heartbeat', (_req, res) => {
    res.status(204).end();
  });

  router.post('/instructor', async (req, res) => {
    const { badge, pin } = parse(stationInstructorSchema, req.body, 'body');
    res.json(await service.instructor(currentStation(req), badge, pin));
  });

  router.post('/members/lookup', async (req, res) => {
    const { badge } = parse(stationMemberLookupSchema, req.body, 'body');
    res.json(await service.lookupMember(badge));
  });

  router.post('/sign-offs', async (req, res) => {
    const input = parse(stationSignOffSchema, req.body, 'body');
    res.status(201).json(await service.signOff(currentStation(req), input));
  });

  router.post('/scan', scanLimit, async (req, res) => {
    const { badge } = parse(stationScanSchema, req.body, 'body');
    res.json(await sessions.scan(currentStation(req), badge, new Date()));
  });

  const photoQuery = z.object({ t: z.string().max(200) });
  const memberParams = z.object({ id: z.uuid({ error: 'Not a member id.' }) });
  router.get('/members/:id/photo', async (req, res) => {
    const { id } = parse(memberParams, req.params, 'params');
    const { t } = parse(photoQuery, req.query, 'query');
    if (!stationPhotoAllowed(deps.config.SESSION_SECRET, currentStation(req).id, id, t, new Date())) {
      throw new AppError(403, 'photo_not_allowed', 'A station shows a member\'s photo only just after their badge was scanned there.');
    }
    const photo = await badgesService(deps).photo(id);
    res.type(photo.contentType).setHeader('Cache-Control', 'no-store');
    res.send(photo.image);
  });

  router.get('/state', async (req, res) => {
    res.json(await sessions.state(currentStation(req)));
  });

  router.post('/sessions', async (req, res) => {
    const input = parse(sessionStartSchema, req.body, 'body');
    res.status(201).json(await sessions.start(currentStation(req), input, new Date()));
  });

  router.post('/sessions/:id/end', async (req, res) => {
    const { id } = parse(sessionParams, req.params, 'params');
    const input = parse(sessionEndSchema, req.body, 'body');
    res.json(await sessions.end(currentStation(req), id, input, new Date()));
  });

  router.post('/duty', async (req, res) => {
    const { badge, pin } = parse(stationDutySchema, req.body, 'body');
    res.json(await service.duty(currentStation(req), badge, pin));
  });

  return router;
}
