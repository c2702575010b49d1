import { Router } from 'express';
import { z } from 'zod';
import type { Deps } from '../../lib/deps';
import { parse } from '../../lib/validate';
import { requirePermission } from '../../middleware/auth';
import { outboxRepository } from './outbox.repository';

const outboxQuerySchema = z.object({
  page: z.coerce.number().int().min(1).default(1),
  pageSize: z.coerce.number().int().min(1).max(100).default(25),
});

export function outboxRoutes({ db }: Deps): Router {
  const outbox = outboxRepository(db);
  const router = Router();

  router.get('/', requirePermission('read:outbox:any'), async (req, res) => {
    const { page, pageSize } = parse(outboxQuerySchema, req.query, 'query');
    res.json(await outbox.list(page, pageSize));
  });

  return router;
}
