import { Router } from 'express';
import { closureInputSchema, idParamsSchema, weeklyHoursInputSchema } from '@chuckkey/core';
import type { Deps } from '../../lib/deps';
import { parse } from '../../lib/validate';
import { currentUser, requirePermission, requireUser } from '../../middleware/auth';
import { shopRepository } from './shop.repository';
import { shopHoursService } from './shop.service';

/** The shop's public facts (name, town, time zone), and its opening hours and closures. */
export function shopRoutes(deps: Deps): Router {
  const shop = shopRepository(deps.db);
  const hours = shopHoursService(deps);
  const router = Router();

  router.get('/shop', async (_req, res) => {
    res.json(await shop.get());
  });

  router.get('/shop/hours', requireUser, async (_req, res) => {
    res.json(await hours.hours(new Date()));
  });

  router.put('/shop/hours', requirePermission('manage:shop:any'), async (req, res) => {
    const input = parse(weeklyHoursInputSchema, req.body, 'body');
    res.json(await hours.replaceWeekly(currentUser(req), input, new Date()));
  });

  router.post('/shop/closures', requirePermission('manage:shop:any'), async (req, res) => {
    const input = parse(closureInputSchema, req.body, 'body');
    res.status(201).json(await hours.addClosure(currentUser(req), input, new Date()));
  });

  router.delete('/shop/closures/:id', requirePermission('manage:shop:any'), async (req, res) => {
    const { id } = parse(idParamsSchema, req.params, 'params');
    await hours.removeClosure(currentUser(req), id);
    res.status(204).end();
  });

  return router;
}
