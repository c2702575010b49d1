import { Router } from 'express';
import { idParamsSchema, tagOutClearSchema, tagOutCreateSchema, tagOutListQuerySchema } from '@chuckkey/core';
import type { Deps } from '../../lib/deps';
import { parse } from '../../lib/validate';
import { currentUser, requirePermission } from '../../middleware/auth';
import { tagOutsService } from './tag-outs.service';

/** A machine's tag-out. Who may clear one depends on who tagged it, so the service decides that. */
export function tagOutsRoutes(deps: Deps): Router {
  const service = tagOutsService(deps);
  const router = Router();

  router.get('/tag-outs', requirePermission('read:tag-out:any'), async (req, res) => {
    const { open } = parse(tagOutListQuerySchema, req.query, 'query');
    res.setHeader('Cache-Control', 'no-store');
    res.json({ items: await service.list(open) });
  });

  router.post('/machines/:id/tag-out', requirePermission('create:tag-out:any'), async (req, res) => {
    const { id } = parse(idParamsSchema, req.params, 'params');
    const { reason } = parse(tagOutCreateSchema, req.body, 'body');
    res.status(201).json(await service.tagOut(currentUser(req), id, reason));
  });

  router.post('/machines/:id/tag-out/clear', async (req, res) => {
    const user = currentUser(req);
    const { id } = parse(idParamsSchema, req.params, 'params');
    const { note } = parse(tagOutClearSchema, req.body, 'body');
    res.json(await service.clear(user, id, note));
  });

  return router;
}
