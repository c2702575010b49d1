import { Router } from 'express';
import { idParamsSchema, stationCreateSchema } from '@chuckkey/core';
import type { Deps } from '../../lib/deps';
import { parse } from '../../lib/validate';
import { currentUser, requirePermission } from '../../middleware/auth';
import { stationsService } from './stations.service';

/** Admins set up stations and hand out the pairing codes that tie a device to one. */
export function stationsRoutes(deps: Deps): Router {
  const service = stationsService(deps);
  const router = Router();
  router.use(requirePermission('manage:station:any'));

  router.get('/', async (_req, res) => {
    res.json(await service.list());
  });

  router.post('/', async (req, res) => {
    const input = parse(stationCreateSchema, req.body, 'body');
    res.status(201).json(await service.create(currentUser(req), input));
  });

  router.post('/:id/revoke', async (req, res) => {
    const { id } = parse(idParamsSchema, req.params, 'params');
    res.json(await service.revoke(currentUser(req), id));
  });

  router.post('/:id/pairing-code', async (req, res) => {
    const { id } = parse(idParamsSchema, req.params, 'params');
    res.json(await service.newPairingCode(id));
  });

  return router;
}
