import { Router } from 'express';
import { idParamsSchema, maintenanceCompleteSchema, maintenanceTaskInputSchema } from '@chuckkey/core';
import type { Deps } from '../../lib/deps';
import { parse } from '../../lib/validate';
import { currentUser, requirePermission } from '../../middleware/auth';
import { maintenanceService } from './maintenance.service';

/** Maintenance tasks: instructors and admins see them and record work done; admins set them up. */
export function maintenanceRoutes(deps: Deps): Router {
  const service = maintenanceService(deps);
  const router = Router();

  router.get('/maintenance', requirePermission('read:maintenance:any'), async (_req, res) => {
    res.json(await service.list());
  });

  router.get('/machines/:id/maintenance', requirePermission('read:maintenance:any'), async (req, res) => {
    const { id } = parse(idParamsSchema, req.params, 'params');
    res.json(await service.forMachine(id));
  });

  router.post('/machines/:id/maintenance', requirePermission('manage:maintenance:any'), async (req, res) => {
    const { id } = parse(idParamsSchema, req.params, 'params');
    const input = parse(maintenanceTaskInputSchema, req.body, 'body');
    res.status(201).json(await service.create(currentUser(req), id, input));
  });

  router.put('/maintenance/:id', requirePermission('manage:maintenance:any'), async (req, res) => {
    const { id } = parse(idParamsSchema, req.params, 'params');
    const input = parse(maintenanceTaskInputSchema, req.body, 'body');
    res.json(await service.update(currentUser(req), id, input));
  });

  router.post('/maintenance/:id/complete', requirePermission('complete:maintenance:any'), async (req, res) => {
    const { id } = parse(idParamsSchema, req.params, 'params');
    const { note } = parse(maintenanceCompleteSchema, req.body ?? {}, 'body');
    res.json(await service.complete(currentUser(req), id, note));
  });

  return router;
}
