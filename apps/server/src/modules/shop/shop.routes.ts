import { Router } from 'express';
import type { Deps } from '../../lib/deps';
import { shopRepository } from './shop.repository';

/** The shop's public facts: name, town and time zone. */
export function shopRoutes({ db }: Deps): Router {
  const shop = shopRepository(db);
  const router = Router();

  router.get('/shop', async (_req, res) => {
    res.json(await shop.get());
  });

  return router;
}
