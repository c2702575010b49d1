import { Router } from 'express';
import { idParamsSchema, incidentListQuerySchema, incidentNoteInputSchema, incidentPhotoParamsSchema, incidentReportSchema, incidentReviewSchema } from '@chuckkey/core';
import type { Deps } from '../../lib/deps';
import { parse } from '../../lib/validate';
import { currentUser, requirePermission } from '../../middleware/auth';
import { checkedPhotos, incidentPhotosUpload } from './incident-uploads';
import { incidentsService } from './incidents.service';

/** Incident reports. Reading one is the reporter's or an admin's; the service decides which. */
export function incidentsRoutes(deps: Deps): Router {
  const service = incidentsService(deps);
  const router = Router();

  router.post('/', requirePermission('create:incident:own'), incidentPhotosUpload(), async (req, res) => {
    const report = parse(incidentReportSchema, req.body, 'body');
    const photos = await checkedPhotos(req);
    res.status(201).json(await service.report(currentUser(req), report, photos));
  });

  router.get('/', requirePermission('read:incident:any'), async (req, res) => {
    const filters = parse(incidentListQuerySchema, req.query, 'query');
    res.json({ items: await service.list(filters) });
  });

  router.get('/:id', requirePermission('read:incident:own'), async (req, res) => {
    const { id } = parse(idParamsSchema, req.params, 'params');
    res.setHeader('Cache-Control', 'no-store');
    res.json(await service.get(currentUser(req), id));
  });

  router.get('/:id/photos/:n', requirePermission('read:incident:own'), async (req, res) => {
    const { id, n } = parse(incidentPhotoParamsSchema, req.params, 'params');
    const photo = await service.photo(currentUser(req), id, n);
    // A report's photos never change once stored, yet they are private to who may read the report.
    res.type(photo.contentType).setHeader('Cache-Control', 'private, max-age=3600');
    res.send(photo.image);
  });

  router.patch('/:id', requirePermission('review:incident:any'), async (req, res) => {
    const { id } = parse(idParamsSchema, req.params, 'params');
    const { status } = parse(incidentReviewSchema, req.body, 'body');
    res.json(await service.setStatus(currentUser(req), id, status));
  });

  router.post('/:id/notes', requirePermission('review:incident:any'), async (req, res) => {
    const { id } = parse(idParamsSchema, req.params, 'params');
    const { note } = parse(incidentNoteInputSchema, req.body, 'body');
    res.status(201).json(await service.addNote(currentUser(req), id, note));
  });

  return router;
}
