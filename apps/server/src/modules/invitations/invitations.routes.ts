import { Router } from 'express';
import { invitationAcceptSchema, invitationCreateSchema, tokenParamsSchema } from '@chuckkey/core';
import type { Deps } from '../../lib/deps';
import { perAddressLimit } from '../../lib/rate-limit';
import { parse } from '../../lib/validate';
import { currentUser, requirePermission } from '../../middleware/auth';
import { invitationsService } from './invitations.service';

export function invitationsRoutes(deps: Deps): Router {
  const service = invitationsService(deps);
  const router = Router();

  // Invitation links are unguessable (256 bits), but guessing is still made slow.
  const tokenLimit = perAddressLimit(60);

  router.get('/', requirePermission('read:invitation:any'), async (_req, res) => {
    res.json({ items: await service.listOpen() });
  });

  router.post('/', requirePermission('create:invitation:any'), async (req, res) => {
    const input = parse(invitationCreateSchema, req.body, 'body');
    res.status(201).json(await service.invite(currentUser(req), input));
  });

  router.post('/accept', tokenLimit, async (req, res, next) => {
    const input = parse(invitationAcceptSchema, req.body, 'body');
    const user = await service.accept(input);
    req.login(user, { session: true, keepSessionInfo: true }, (err) => {
      if (err) return next(err);
      res.json({ id: user.id, email: user.email, name: user.name, role: user.role });
    });
  });

  router.get('/:token', tokenLimit, async (req, res) => {
    const { token } = parse(tokenParamsSchema, req.params, 'params');
    res.json(await service.preview(token));
  });

  return router;
}
