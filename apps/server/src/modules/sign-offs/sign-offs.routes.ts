import { Router } from 'express';
import { idParamsSchema, signOffCreateSchema, signOffReportQuerySchema, signOffRevokeSchema } from '@chuckkey/core';
import type { Deps } from '../../lib/deps';
import { parse } from '../../lib/validate';
import { currentUser, requirePermission, requireUser } from '../../middleware/auth';
import { signOffsService } from './sign-offs.service';

export function signOffsRoutes(deps: Deps): Router {
  const service = signOffsService(deps);
  const router = Router();

  router.post('/sign-offs', requirePermission('create:sign-off:any'), async (req, res) => {
    const input = parse(signOffCreateSchema, req.body, 'body');
    res.status(201).json(await service.create(currentUser(req), input, 'web'));
  });

  router.get('/sign-offs/report', requirePermission('report:sign-off:any'), async (req, res) => {
    const { status, format } = parse(signOffReportQuerySchema, req.query, 'query');
    if (format === 'csv') {
      res.type('text/csv; charset=utf-8').attachment(`sign-offs-${status}.csv`).send(await service.reportCsv(status));
      return;
    }
    res.json(await service.report(status));
  });

  router.post('/sign-offs/:id/revoke', requirePermission('revoke:sign-off:any'), async (req, res) => {
    const { id } = parse(idParamsSchema, req.params, 'params');
    const { reason } = parse(signOffRevokeSchema, req.body, 'body');
    res.json(await service.revoke(currentUser(req), id, reason));
  });

  // Permission depends on whose sign-offs they are, so the service decides.
  router.get('/members/:id/sign-offs', requireUser, async (req, res) => {
    const { id } = parse(idParamsSchema, req.params, 'params');
    res.json(await service.listForMember(currentUser(req), id));
  });

  return router;
}
