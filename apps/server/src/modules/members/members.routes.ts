import { Router } from 'express';
import { z } from 'zod';
import { idParamsSchema, memberListQuerySchema, memberUpdateSchema } from '@chuckkey/core';
import type { Deps } from '../../lib/deps';
import { parse } from '../../lib/validate';
import { currentUser, requirePermission } from '../../middleware/auth';
import { membersService } from './members.service';

const listQuerySchema = memberListQuerySchema.extend({ format: z.enum(['json', 'csv']).default('json') });

export function membersRoutes(deps: Deps): Router {
  const service = membersService(deps);
  const router = Router();

  router.get('/', requirePermission('read:member:any'), async (req, res) => {
    const { format, ...query } = parse(listQuerySchema, req.query, 'query');
    if (format === 'csv') {
      res.type('text/csv; charset=utf-8').attachment('members.csv').send(await service.exportCsv(query));
      return;
    }
    res.json(await service.list(query));
  });

  router.patch('/:id', requirePermission('update:member:any'), async (req, res) => {
    const { id } = parse(idParamsSchema, req.params, 'params');
    const changes = parse(memberUpdateSchema, req.body, 'body');
    res.json(await service.update(currentUser(req), id, changes));
  });

  return router;
}
