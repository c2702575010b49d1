import { Router } from 'express';
import { idParamsSchema, trainingInputSchema } from '@chuckkey/core';
import type { Deps } from '../../lib/deps';
import { parse } from '../../lib/validate';
import { requirePermission } from '../../middleware/auth';
import { trainingsService } from './trainings.service';

export function trainingsRoutes(deps: Deps): Router {
  const service = trainingsService(deps);
  const router = Router();

  router.get('/', requirePermission('read:training:any'), async (_req, res) => {
    res.json(await service.list());
  });

  router.post('/', requirePermission('manage:training:any'), async (req, res) => {
    const input = parse(trainingInputSchema, req.body, 'body');
    res.status(201).json(await service.create(input));
  });

  router.put('/:id', requirePermission('manage:training:any'), async (req, res) => {
    const { id } = parse(idParamsSchema, req.params, 'params');
    const input = parse(trainingInputSchema, req.body, 'body');
    res.json(await service.update(id, input));
  });

  return router;
}
