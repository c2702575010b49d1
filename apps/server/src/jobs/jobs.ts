import PgBoss from 'pg-boss';
import type { Deps } from '../lib/deps';
import { cribOverdueService } from '../modules/crib/crib-overdue.service';
import { machineSessionsService } from '../modules/machine-sessions/machine-sessions.service';
import { reportsRepository } from '../modules/reports/reports.repository';
import { reservationJobsService } from '../modules/reservations/reservation-jobs.service';
import { shopRepository } from '../modules/shop/shop.repository';
import { signOffRemindersService } from '../modules/sign-offs/reminders.service';

export const SIGN_OFF_REMINDERS = 'sign-off-reminders';

/**
 * Every hour from 08:00 to 20:00 in the shop's time zone: mail arrives in the day, and a run
 * missed while the server was down is made up an hour later. Reminders are claimed one by one
 * in the database, so repeated runs never send twice.
 */
export const SIGN_OFF_REMINDERS_CRON = '0 8-20 * * *';

export const SILENT_STATIONS = 'silent-stations';

/**
 * Every minute: a station silent for three minutes gets its running session closed at its last
 * heartbeat, and its machine is announced offline. Closing is one statement on sessions still
 * running and each silence is marked once, so a repeated run changes and announces nothing.
 */
export const SILENT_STATIONS_CRON = '* * * * *';

export const RESERVATION_CLOCK = 'reservation-clock';

/**
 * Every minute: reservations not checked into by the end of their grace become no-shows, machines
 * whose check-in window opened or whose reservation ended are announced to the board, and
 * reminders due within two hours go out. Both claim their rows in the database, so a repeated or
 * concurrent run changes and sends nothing twice.
 */
export const RESERVATION_CLOCK_CRON = '* * * * *';

export const CRIB_OVERDUE = 'crib-overdue';

/**
 * Every 15 minutes: a tool's first reminder goes out within a quarter of an hour of it becoming
 * overdue (often the shop's closing time, while the member may still be near), and the daily
 * ones drift by no more than that. Running more often would only re-read the same few open
 * checkouts. Each reminder is claimed in the database, so repeated or concurrent runs never send twice.
 */
export const CRIB_OVERDUE_CRON = '*/15 * * * *';

export const USAGE_TOTALS = 'usage-totals';

/**
 * Every minute: usage totals marked stale by new weekly hours or a new time zone are worked out
 * again (docs/decisions/016), so the wait falls on this job rather than on the next person to
 * open the usage review. Not stale, the run is one read of one row; the rebuild itself takes the
 * totals' lock, so concurrent runs rebuild once.
 */
export const USAGE_TOTALS_CRON = '* * * * *';

export interface Jobs {
  boss: PgBoss;
  stop(): Promise<void>;
}

/**
 * Background jobs on pg-boss, in the same PostgreSQL (its own schema). Every server process
 * may start them: pg-boss puts one job in the queue per scheduled minute, whichever process
 * is first, and any one worker takes it.
 */
export async function startJobs(deps: Deps, options: { schema?: string } = {}): Promise<Jobs> {
  const { config, db, logger } = deps;
  const boss = new PgBoss({ connectionString: config.DATABASE_URL, schema: options.schema ?? 'pgboss', max: 3, application_name: 'chuckkey-jobs' });
  boss.on('error', (error) => logger.error({ err: error }, 'background jobs error'));
  await boss.start();

  const reminders = signOffRemindersService(deps);
  const { timeZone } = await shopRepository(db).get();
  await boss.createQueue(SIGN_OFF_REMINDERS);
  await boss.schedule(SIGN_OFF_REMINDERS, SIGN_OFF_REMINDERS_CRON, {}, { tz: timeZone });
  await boss.work(SIGN_OFF_REMINDERS, async () => {
    await reminders.sendDue(new Date());
  });
  const sessions = machineSessionsService(deps);
  await boss.createQueue(SILENT_STATIONS);
  await boss.schedule(SILENT_STATIONS, SILENT_STATIONS_CRON, {});
  await boss.work(SILENT_STATIONS, async () => {
    const closed = await sessions.closeSilentSessions(new Date());
    if (closed.length > 0) logger.info({ sessions: closed.map((s) => s.id) }, 'sessions of silent stations closed');
  });
  const reservationClock = reservationJobsService(deps);
  await boss.createQueue(RESERVATION_CLOCK);
  await boss.schedule(RESERVATION_CLOCK, RESERVATION_CLOCK_CRON, {});
  await boss.work(RESERVATION_CLOCK, async () => {
    const now = new Date();
    await reservationClock.releaseNoShows(now);
    await reservationClock.announceTurns(now);
    await reservationClock.sendReminders(now);
  });
  const cribOverdue = cribOverdueService(deps);
  await boss.createQueue(CRIB_OVERDUE);
  await boss.schedule(CRIB_OVERDUE, CRIB_OVERDUE_CRON, {});
  await boss.work(CRIB_OVERDUE, async () => {
    await cribOverdue.sendOverdueNotices(new Date());
  });
  const reports = reportsRepository(db);
  await boss.createQueue(USAGE_TOTALS);
  await boss.schedule(USAGE_TOTALS, USAGE_TOTALS_CRON, {});
  await boss.work(USAGE_TOTALS, async () => {
    await reports.refreshTotals();
  });
  logger.info({ queue: SILENT_STATIONS, cron: SILENT_STATIONS_CRON }, 'background jobs started');
  logger.info({ queue: USAGE_TOTALS, cron: USAGE_TOTALS_CRON }, 'background jobs started');
  logger.info({ queue: RESERVATION_CLOCK, cron: RESERVATION_CLOCK_CRON }, 'background jobs started');
  logger.info({ queue: CRIB_OVERDUE, cron: CRIB_OVERDUE_CRON }, 'background jobs started');
  logger.info({ queue: SIGN_OFF_REMINDERS, cron: SIGN_OFF_REMINDERS_CRON, timeZone }, 'background jobs started');

  return {
    boss,
    async stop() {
      // Lets a job run in progress finish, then closes pg-boss's own connections.
      await boss.stop({ graceful: true, wait: true, timeout: 20_000 });
    },
  };
}
