import { Router } from 'express';
import type { Deps } from '../../lib/deps';
import { databaseIsUp } from '../../lib/db';

export function healthRoutes({ db }: Deps): Router {
  const router = Router();
  // Load balancers poll this; it stays up when PostgreSQL is down and says so.
  router.get('/', async (_req, res) => {
    const up = await databaseIsUp(db);
    res.status(up ? 200 : 503).json(up ? { status: 'ok', database: 'ok' } : { status: 'degraded', database: 'down' });
  });
  return router;
}
