import { Router } from 'express';
import { pairSchema, stationInstructorSchema, stationMemberLookupSchema, stationSignOffSchema } from '@chuckkey/core';
import type { Deps } from '../../lib/deps';
import { perAddressLimit } from '../../lib/rate-limit';
import { parse } from '../../lib/validate';
import { currentStation, requireStation, setStationCookie } from '../../middleware/station-auth';
import { stationService } from './station.service';

/**
 * What a paired device may do. These routes keep CSRF protection like the rest of the API: the
 * kiosk fetches its token from GET /api/auth/csrf, which works without anyone signed in.
 */
export function stationRoutes(deps: Deps): Router {
  const service = stationService(deps);
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

  return router;
}
