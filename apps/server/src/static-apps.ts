import { existsSync } from 'node:fs';
import path from 'node:path';
import express, { Router } from 'express';
import type { Config } from './config';

/** Serves the built web app at / and the kiosk app at /kiosk/, each with its SPA fallback. */
export function staticApps(config: Config): Router {
  const router = Router();
  const apps = [
    { mount: '/kiosk', dist: config.KIOSK_DIST, name: 'kiosk' },
    { mount: '/', dist: config.ADMIN_DIST, name: 'admin' },
  ];
  for (const app of apps) {
    const index = path.join(app.dist, 'index.html');
    // Hashed asset names never change content, so browsers may keep them for a year.
    router.use(
      app.mount,
      express.static(app.dist, {
        index: false,
        setHeaders: (res, file) => {
          res.setHeader('Cache-Control', file.includes(`${path.sep}assets${path.sep}`) ? 'public, max-age=31536000, immutable' : 'no-cache');
        },
      }),
    );
    const fallback = app.mount === '/' ? '/{*splat}' : [app.mount, `${app.mount}/{*splat}`];
    router.get(fallback, (_req, res) => {
      if (!existsSync(index)) {
        res.status(503).type('text/plain').send(`The ${app.name} app is not built yet. Run: pnpm build`);
        return;
      }
      res.setHeader('Cache-Control', 'no-cache');
      res.sendFile(index);
    });
  }
  return router;
}
