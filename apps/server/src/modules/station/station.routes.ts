import { Router } from 'express';
import {
  pairSchema,
  reservationCheckInSchema,
  sessionEndSchema,
  sessionStartSchema,
  stationDutySchema,
  stationInstructorSchema,
  stationMemberLookupSchema,
  stationScanSchema,
  stationSignOffSchema,
  stationTagOutSchema,
} from '@chuckkey/core';
import { z } from 'zod';
import type { Deps } from '../../lib/deps';
import { perAddressLimit, perDeviceLimit, TOO_MANY_SCANS } from '../../lib/rate-limit';
import { AppError } from '../../lib/errors';
import { parse, ValidationError, zodFieldErrors } from '../../lib/validate';
import { currentStation, deviceKey, requireStation, setStationCookie, stationFromRequest } from '../../middleware/station-auth';
import { badgesService } from '../badges/badges.service';
import type { DenialRecorder } from '../reports/denial-recorder';
import { machineNotFound, machineSessionsService, notAMachineStation, stationPhotoAllowed } from '../machine-sessions/machine-sessions.service';
import { cribStationRoutes } from './crib-station.routes';
import { reservationCheckInService } from './reservation-check-in.service';
import { stationTagOutService } from './station-tag-out.service';
import { stationService } from './station.service';

/**
 * Scans one station may send a minute by default: far above a queue of people, well below a
 * stuck scanner. STATION_SCAN_LIMIT_PER_MINUTE changes it (the scan benchmark raises it).
 */
export const SCANS_PER_MINUTE = 60;

const sessionParams = z.object({ id: z.uuid({ error: 'Not a session id.' }) });
const reservationParams = z.object({ id: z.uuid({ error: 'Not a reservation id.' }) });

/**
 * What a paired device may do. These routes run without the web session (a station is no
 * person's sign-in): app.ts mounts them before it, with their own CSRF defence
 * (middleware/station-csrf.ts).
 */
export function stationRoutes(deps: Deps, denials?: DenialRecorder): Router {
  const service = stationService(deps);
  const sessions = machineSessionsService(deps, { denials });
  // Counted per device credential, not per address: several stations may share one address behind the shop's router.
  const scanLimit = perDeviceLimit(deps.config.STATION_SCAN_LIMIT_PER_MINUTE, TOO_MANY_SCANS, deviceKey);
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

  // The scan looks up its station together with the facts, in one round trip, so it comes
  // before the general device check.
  router.post('/scan', scanLimit, async (req, res) => {
    const parsed = stationScanSchema.safeParse(req.body ?? {});
    const badge = parsed.success ? parsed.data.badge : null;
    let found: Awaited<ReturnType<typeof sessions.scanByDevice>>;
    const station = await stationFromRequest(deps, req, res, async (hash) => {
      found = await sessions.scanByDevice(hash, badge, new Date());
      return found?.station;
    });
    // A paired station hears about its bad input; an unpaired device heard station_required above.
    if (!parsed.success) throw new ValidationError('body', zodFieldErrors(parsed.error));
    if (station.kind !== 'machine') throw notAMachineStation();
    if (!found?.result) throw machineNotFound();
    res.json(found.result);
  });

  router.use(requireStation(deps));

  router.use('/crib', cribStationRoutes(deps));

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
    res.json(await sessions.state(currentStation(req), new Date()));
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

  const checkIns = reservationCheckInService(deps);
  router.post('/reservations/:id/check-in', async (req, res) => {
    const { id } = parse(reservationParams, req.params, 'params');
    const { badge } = parse(reservationCheckInSchema, req.body, 'body');
    res.json(await checkIns.checkIn(currentStation(req), id, badge, new Date()));
  });

  const tagOuts = stationTagOutService(deps);
  router.post('/tag-out', async (req, res) => {
    const input = parse(stationTagOutSchema, req.body, 'body');
    res.status(201).json(await tagOuts.report(currentStation(req), input, new Date()));
  });

  router.post('/duty', async (req, res) => {
    const { badge, pin } = parse(stationDutySchema, req.body, 'body');
    res.json(await service.duty(currentStation(req), badge, pin));
  });

  return router;
}
