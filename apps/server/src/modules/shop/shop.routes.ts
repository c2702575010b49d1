import { Router } from 'express';
import { closureInputSchema, idParamsSchema, shopPoliciesSchema, weeklyHoursInputSchema } from '@chuckkey/core';
import type { Deps } from '../../lib/deps';
import { parse } from '../../lib/validate';
import { currentUser, requirePermission, requireUser } from '../../middleware/auth';
import { shopPoliciesService } from './shop-policies.service';
import { shopRepository } from './shop.repository';
import { shopHoursService } from './shop.service';

/** The shop's public facts (name, town, time zone), its opening hours and closures, and its policies. */
export function shopRoutes(deps: Deps): Router {
  const shop = shopRepository(deps.db);
  const hours = shopHoursService(deps);
  const policies = shopPoliciesService(deps);
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

  // Policies change who may start a machine, so only admins read them as well as change them.
  router.get('/shop/policies', requirePermission('manage:shop:any'), async (_req, res) => {
    res.json(await policies.get());
  });

  router.put('/shop/policies', requirePermission('manage:shop:any'), async (req, res) => {
    const input = parse(shopPoliciesSchema, req.body, 'body');
    res.json(await policies.replace(currentUser(req), input));
  });

  return router;
}
