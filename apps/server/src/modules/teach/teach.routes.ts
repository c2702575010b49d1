import { Router } from 'express';
import { teachMemberQuerySchema } from '@chuckkey/core';
import type { Deps } from '../../lib/deps';
import { parse } from '../../lib/validate';
import { requirePermission } from '../../middleware/auth';
import { teachService } from './teach.service';

/** Instructors' tools around teaching: finding the member in front of them. */
export function teachRoutes(deps: Deps): Router {
  const service = teachService(deps);
  const router = Router();

  router.get('/members', requirePermission('search:member:any'), async (req, res) => {
    const { search } = parse(teachMemberQuerySchema, req.query, 'query');
    res.json(await service.searchMembers(search));
  });

  return router;
}
