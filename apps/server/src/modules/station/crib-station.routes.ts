import { Router, type RequestHandler } from 'express';
import { cribStationCheckoutInputSchema, cribStationMemberInputSchema, cribStationReturnInputSchema, cribTagLookupInputSchema } from '@chuckkey/core';
import type { Deps } from '../../lib/deps';
import { perDeviceLimit, TOO_MANY_SCANS } from '../../lib/rate-limit';
import { parse } from '../../lib/validate';
import { currentStation, deviceKey } from '../../middleware/station-auth';
import { cribStationService, notACribStation } from './crib-station.service';

/**
 * The crib station's device routes, mounted under /api/station/crib after the device check. Only
 * a station paired to the crib may use them.
 */
export function cribStationRoutes(deps: Deps): Router {
  const service = cribStationService(deps);
  const router = Router();

  const onlyCrib: RequestHandler = (req, _res, next) => {
    next(currentStation(req).kind === 'crib' ? undefined : notACribStation());
  };
  // Badges are limited as at a machine's /scan, per device credential: far above a queue at the
  // crib, well below a stuck scanner (STATION_SCAN_LIMIT_PER_MINUTE).
  const badgeLimit = perDeviceLimit(deps.config.STATION_SCAN_LIMIT_PER_MINUTE, TOO_MANY_SCANS, deviceKey);

  router.use(onlyCrib);

  router.post('/member', badgeLimit, async (req, res) => {
    const { badge } = parse(cribStationMemberInputSchema, req.body, 'body');
    res.json(await service.member(badge, new Date()));
  });

  router.post('/items/lookup', async (req, res) => {
    const { tag } = parse(cribTagLookupInputSchema, req.body, 'body');
    res.json(await service.lookup(tag, new Date()));
  });

  router.get('/consumables', async (_req, res) => {
    res.json(await service.consumables());
  });

  router.post('/checkouts', badgeLimit, async (req, res) => {
    const input = parse(cribStationCheckoutInputSchema, req.body, 'body');
    res.status(201).json({ checkouts: await service.checkOut(currentStation(req), input, new Date()) });
  });

  router.post('/returns', async (req, res) => {
    const input = parse(cribStationReturnInputSchema, req.body, 'body');
    res.json(await service.returnTool(currentStation(req), input));
  });

  return router;
}
