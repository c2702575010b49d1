import { Router } from 'express';
import type { Deps } from '../../lib/deps';
import { requirePermission } from '../../middleware/auth';
import { shopRepository } from './shop.repository';

/** The shop's public facts, and its machines for signed-in people. */
export function shopRoutes({ db }: Deps): Router {
  const shop = shopRepository(db);
  const router = Router();

  router.get('/shop', async (_req, res) => {
    res.json(await shop.get());
  });

  router.get('/machines', requirePermission('read:machine:any'), async (_req, res) => {
    res.json({ items: await shop.listMachines() });
  });

  return router;
}
