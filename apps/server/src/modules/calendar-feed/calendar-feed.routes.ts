import { Router } from 'express';
import { calendarFeedParamsSchema } from '@chuckkey/core';
import type { Deps } from '../../lib/deps';
import { parse } from '../../lib/validate';
import { currentUser, requirePermission, requireUser } from '../../middleware/auth';
import { calendarFeedService } from './calendar-feed.service';

/**
 * The member's own feed address: whether there is one (for the web app after a reload), made,
 * replaced and turned off while signed in.
 */
export function calendarFeedProfileRoutes(deps: Deps): Router {
  const service = calendarFeedService(deps);
  const router = Router();

  router.get('/', requireUser, async (req, res) => {
    res.set('Cache-Control', 'no-store').json(await service.status(currentUser(req).id));
  });

  router.post('/', requirePermission('update:profile:own'), async (req, res) => {
    res.status(201).set('Cache-Control', 'no-store').json(await service.create(currentUser(req).id));
  });

  router.delete('/', requirePermission('update:profile:own'), async (req, res) => {
    await service.revoke(currentUser(req).id);
    res.status(204).end();
  });

  return router;
}

/** The feed itself: calendar readers fetch it without a sign-in, so the secret in the path is the key. */
export function calendarFeedRoutes(deps: Deps): Router {
  const service = calendarFeedService(deps);
  const router = Router();

  router.get('/:token.ics', async (req, res) => {
    const { token } = parse(calendarFeedParamsSchema, req.params, 'params');
    const body = await service.feed(token);
    res.set('Cache-Control', 'private, no-store').type('text/calendar; charset=utf-8').send(body);
  });

  return router;
}
