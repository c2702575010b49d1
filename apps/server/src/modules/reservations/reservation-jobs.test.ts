import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createMachine, createMember } from '@chuckkey/db/factories';
import type { Deps } from '../../lib/deps';
import { createLogger } from '../../lib/logger';
import { createMailer, type Mailer } from '../../lib/mailer';
import { caughtMail, countMail, createTestContext, ownDatabase, recordingPublisher, signedIn, type TestContext } from '../../test/harness';
import { reservationJobsService } from './reservation-jobs.service';

let ctx: TestContext;
/** The shared test database, where the mail catcher keeps what it caught. */
let outbox: TestContext;
let mailer: Mailer;
const changed: string[] = [];
let deps: Deps;

beforeAll(async () => {
  // The jobs change every due reservation in their database; tests beside these keep theirs elsewhere.
  ctx = createTestContext({ DATABASE_URL: await ownDatabase('reservation_jobs') });
  outbox = createTestContext();
  const logger = createLogger('silent');
  mailer = createMailer(ctx.config.SMTP_URL, ctx.config.MAIL_FROM, logger);
  deps = { config: ctx.config, db: ctx.db, logger, mailer, live: recordingPublisher(changed) };
});
afterAll(async () => {
  mailer.close();
  await ctx.close();
  await outbox.close();
});

const MINUTE = 60_000;
const HOUR = 60 * MINUTE;

async function reservation(machineId: string, memberId: string, start: Date, minutes: number, fields: Record<string, unknown> = {}) {
  const end = new Date(start.getTime() + minutes * MINUTE);
  const [row] = await ctx.db('reservations')
    .insert({ machine_id: machineId, member_id: memberId, starts_at: start, ends_at: end, blocked_until: end, ...fields })
    .returning(['id']);
  return row.id as string;
}

const statusOf = async (id: string) => (await ctx.db('reservations').first('status').where({ id }))?.status;

describe('no-show release', () => {
  it('releases a reservation not checked into by its start plus the grace, announces the machine and mails a no-show notice, once', async () => {
    const machine = await createMachine(ctx.db, { reservable: true });
    await ctx.db('machines').where({ id: machine.id }).update({ no_show_grace_minutes: 15 });
    const member = await createMember(ctx.db);
    const start = new Date('2031-03-08T09:00:00Z');
    const id = await reservation(machine.id, member.id, start, 60);
    const service = reservationJobsService(deps);

    expect(await service.releaseNoShows(new Date(start.getTime() + 14 * MINUTE + 59_000))).not.toContain(id);
    expect(await statusOf(id)).toBe('active');

    changed.length = 0;
    expect(await service.releaseNoShows(new Date(start.getTime() + 15 * MINUTE))).toContain(id);
    expect(await statusOf(id)).toBe('no_show');
    expect(changed).toContain(machine.id);
    const notice = await caughtMail(outbox.db, member.email);
    expect(notice.subject).toMatch(/^Released/);
    expect(notice.text).toContain('no-show');
    const audit = await ctx.db('audit_log').where({ action: 'reservation.no_show', entity_id: id }).count({ n: '*' });
    expect(audit).toEqual([{ n: 1 }]);

    expect(await service.releaseNoShows(new Date(start.getTime() + HOUR))).not.toContain(id);
    expect(await countMail(outbox.db, member.email)).toBe(1);
  });

  it('leaves a checked-in reservation and a class hold alone', async () => {
    const machine = await createMachine(ctx.db, { reservable: true });
    const member = await createMember(ctx.db);
    const start = new Date('2031-03-09T09:00:00Z');
    const checkedIn = await reservation(machine.id, member.id, start, 60, { status: 'checked_in', checked_in_at: start });
    const held = await reservation(machine.id, member.id, new Date(start.getTime() + 2 * HOUR), 60, { kind: 'class' });

    await reservationJobsService(deps).releaseNoShows(new Date(start.getTime() + 4 * HOUR));

    expect([await statusOf(checkedIn), await statusOf(held)]).toEqual(['checked_in', 'active']);
  });

  it('after the third no-show within 30 days the next reservation is refused 409 suspended', async () => {
    const machine = await createMachine(ctx.db, { reservable: true });
    await ctx.db('machines').where({ id: machine.id }).update({ no_show_limit: 3, no_show_window_days: 30, suspension_days: 7, horizon_days: 14 });
    const member = await signedIn(ctx, 'member');
    const now = Date.now();
    const missed = [];
    for (const daysAgo of [20, 10, 1]) missed.push(await reservation(machine.id, member.member.id, new Date(now - daysAgo * 24 * HOUR), 60));
    const service = reservationJobsService(deps);

    const tomorrow = new Date(now + 24 * HOUR);
    tomorrow.setUTCHours(10, 0, 0, 0);
    const ask = () =>
      member.post('/api/reservations', { machineId: machine.id, start: tomorrow.toISOString(), end: new Date(tomorrow.getTime() + HOUR).toISOString() });
    // The clock of the job is the test's: each release runs just after that reservation's grace.
    const release = async (id: string) => {
      const row = await ctx.db('reservations').first('starts_at').where({ id });
      await service.releaseNoShows(new Date((row.starts_at as Date).getTime() + 15 * MINUTE));
    };

    await release(missed[0]!);
    await release(missed[1]!);
    expect((await ask()).body.code).not.toBe('suspended');

    await release(missed[2]!);
    expect(await Promise.all(missed.map(statusOf))).toEqual(['no_show', 'no_show', 'no_show']);
    const res = await ask();
    // RFC 9457 problem details with the rule that refused it as `code`.
    expect([res.status, res.body.code]).toEqual([409, 'suspended']);
  });
});

describe('board announcements by the clock', () => {
  it('announces a machine when a reservation’s check-in window opens and when it ends, each in the minute it happens', async () => {
    const machine = await createMachine(ctx.db, { reservable: true });
    await ctx.db('machines').where({ id: machine.id }).update({ check_in_minutes: 10 });
    const member = await createMember(ctx.db);
    const start = new Date('2031-06-14T09:00:00Z');
    await reservation(machine.id, member.id, start, 60);
    const service = reservationJobsService(deps);
    const at = (minutesFromStart: number) => new Date(start.getTime() + minutesFromStart * MINUTE);

    expect(await service.announceTurns(at(-11))).not.toContain(machine.id);
    changed.length = 0;
    expect(await service.announceTurns(at(-10))).toContain(machine.id);
    expect(changed).toContain(machine.id);
    expect(await service.announceTurns(at(-9))).not.toContain(machine.id);
    expect(await service.announceTurns(at(60))).toContain(machine.id);
    expect(await service.announceTurns(at(61))).not.toContain(machine.id);
  });
});

describe('reminders', () => {
  it('mails the member two hours before the start, once, and not a reservation booked within those two hours', async () => {
    const machine = await createMachine(ctx.db, { reservable: true });
    const member = await createMember(ctx.db);
    const start = new Date('2031-04-12T13:00:00Z');
    const id = await reservation(machine.id, member.id, start, 60, { created_at: new Date('2031-04-01T08:00:00Z') });
    const late = await createMember(ctx.db);
    const lateId = await reservation(machine.id, late.id, new Date(start.getTime() + 2 * HOUR), 60, { created_at: new Date(start.getTime() + HOUR) });
    const service = reservationJobsService(deps);

    expect(await service.sendReminders(new Date(start.getTime() - 2 * HOUR - MINUTE))).not.toContain(id);
    expect(await service.sendReminders(new Date(start.getTime() - 2 * HOUR))).toContain(id);
    const mail = await caughtMail(outbox.db, member.email);
    expect(mail.subject).toMatch(/^Coming up/);
    expect(mail.text).toContain(machine.name);

    expect(await service.sendReminders(new Date(start.getTime() - HOUR))).not.toContain(id);
    expect(await service.sendReminders(new Date(start.getTime() + HOUR + MINUTE))).not.toContain(lateId);
    expect(await countMail(outbox.db, member.email)).toBe(1);
    expect(await countMail(outbox.db, late.email)).toBe(0);
  });

  it('claims no reminder when the mail cannot be handed off, so the next run tries again', async () => {
    const machine = await createMachine(ctx.db, { reservable: true });
    const member = await createMember(ctx.db);
    const start = new Date('2031-05-10T13:00:00Z');
    const id = await reservation(machine.id, member.id, start, 60, { created_at: new Date('2031-05-01T08:00:00Z') });
    const broken: Mailer = {
      async send() {
        throw new Error('SMTP refused');
      },
      close() {},
    };

    expect(await reservationJobsService({ ...deps, mailer: broken }).sendReminders(new Date(start.getTime() - HOUR))).not.toContain(id);
    expect((await ctx.db('reservations').first('reminded_at').where({ id }))?.reminded_at).toBeNull();
    expect(await reservationJobsService(deps).sendReminders(new Date(start.getTime() - HOUR))).toContain(id);
  });
});
