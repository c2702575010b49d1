import { Router } from 'express';
import { classCreateSchema, classListQuerySchema, classMembersInputSchema, classOccurrenceParamsSchema, idParamsSchema } from '@chuckkey/core';
import type { Deps } from '../../lib/deps';
import { parse } from '../../lib/validate';
import { currentUser, requirePermission, requireUser } from '../../middleware/auth';
import { classesService } from './classes.service';

/** Classes: instructors and admins hold machines for them; every signed-in person may see them. */
export function classesRoutes(deps: Deps): Router {
  const service = classesService(deps);
  const router = Router();

  router.post('/', requirePermission('manage:class:any'), async (req, res) => {
    const input = parse(classCreateSchema, req.body, 'body');
    res.status(201).json(await service.create(currentUser(req), input));
  });

  router.get('/', requireUser, async (req, res) => {
    const query = parse(classListQuerySchema, req.query, 'query');
    res.set('Cache-Control', 'no-store').json(await service.list(currentUser(req), query));
  });

  router.get('/:id', requireUser, async (req, res) => {
    const { id } = parse(idParamsSchema, req.params, 'params');
    res.set('Cache-Control', 'no-store').json(await service.get(currentUser(req), id));
  });

  router.put('/:id/members', requirePermission('manage:class:any'), async (req, res) => {
    const { id } = parse(idParamsSchema, req.params, 'params');
    const input = parse(classMembersInputSchema, req.body, 'body');
    res.json(await service.setMembers(currentUser(req), id, input));
  });

  router.delete('/:id', requirePermission('manage:class:any'), async (req, res) => {
    const { id } = parse(idParamsSchema, req.params, 'params');
    await service.cancel(currentUser(req), id);
    res.status(204).end();
  });

  router.delete('/:id/occurrences/:reservationId', requirePermission('manage:class:any'), async (req, res) => {
    const { id, reservationId } = parse(classOccurrenceParamsSchema, req.params, 'params');
    await service.cancelOccurrence(currentUser(req), id, reservationId);
    res.status(204).end();
  });

  return router;
}
