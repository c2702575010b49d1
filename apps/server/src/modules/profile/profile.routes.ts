import { Router } from 'express';
import { passwordChangeSchema, profileUpdateSchema } from '@chuckkey/core';
import type { Deps } from '../../lib/deps';
import { parse } from '../../lib/validate';
import { currentUser, requirePermission } from '../../middleware/auth';
import { profileService } from './profile.service';

export function profileRoutes(deps: Deps): Router {
  const service = profileService(deps);
  const router = Router();

  router.get('/', requirePermission('read:profile:own'), async (req, res) => {
    res.json(await service.get(currentUser(req).id));
  });

  router.put('/', requirePermission('update:profile:own'), async (req, res) => {
    const changes = parse(profileUpdateSchema, req.body, 'body');
    res.json(await service.update(currentUser(req).id, changes));
  });

  router.post('/password', requirePermission('update:profile:own'), async (req, res) => {
    const input = parse(passwordChangeSchema, req.body, 'body');
    await service.changePassword(currentUser(req).id, req.sessionID, input);
    res.status(204).end();
  });

  return router;
}
