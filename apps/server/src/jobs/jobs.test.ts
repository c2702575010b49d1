import { randomBytes } from 'node:crypto';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { Deps } from '../lib/deps';
import { createLogger } from '../lib/logger';
import { createMailer, type Mailer } from '../lib/mailer';
import { quietPublisher } from '../realtime/publisher';
import { createTestContext, type TestContext } from '../test/harness';
import { CRIB_OVERDUE, CRIB_OVERDUE_CRON, RESERVATION_CLOCK, RESERVATION_CLOCK_CRON, SIGN_OFF_REMINDERS, SIGN_OFF_REMINDERS_CRON, SILENT_STATIONS, SILENT_STATIONS_CRON, startJobs, USAGE_TOTALS, USAGE_TOTALS_CRON } from './jobs';

let ctx: TestContext;
let mailer: Mailer;
let deps: Deps;
// A schema of this run's own, so pg-boss's tables never meet another run's.
const schema = `pgboss_test_${randomBytes(4).toString('hex')}`;

beforeAll(() => {
  ctx = createTestContext();
  const logger = createLogger('silent');
  mailer = createMailer(ctx.config.SMTP_URL, ctx.config.MAIL_FROM, logger);
  deps = { config: ctx.config, db: ctx.db, logger, mailer, live: quietPublisher };
});
afterAll(async () => {
  await ctx.db.raw('drop schema if exists ?? cascade', [schema]);
  mailer.close();
  await ctx.close();
});

describe('background jobs on pg-boss', () => {
  it('start on the database, schedule the reminders in the shop’s time zone, run a reminder job and a usage-totals refresh, and stop', async () => {
    const jobs = await startJobs(deps, { schema });
    let stopped = false;
    jobs.boss.on('stopped', () => {
      stopped = true;
    });
    try {
      const schedules = await jobs.boss.getSchedules();
      expect(schedules).toContainEqual(expect.objectContaining({ name: SIGN_OFF_REMINDERS, cron: SIGN_OFF_REMINDERS_CRON, timezone: 'UTC' }));
      expect(schedules).toContainEqual(expect.objectContaining({ name: SILENT_STATIONS, cron: SILENT_STATIONS_CRON }));
      expect(schedules).toContainEqual(expect.objectContaining({ name: RESERVATION_CLOCK, cron: RESERVATION_CLOCK_CRON }));
      expect(schedules).toContainEqual(expect.objectContaining({ name: CRIB_OVERDUE, cron: CRIB_OVERDUE_CRON }));
      expect(schedules).toContainEqual(expect.objectContaining({ name: USAGE_TOTALS, cron: USAGE_TOTALS_CRON }));

      const finished = async (queue: string) => {
        const id = await jobs.boss.send(queue, {});
        expect(id).not.toBeNull();
        const deadline = Date.now() + 15_000;
        let state: string | undefined;
        while (Date.now() < deadline) {
          state = (await jobs.boss.getJobById(queue, id!))?.state;
          if (state === 'completed' || state === 'failed') break;
          await new Promise((resolve) => setTimeout(resolve, 200));
        }
        return state;
      };
      expect(await finished(SIGN_OFF_REMINDERS)).toBe('completed');

      // Usage totals marked stale (as new weekly hours do) are worked out again by the job.
      await ctx.db('usage_totals_state').where({ id: 1 }).update({ stale: true });
      expect(await finished(USAGE_TOTALS)).toBe('completed');
      expect((await ctx.db('usage_totals_state').first('stale').where({ id: 1 }))?.stale).toBe(false);
    } finally {
      await jobs.stop();
    }
    expect(stopped).toBe(true);
  });
});
