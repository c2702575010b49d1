import { Router } from 'express';
import { idParamsSchema, machineInputSchema } from '@chuckkey/core';
import type { Deps } from '../../lib/deps';
import { parse } from '../../lib/validate';
import { requirePermission } from '../../middleware/auth';
import { machinesService } from './machines.service';

/** The shop's machines and areas: everyone signed in reads them, admins change them. */
export function machinesRoutes(deps: Deps): Router {
  const service = machinesService(deps);
  const router = Router();

  router.get('/machines', requirePermission('read:machine:any'), async (_req, res) => {
    res.json(await service.list());
  });

  router.get('/machines/:id', requirePermission('read:machine:any'), async (req, res) => {
    const { id } = parse(idParamsSchema, req.params, 'params');
    res.json(await service.get(id));
  });

  router.post('/machines', requirePermission('manage:machine:any'), async (req, res) => {
    const input = parse(machineInputSchema, req.body, 'body');
    res.status(201).json(await service.create(input));
  });

  router.put('/machines/:id', requirePermission('manage:machine:any'), async (req, res) => {
    const { id } = parse(idParamsSchema, req.params, 'params');
    const input = parse(machineInputSchema, req.body, 'body');
    res.json(await service.update(id, input));
  });

  router.get('/areas', requirePermission('read:machine:any'), async (_req, res) => {
    res.json(await service.listAreas());
  });

  return router;
}
