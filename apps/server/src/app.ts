import express from 'express';
import helmet from 'helmet';
import { Passport } from 'passport';
import type { Deps } from './lib/deps';
import { apiNotFound, problemHandler } from './lib/problem';
import { csrfProtection } from './middleware/csrf';
import { requestLogging } from './middleware/request-log';
import { createSessionMiddleware } from './middleware/session';
import { stationRequestCheck } from './middleware/station-csrf';
import { authRoutes } from './modules/auth/auth.routes';
import { healthRoutes } from './modules/health/health.routes';
import { incidentsRoutes } from './modules/incidents/incidents.routes';
import { invitationsRoutes } from './modules/invitations/invitations.routes';
import { membersRoutes } from './modules/members/members.routes';
import { outboxRoutes } from './modules/outbox/outbox.routes';
import { calendarFeedProfileRoutes, calendarFeedRoutes } from './modules/calendar-feed/calendar-feed.routes';
import { profileRoutes } from './modules/profile/profile.routes';
import { reservationsRoutes } from './modules/reservations/reservations.routes';
import { shopRoutes } from './modules/shop/shop.routes';
import { stationRoutes } from './modules/station/station.routes';
import { stationsRoutes } from './modules/stations/stations.routes';
import { tagOutsRoutes } from './modules/tag-outs/tag-outs.routes';
import { badgesRoutes } from './modules/badges/badges.routes';
import { boardRoutes } from './modules/board/board.routes';
import { classesRoutes } from './modules/classes/classes.routes';
import { cribRoutes } from './modules/crib/crib.routes';
import { maintenanceRoutes } from './modules/maintenance/maintenance.routes';
import { waiversRoutes } from './modules/waivers/waivers.routes';
import { auditRoutes } from './modules/audit/audit.routes';
import { machinesRoutes } from './modules/machines/machines.routes';
import { signOffsRoutes } from './modules/sign-offs/sign-offs.routes';
import { teachRoutes } from './modules/teach/teach.routes';
import { trainingsRoutes } from './modules/trainings/trainings.routes';
import { denialRecorder } from './modules/reports/denial-recorder';
import { reportsRoutes } from './modules/reports/reports.routes';
import { staticApps } from './static-apps';

export function createApp(deps: Deps) {
  const { config, logger } = deps;
  const app = express();
  app.disable('x-powered-by');
  // API answers are made per request; hashing each body for an ETag would cost every scan for nothing.
  app.set('etag', false);
  app.set('trust proxy', config.trustProxy);

  app.use(requestLogging(logger));
  // Kiosks on the shop's network may reach the server over plain HTTP: upgrading their requests
  // to HTTPS, or pinning HTTPS, would break them unless the shop serves TLS.
  const tls = config.COOKIE_SECURE === 'true';
  app.use(
    helmet({
      contentSecurityPolicy: { directives: { upgradeInsecureRequests: tls ? [] : null } },
      strictTransportSecurity: tls,
    }),
  );

  const sessions = createSessionMiddleware(config, logger);
  const passport = new Passport();

  const api = express.Router();
  api.use(express.json({ limit: '100kb' }));
  api.use('/health', healthRoutes(deps));
  // A station is a device, not a person's sign-in: its routes neither read nor roll a web
  // session (each scan would otherwise cost a session read and write; docs/decisions/008).
  // Refused scans are written in batches beside the answers (docs/decisions/015); close() writes the rest.
  const denials = denialRecorder(deps);
  api.use('/station', stationRequestCheck, stationRoutes(deps, denials));
  // Calendar readers hold no sign-in: the feed's secret is its own key, so no session is read.
  api.use('/calendar', calendarFeedRoutes(deps));
  api.use(sessions.middleware);
  api.use(passport.initialize());
  api.use(passport.session());
  api.use(csrfProtection);
  api.use('/auth', authRoutes(deps, passport));
  api.use('/profile/calendar-feed', calendarFeedProfileRoutes(deps));
  api.use('/profile', profileRoutes(deps));
  api.use('/members', membersRoutes(deps));
  api.use('/invitations', invitationsRoutes(deps));
  api.use('/outbox', outboxRoutes(deps));
  api.use('/stations', stationsRoutes(deps));
  api.use(shopRoutes(deps));
  api.use(badgesRoutes(deps));
  api.use(waiversRoutes(deps));
  api.use('/trainings', trainingsRoutes(deps));
  api.use('/teach', teachRoutes(deps));
  api.use('/audit', auditRoutes(deps));
  api.use('/crib', cribRoutes(deps));
  api.use('/incidents', incidentsRoutes(deps));
  api.use(machinesRoutes(deps));
  api.use(tagOutsRoutes(deps));
  api.use(maintenanceRoutes(deps));
  api.use('/board', boardRoutes(deps));
  api.use('/classes', classesRoutes(deps));
  api.use(signOffsRoutes(deps));
  api.use(reservationsRoutes(deps));
  api.use('/reports', reportsRoutes(deps));
  api.use(apiNotFound);
  api.use(problemHandler);

  app.use('/api', api);
  if (config.SERVE_APPS) app.use(staticApps(config));

  // The live-updates handshake reads a person's sign-in through the same session and Passport.
  const close = async () => {
    await denials.close();
    await sessions.close();
  };
  return { app, close, signIn: { session: sessions.middleware, passport } };
}
