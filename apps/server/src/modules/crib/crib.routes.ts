import { Router } from 'express';
import {
  cribCheckoutInputSchema,
  cribCheckoutsQuerySchema,
  cribImportInputSchema,
  cribItemInputSchema,
  cribRestoreInputSchema,
  cribReturnInputSchema,
  idParamsSchema,
} from '@chuckkey/core';
import type { Deps } from '../../lib/deps';
import { singleUpload, uploadedFile } from '../../lib/uploads';
import { parse } from '../../lib/validate';
import { currentUser, requirePermission } from '../../middleware/auth';
import { PHOTO_UPLOAD } from '../badges/badges.service';
import { cribOverdueService } from './crib-overdue.service';
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

  router.put('/items/:id/photo', requirePermission('manage:crib:any'), singleUpload(PHOTO_UPLOAD), async (req, res) => {
    const { id } = parse(idParamsSchema, req.params, 'params');
    res.json(await service.setPhoto(id, uploadedFile(req, PHOTO_UPLOAD)));
  });

  router.delete('/items/:id/photo', requirePermission('manage:crib:any'), async (req, res) => {
    const { id } = parse(idParamsSchema, req.params, 'params');
    await service.deletePhoto(id);
    res.status(204).end();
  });

  // Any signed-in person may see what a tool looks like; the browser checks back before reusing it.
  router.get('/items/:id/photo', requirePermission('read:crib:any'), async (req, res) => {
    const { id } = parse(idParamsSchema, req.params, 'params');
    const photo = await service.photo(id);
    res.type(photo.contentType).setHeader('Cache-Control', 'private, no-cache');
    res.setHeader('Last-Modified', photo.updatedAt.toUTCString());
    res.send(photo.image);
  });

  router.post('/items/:id/restore', requirePermission('manage:crib:any'), async (req, res) => {
    const { id } = parse(idParamsSchema, req.params, 'params');
    const input = parse(cribRestoreInputSchema, req.body ?? {}, 'body');
    res.json(await service.restoreItem(currentUser(req), id, input));
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

  router.get('/overdue', requirePermission('manage:crib:any'), async (_req, res) => {
    res.json(await cribOverdueService(deps).overdue(new Date()));
  });

  router.get('/attention', requirePermission('manage:crib:any'), async (_req, res) => {
    res.json(await service.attention());
  });

  router.get('/mine', requirePermission('read:crib-checkout:own'), async (req, res) => {
    res.json(await service.mine(currentUser(req)));
  });

  return router;
}
