import { Router } from 'express';
import { cribCheckoutInputSchema, cribCheckoutsQuerySchema, cribImportInputSchema, cribItemInputSchema, cribReturnInputSchema, idParamsSchema } from '@chuckkey/core';
import type { Deps } from '../../lib/deps';
import { parse } from '../../lib/validate';
import { currentUser, requirePermission } from '../../middleware/auth';
import { cribService } from './crib.service';

/** The tool crib from the web app: admins keep the inventory and record checkouts and returns. */
export function cribRoutes(deps: Deps): Router {
  const service = cribService(deps);
  const router = Router();

  // Members see what the crib holds and whether it can be had; admins see every column.
  router.get('/items', requirePermission('read:crib:any'), async (req, res) => {
    res.json(await service.items(currentUser(req)));
  });

  router.get('/items/export.csv', requirePermission('manage:crib:any'), async (_req, res) => {
    res.set('Cache-Control', 'no-store').type('text/csv; charset=utf-8').attachment('crib-items.csv').send(await service.exportCsv());
  });

  router.post('/items/import', requirePermission('manage:crib:any'), async (req, res) => {
    const { csv } = parse(cribImportInputSchema, req.body, 'body');
    res.json(await service.importCsv(currentUser(req), csv));
  });

  router.post('/items', requirePermission('manage:crib:any'), async (req, res) => {
    const input = parse(cribItemInputSchema, req.body, 'body');
    res.status(201).json(await service.createItem(currentUser(req), input));
  });

  router.put('/items/:id', requirePermission('manage:crib:any'), async (req, res) => {
    const { id } = parse(idParamsSchema, req.params, 'params');
    const input = parse(cribItemInputSchema, req.body, 'body');
    res.json(await service.updateItem(currentUser(req), id, input));
  });

  router.get('/checkouts', requirePermission('manage:crib:any'), async (req, res) => {
    const { open } = parse(cribCheckoutsQuerySchema, req.query, 'query');
    res.json(await service.checkouts(open));
  });

  router.post('/checkouts', requirePermission('manage:crib:any'), async (req, res) => {
    const input = parse(cribCheckoutInputSchema, req.body, 'body');
    res.status(201).json(await service.checkOut(currentUser(req), input));
  });

  router.post('/checkouts/:id/return', requirePermission('manage:crib:any'), async (req, res) => {
    const { id } = parse(idParamsSchema, req.params, 'params');
    const input = parse(cribReturnInputSchema, req.body, 'body');
    res.json(await service.returnItem(currentUser(req), id, input));
  });

  router.get('/attention', requirePermission('manage:crib:any'), async (_req, res) => {
    res.json(await service.attention());
  });

  router.get('/mine', requirePermission('read:crib-checkout:own'), async (req, res) => {
    res.json(await service.mine(currentUser(req)));
  });

  return router;
}
