import { Router } from 'express';
import {
  availabilityQuerySchema,
  idParamsSchema,
  reservationCreateSchema,
  reservationListQuerySchema,
  reservationRulesInputSchema,
} from '@chuckkey/core';
import type { Deps } from '../../lib/deps';
import { parse } from '../../lib/validate';
import { currentUser, requirePermission, requireUser } from '../../middleware/auth';
import { reservationsService } from './reservations.service';

/** Reserving machine time. Who may cancel a reservation depends on whose it is, so the service decides that. */
export function reservationsRoutes(deps: Deps): Router {
  const service = reservationsService(deps);
  const router = Router();

  router.post('/reservations', requirePermission('create:reservation:own'), async (req, res) => {
    const input = parse(reservationCreateSchema, req.body, 'body');
    res.status(201).json(await service.create(currentUser(req), input));
  });

  router.get('/reservations', requirePermission('manage:machine:any'), async (req, res) => {
    const query = parse(reservationListQuerySchema, req.query, 'query');
    res.set('Cache-Control', 'no-store').json(await service.list(query));
  });

  router.get('/reservations/export.csv', requirePermission('manage:machine:any'), async (req, res) => {
    const query = parse(reservationListQuerySchema, req.query, 'query');
    res.set('Cache-Control', 'no-store').type('text/csv; charset=utf-8').attachment('reservations.csv').send(await service.exportCsv(query));
  });

  router.get('/reservations/mine', requireUser, async (req, res) => {
    res.set('Cache-Control', 'no-store').json(await service.mine(currentUser(req)));
  });

  router.delete('/reservations/:id', requireUser, async (req, res) => {
    const { id } = parse(idParamsSchema, req.params, 'params');
    await service.cancel(currentUser(req), id);
    res.status(204).end();
  });

  router.post('/reservations/:id/release', requireUser, async (req, res) => {
    const { id } = parse(idParamsSchema, req.params, 'params');
    res.json(await service.release(currentUser(req), id));
  });

  router.get('/machines/:id/availability', requirePermission('read:machine:any'), async (req, res) => {
    const { id } = parse(idParamsSchema, req.params, 'params');
    const query = parse(availabilityQuerySchema, req.query, 'query');
    res.set('Cache-Control', 'no-store').json(await service.availability(id, query));
  });

  router.get('/machines/:id/reservation-rules', requirePermission('manage:machine:any'), async (req, res) => {
    const { id } = parse(idParamsSchema, req.params, 'params');
    res.set('Cache-Control', 'no-store').json(await service.rules(id));
  });

  router.put('/machines/:id/reservation-rules', requirePermission('manage:machine:any'), async (req, res) => {
    const { id } = parse(idParamsSchema, req.params, 'params');
    const input = parse(reservationRulesInputSchema, req.body, 'body');
    res.json(await service.setRules(currentUser(req), id, input));
  });

  return router;
}
