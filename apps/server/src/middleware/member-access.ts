import type { RequestHandler } from 'express';
import { can, idParamsSchema, type Permission } from '@chuckkey/core';
import { forbidden } from '../lib/errors';
import { parse } from '../lib/validate';
import { currentUser } from './auth';

/**
 * For routes under /members/:id: lets a person through for their own id (holding `own`, or
 * always when `own` is null) or for anyone's with `any`. The id is checked first, so a
 * malformed one is a 400 for everyone, before any upload is read.
 */
export function selfOr(own: Permission | null, any: Permission): RequestHandler {
  return (req, _res, next) => {
    const user = currentUser(req);
    const { id } = parse(idParamsSchema, req.params, 'params');
    const allowed = (id === user.id && (own === null || can(user.role, own))) || can(user.role, any);
    next(allowed ? undefined : forbidden());
  };
}

/** Checks the :id parameter before the handler, and before any upload is read. */
export const memberIdParam: RequestHandler = (req, _res, next) => {
  parse(idParamsSchema, req.params, 'params');
  next();
};
