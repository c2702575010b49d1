import { Router } from 'express';
import { auditQuerySchema } from '@chuckkey/core';
import type { Deps } from '../../lib/deps';
import { parse } from '../../lib/validate';
import { requirePermission } from '../../middleware/auth';
import { auditService } from './audit.service';

export function auditRoutes(deps: Deps): Router {
  const service = auditService(deps);
  const router = Router();

  router.get('/', requirePermission('read:audit:any'), async (req, res) => {
    const query = parse(auditQuerySchema, req.query, 'query');
    if (query.format === 'csv') {
      res.type('text/csv; charset=utf-8').attachment('audit-log.csv').send(await service.exportCsv(query));
      return;
    }
    res.json(await service.list(query));
  });

  return router;
}
