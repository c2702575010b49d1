import { isIP } from 'node:net';
import { Router, type Request } from 'express';
import type { Passport } from 'passport';
import { Strategy as LocalStrategy } from 'passport-local';
import { loginSchema, passwordResetConfirmSchema, passwordResetRequestSchema } from '@chuckkey/core';
import { AppError } from '../../lib/errors';
import type { Deps } from '../../lib/deps';
import { perAddressLimit } from '../../lib/rate-limit';
import { parse } from '../../lib/validate';
import { SESSION_COOKIE } from '../../middleware/session';
import { csrfToken } from '../../middleware/csrf';
import { requireUser } from '../../middleware/auth';
import { authService } from './auth.service';

const invalidCredentials = () => new AppError(401, 'invalid_credentials', 'That e-mail and password do not match an active account.');

/** The client's address; a forwarded value that is not an address falls back to the peer's. */
function clientIp(req: Request): string {
  const candidates = [req.ip, req.socket.remoteAddress];
  return candidates.find((ip): ip is string => Boolean(ip && isIP(ip))) ?? '0.0.0.0';
}

export function authRoutes(deps: Deps, passport: InstanceType<typeof Passport>): Router {
  const service = authService(deps);

  // Sign-in goes through passport-local; the body was already parsed with the zod schema.
  passport.use(
    new LocalStrategy({ usernameField: 'email', passReqToCallback: true, session: true }, (req, email, password, done) => {
      service.verifyCredentials({ email, password }, clientIp(req)).then((user) => done(null, user ?? false), done);
    }),
  );
  passport.serializeUser((user, done) => done(null, user.id));
  passport.deserializeUser((id: string, done) => {
    service.findActiveUser(id).then((user) => done(null, user ?? false), done);
  });

  const router = Router();

  // Per process, in memory: mail-sending routes are cheap to abuse.
  const mailLimit = perAddressLimit(20);

  router.get('/csrf', (req, res) => {
    res.json({ token: csrfToken(req.session) });
  });

  router.post('/login', async (req, res, next) => {
    req.body = parse(loginSchema, req.body, 'body');
    await service.assertNotThrottled(req.body.email, clientIp(req));
    passport.authenticate('local', (err: unknown, user: Express.User | false) => {
      if (err) return next(err);
      if (!user) return next(invalidCredentials());
      // passport regenerates the session id at sign-in; keepSessionInfo keeps the CSRF token.
      req.login(user, { session: true, keepSessionInfo: true }, (loginErr) => {
        if (loginErr) return next(loginErr);
        res.json({ id: user.id, email: user.email, name: user.name, role: user.role });
      });
    })(req, res, next);
  });

  router.post('/logout', (req, res, next) => {
    req.logout((logoutErr) => {
      if (logoutErr) return next(logoutErr);
      req.session.destroy((destroyErr) => {
        if (destroyErr) return next(destroyErr);
        res.clearCookie(SESSION_COOKIE, { path: '/', httpOnly: true, sameSite: 'lax' });
        res.status(204).end();
      });
    });
  });

  router.get('/me', requireUser, (req, res) => {
    const user = req.user!;
    res.json({ id: user.id, email: user.email, name: user.name, role: user.role });
  });

  router.post('/password-reset', mailLimit, async (req, res) => {
    const { email } = parse(passwordResetRequestSchema, req.body, 'body');
    await service.requestPasswordReset(email);
    res.status(202).json({});
  });

  router.post('/password-reset/confirm', mailLimit, async (req, res) => {
    const { token, password } = parse(passwordResetConfirmSchema, req.body, 'body');
    await service.resetPassword(token, password);
    res.status(204).end();
  });

  return router;
}
