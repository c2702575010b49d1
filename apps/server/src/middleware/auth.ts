import type { RequestHandler } from 'express';
import { can, type Permission } from '@chuckkey/core';
import { forbidden, unauthenticated } from '../lib/errors';

export const requireUser: RequestHandler = (req, _res, next) => {
  next(req.user ? undefined : unauthenticated());
};

/** The server's enforcement of the permissions that packages/core maps from roles. */
export function requirePermission(permission: Permission): RequestHandler {
  return (req, _res, next) => {
    if (!req.user) next(unauthenticated());
    else if (!can(req.user.role, permission)) next(forbidden());
    else next();
  };
}

export function currentUser(req: Express.Request): Express.User {
  if (!req.user) throw unauthenticated();
  return req.user;
}
