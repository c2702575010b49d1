import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createMachine, createMember } from '@chuckkey/db/factories';
import type { Deps } from '../../lib/deps';
import { AppError } from '../../lib/errors';
import { createLogger } from '../../lib/logger';
import { createMailer } from '../../lib/mailer';
import { quietPublisher } from '../../realtime/publisher';
import { createTestContext, ownDatabase, type TestContext } from '../../test/harness';
import { reservationsService } from './reservations.service';

/**
 * The shop's hours and time zone are shop-wide, so these tests run on a database of their own, in
 * America/Chicago, with the clock given to the service so the daylight-saving weeks of 2026 stay
 * ahead of "now".
 */
let ctx: TestContext;
let deps: Deps;
beforeAll(async () => {
  ctx = createTestContext({ DATABASE_URL: await ownDatabase('reservations_clock') });
  const logger = createLogger('silent');
  deps = { config: ctx.config, db: ctx.db, logger, mailer: createMailer(ctx.config.SMTP_URL, ctx.config.MAIL_FROM, logger), live: quietPublisher };
  await ctx.db('shop').where({ id: 1 }).update({ time_zone: 'America/Chicago' });
  // ISO 8601 weekdays: 6 is Saturday, 7 Sunday.
  await ctx.db('shop_hours').insert([
    { weekday: 6, opens_at: '09:00', closes_at: '13:00' },
    { weekday: 7, opens_at: '00:00', closes_at: '24:00' },
  ]);
});
afterAll(async () => {
  deps.mailer.close();
  await ctx.close();
});

async function actor(): Promise<Express.User> {
  const member = await createMember(ctx.db);
  return { id: member.id, email: member.email, firstName: member.first_name, lastName: member.last_name, name: `${member.first_name} ${member.last_name}`, role: member.role };
}

async function refusalCode(promise: Promise<unknown>): Promise<string> {
  const error = await promise.then(
    () => null,
    (e: unknown) => e,
  );
  expect(error).toBeInstanceOf(AppError);
  return (error as AppError).code;
}

const at = (iso: string) => new Date(iso);

describe('reservations on the shop clock of America/Chicago', () => {
  it('takes 9:00–11:00 on the Saturday after the spring change as 9:00 CDT, and refuses 8:00', async () => {
    const service = reservationsService(deps);
    const machine = await createMachine(ctx.db, { category: 'mig_welder', reservable: true });
    // Friday 6 March 2026, 12:00 CST.
    const now = at('2026-03-06T18:00:00Z');

    // IANA tz database: Chicago changes to CDT (UTC−5) on 8 March 2026, so Saturday 14 March 9:00 local is 14:00Z.
    const made = await service.create(await actor(), { machineId: machine.id, start: at('2026-03-14T14:00:00Z'), end: at('2026-03-14T16:00:00Z') }, now);
    expect(made.start).toBe('2026-03-14T14:00:00.000Z');

    // 13:00Z that Saturday is 8:00 CDT, before the 09:00 opening.
    const early = service.create(await actor(), { machineId: machine.id, start: at('2026-03-14T13:00:00Z'), end: at('2026-03-14T14:00:00Z') }, now);
    expect(await refusalCode(early)).toBe('outside_hours');
  });

  it('counts the quota in the local week of the autumn change: Sunday 1 November belongs to the week from Monday 26 October', async () => {
    const service = reservationsService(deps);
    const machine = await createMachine(ctx.db, { category: 'mig_welder', reservable: true });
    await ctx.db('machines').where({ id: machine.id }).update({ weekly_quota_minutes: 120 });
    const member = await actor();
    const now = at('2026-10-25T17:00:00Z');

    // IANA tz database: Saturday 31 October 2026 9:00 CDT is 14:00Z.
    await service.create(member, { machineId: machine.id, start: at('2026-10-31T14:00:00Z'), end: at('2026-10-31T15:30:00Z') }, now);
    // Sunday 1 November 23:00–24:00 CST (UTC−6) is 05:00Z–06:00Z on 2 November, still the same local week.
    const sundayLate = service.create(member, { machineId: machine.id, start: at('2026-11-02T05:00:00Z'), end: at('2026-11-02T06:00:00Z') }, now);
    expect(await refusalCode(sundayLate)).toBe('quota_exceeded');
    // Thirty minutes fit what is left.
    const fits = await service.create(member, { machineId: machine.id, start: at('2026-11-02T05:00:00Z'), end: at('2026-11-02T05:30:00Z') }, now);
    expect(fits.status).toBe('active');
  });
});
