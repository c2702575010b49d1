import { Router, type RequestHandler } from 'express';
import { badgeSheetQuerySchema, idParamsSchema, pinSchema } from '@chuckkey/core';
import type { Deps } from '../../lib/deps';
import { singleUpload, uploadedFile } from '../../lib/uploads';
import { parse } from '../../lib/validate';
import { currentUser, requirePermission, requireUser } from '../../middleware/auth';
import { selfOr } from '../../middleware/member-access';
import { badgesService, PHOTO_UPLOAD } from './badges.service';

// A badge code is a credential: no shared or browser cache may keep it, nor the card or photo.
const noStore: RequestHandler = (_req, res, next) => {
  res.setHeader('Cache-Control', 'no-store');
  next();
};

export function badgesRoutes(deps: Deps): Router {
  const service = badgesService(deps);
  const router = Router();
  const memberId = (params: unknown) => parse(idParamsSchema, params, 'params').id;

  router.get('/members/:id/badge', requireUser, selfOr('read:badge:own', 'manage:badge:any'), noStore, async (req, res) => {
    res.json(await service.current(currentUser(req), memberId(req.params)));
  });

  router.post('/members/:id/badge', requireUser, selfOr('read:badge:own', 'manage:badge:any'), noStore, async (req, res) => {
    res.status(201).json(await service.reissue(currentUser(req), memberId(req.params)));
  });

  router.get('/members/:id/badge.svg', requireUser, selfOr('read:badge:own', 'manage:badge:any'), noStore, async (req, res) => {
    res.type('image/svg+xml').send(await service.qrSvg(currentUser(req), memberId(req.params)));
  });

  router.get('/members/:id/badge-card.pdf', requireUser, selfOr('read:badge:own', 'manage:badge:any'), noStore, async (req, res) => {
    const { pdf } = await service.cardPdf(currentUser(req), memberId(req.params));
    res.type('application/pdf').setHeader('Content-Disposition', 'inline; filename="badge-card.pdf"');
    res.send(pdf);
  });

  router.get('/badges/sheet.pdf', requirePermission('manage:badge:any'), noStore, async (req, res) => {
    const query = parse(badgeSheetQuerySchema, req.query, 'query');
    res.type('application/pdf').setHeader('Content-Disposition', 'inline; filename="badge-cards.pdf"');
    res.send(await service.sheetPdf(currentUser(req), query));
  });

  router.put(
    '/members/:id/photo',
    requireUser,
    selfOr('update:photo:own', 'manage:badge:any'),
    singleUpload(PHOTO_UPLOAD),
    async (req, res) => {
      await service.setPhoto(memberId(req.params), uploadedFile(req, PHOTO_UPLOAD));
      res.status(204).end();
    },
  );

  router.get('/members/:id/photo', requireUser, selfOr(null, 'read:photo:any'), noStore, async (req, res) => {
    const photo = await service.photo(memberId(req.params));
    res.type(photo.contentType).setHeader('Last-Modified', photo.updatedAt.toUTCString());
    res.send(photo.image);
  });

  router.put('/profile/pin', requirePermission('update:pin:own'), async (req, res) => {
    const { pin } = parse(pinSchema, req.body, 'body');
    await service.setPin(currentUser(req).id, pin);
    res.status(204).end();
  });

  return router;
}
