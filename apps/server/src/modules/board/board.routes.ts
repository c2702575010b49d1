import { Router, type Request, type Response } from 'express';
import { STATION_COOKIE } from '@chuckkey/core';
import type { Deps } from '../../lib/deps';
import { AppError } from '../../lib/errors';
import { readCookie, stationFromRequest } from '../../middleware/station-auth';
import { stationsRepository } from '../stations/stations.repository';
import { boardService } from './board.service';

export const boardUnauthorized = () =>
  new AppError(401, 'unauthorized', 'Pair this screen as a board at Setup › Stations, or sign in, to see the board.');

/**
 * GET /api/board for a paired device of any kind (its cookie) or anyone signed in. Mounted after
 * the web session so that a person's sign-in counts; a device is found by its cookie alone.
 */
export function boardRoutes(deps: Deps): Router {
  const service = boardService(deps);
  const stations = stationsRepository(deps.db);
  const router = Router();

  async function admit(req: Request, res: Response): Promise<void> {
    if (readCookie(req.headers.cookie, STATION_COOKIE)) {
      try {
        // Also records the device's contact, as every station request does.
        await stationFromRequest(deps, req, res, (hash) => stations.findByDeviceTokenHash(hash));
        return;
      } catch (error) {
        // A revoked or unknown device cookie (now cleared) still leaves a signed-in person in.
        if (!(error instanceof AppError && error.code === 'station_required')) throw error;
      }
    }
    if (!req.user) throw boardUnauthorized();
  }

  router.get('/', async (req, res) => {
    await admit(req, res);
    res.setHeader('Cache-Control', 'no-store');
    res.json(await service.board(new Date()));
  });

  return router;
}
