import { Router } from 'express';
import { usageReportQuerySchema } from '@chuckkey/core';
import type { Deps } from '../../lib/deps';
import { parse } from '../../lib/validate';
import { requirePermission } from '../../middleware/auth';
import { reportsService, usageCsv, usageCsvFilename } from './reports.service';

/** The usage review: admins only. */
export function reportsRoutes(deps: Deps): Router {
  const service = reportsService(deps);
  const router = Router();

  router.get('/usage', requirePermission('read:report:any'), async (req, res) => {
    const query = parse(usageReportQuerySchema, req.query, 'query');
    const report = await service.usage(query);
    res.set('Cache-Control', 'no-store');
    if (query.format === 'csv') {
      res.type('text/csv; charset=utf-8').attachment(usageCsvFilename(report, query.table)).send(usageCsv(report, query.table));
      return;
    }
    res.json(report);
  });

  return router;
}
