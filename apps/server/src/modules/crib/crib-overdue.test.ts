import { randomUUID } from 'node:crypto';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { cribOverdueSchema, stationScanResultSchema } from '@chuckkey/core';
import { createMember, createTraining, createWaiverVersion } from '@chuckkey/db/factories';
import type { Deps } from '../../lib/deps';
import { createLogger } from '../../lib/logger';
import { createMailer, type Mailer } from '../../lib/mailer';
import { quietPublisher } from '../../realtime/publisher';
import { browser, caughtMail, countMail, createTestContext, ownDatabase, signedIn, type Browser, type TestContext } from '../../test/harness';
import { badgeHolder, clearedOn, pairedDevice } from '../station/station.fixtures';
import { cribOverdueService } from './crib-overdue.service';

let ctx: TestContext;
/** The shared test database, where the mail catcher keeps what it caught. */
let outbox: TestContext;
let mailer: Mailer;
let deps: Deps;
let admin: Browser & { member: { id: string } };

const SECOND = 1_000;
const HOUR = 3_600_000;
const DAY = 24 * HOUR;

beforeAll(async () => {
  // The job mails every overdue tool in its database, and the blocking policy is shop-wide: the
  // crib tests running beside these keep their checkouts and their shop elsewhere.
  ctx = createTestContext({ DATABASE_URL: await ownDatabase('crib_overdue') });
  outbox = createTestContext();
  const logger = createLogger('silent');
  mailer = createMailer(ctx.config.SMTP_URL, ctx.config.MAIL_FROM, logger);
  deps = { config: ctx.config, db: ctx.db, logger, mailer, live: quietPublisher };
  // An invented shop on a clock other than UTC, so the due time in the mail is the shop's own.
  await ctx.db('shop').where({ id: 1 }).update({ name: 'Millbrook Community Metal Shop', town: 'Millbrook', time_zone: 'America/Chicago' });
  await createWaiverVersion(ctx.db);
  admin = await signedIn(ctx, 'admin');
});
afterAll(async () => {
  mailer.close();
  await ctx.close();
  await outbox.close();
});

async function tool(name: string, binLocation: string | null = 'Drawer C4') {
  const [row] = await ctx
    .db('crib_items')
    .insert({ kind: 'tool', name, asset_tag: `T-${randomUUID().slice(0, 8)}`, condition: 'good', bin_location: binLocation })
    .returning<{ id: string; asset_tag: string }[]>(['id', 'asset_tag']);
  return { id: row!.id, assetTag: row!.asset_tag, name };
}

/** A tool out to the member since a week before it is due, as the crib records a checkout. */
async function checkout(memberId: string, itemId: string, dueAt: Date): Promise<string> {
  const [row] = await ctx
    .db('crib_checkouts')
    .insert({ item_id: itemId, item_kind: 'tool', member_id: memberId, quantity: 1, checked_out_at: new Date(Math.min(Date.now(), dueAt.getTime()) - 7 * DAY), due_at: dueAt })
    .returning<{ id: string }[]>('id');
  return row!.id;
}

const noticesOf = async (id: string) =>
  ctx.db('crib_checkouts').first({ sent: 'overdue_notices_sent', last: 'last_overdue_notice_at' }).where({ id }) as Promise<{ sent: number; last: Date | null }>;

describe('overdue reminders', () => {
  it('mails the member when the tool becomes overdue, again once 24 hours have passed, three times at most', async () => {
    const member = await createMember(ctx.db, { first_name: 'Odile' });
    const gauge = await tool('Telescoping bore gauge set');
    // 23:30 UTC is 17:30 in Chicago in January (UTC−6, IANA tz database via Intl).
    const due = new Date('2031-01-15T23:30:00Z');
    const id = await checkout(member.id, gauge.id, due);
    const service = cribOverdueService(deps);
    const at = (ms: number) => new Date(due.getTime() + ms);

    expect(await service.sendOverdueNotices(due)).not.toContain(id);
    const first = at(SECOND);
    expect(await service.sendOverdueNotices(first)).toContain(id);
    const mail = await caughtMail(outbox.db, member.email);
    expect(mail.subject).toMatch(/^Overdue: Telescoping bore gauge set/);
    expect(mail.text).toContain('Hello Odile,');
    expect(mail.text).toContain(`The Telescoping bore gauge set (asset tag ${gauge.assetTag}) you borrowed was due back on Wednesday, January 15, 2031, 5:30`);
    expect(mail.text).toContain('the tool crib at Millbrook Community Metal Shop (its place there: Drawer C4)');
    expect(mail.text).toContain('reminder 1 of 3');
    expect(await noticesOf(id)).toEqual({ sent: 1, last: first });

    // Not again within 24 hours of the last reminder.
    expect(await service.sendOverdueNotices(at(HOUR))).not.toContain(id);
    expect(await service.sendOverdueNotices(at(DAY))).not.toContain(id);
    expect(await countMail(outbox.db, member.email)).toBe(1);

    expect(await service.sendOverdueNotices(at(DAY + SECOND))).toContain(id);
    expect((await caughtMail(outbox.db, member.email)).text).toContain('reminder 2 of 3');
    expect(await service.sendOverdueNotices(at(2 * DAY + 2 * SECOND))).toContain(id);
    expect((await caughtMail(outbox.db, member.email)).text).toContain('This is the last reminder');

    // Never a fourth, however long the tool stays out.
    expect(await service.sendOverdueNotices(at(4 * DAY))).not.toContain(id);
    expect(await service.sendOverdueNotices(at(30 * DAY))).not.toContain(id);
    expect(await countMail(outbox.db, member.email)).toBe(3);
    expect((await noticesOf(id)).sent).toBe(3);
  });

  it('sends nothing for a tool that came back, even after its due time', async () => {
    const member = await createMember(ctx.db);
    const helmet = await tool('Auto-darkening welding helmet', null);
    const due = new Date(Date.now() - HOUR);
    const id = await checkout(member.id, helmet.id, due);
    const returned = await admin.post(`/api/crib/checkouts/${id}/return`, { condition: 'good' });
    expect(returned.status).toBe(200);

    expect(await cribOverdueService(deps).sendOverdueNotices(new Date(due.getTime() + 2 * DAY))).not.toContain(id);
    expect(await countMail(outbox.db, member.email)).toBe(0);
    expect((await noticesOf(id)).sent).toBe(0);
  });

  it('two runs at once send one reminder', async () => {
    const member = await createMember(ctx.db);
    const micrometer = await tool('Outside micrometer 1–2 in');
    const due = new Date('2031-02-03T22:00:00Z');
    const id = await checkout(member.id, micrometer.id, due);
    const now = new Date(due.getTime() + 5 * 60 * SECOND);

    const [a, b] = await Promise.all([cribOverdueService(deps).sendOverdueNotices(now), cribOverdueService(deps).sendOverdueNotices(now)]);

    expect([...a, ...b].filter((sent) => sent === id)).toHaveLength(1);
    // The hand-off is awaited inside the claim, so the catcher has it or is about to.
    await caughtMail(outbox.db, member.email);
    expect(await countMail(outbox.db, member.email)).toBe(1);
    expect((await noticesOf(id)).sent).toBe(1);
  });

  it('claims no reminder when the mail cannot be handed off, so the next run tries again', async () => {
    const member = await createMember(ctx.db);
    const bar = await tool('Boring bar, 3/8 in shank');
    const due = new Date('2031-02-20T22:00:00Z');
    const id = await checkout(member.id, bar.id, due);
    const broken: Mailer = {
      async send() {
        throw new Error('SMTP refused');
      },
      close() {},
    };
    const now = new Date(due.getTime() + HOUR);

    expect(await cribOverdueService({ ...deps, mailer: broken }).sendOverdueNotices(now)).not.toContain(id);
    expect(await noticesOf(id)).toEqual({ sent: 0, last: null });
    expect(await cribOverdueService(deps).sendOverdueNotices(now)).toContain(id);
  });
});

describe('GET /api/crib/overdue', () => {
  it('lists the tools past due for admins, most overdue first, with the member and the reminders sent', async () => {
    const member = await createMember(ctx.db, { first_name: 'Rasmus', last_name: 'Quill' });
    const gauge = await tool('Thread pitch gauge');
    const blade = await tool('Parting blade, 1/8 in');
    const notYet = await tool('Center drill set');
    const back = await tool('Dial bore gauge');
    const now = Date.now();
    const late = await checkout(member.id, gauge.id, new Date(now - 50 * HOUR));
    const later = await checkout(member.id, blade.id, new Date(now - 3 * HOUR));
    const future = await checkout(member.id, notYet.id, new Date(now + HOUR));
    const returned = await checkout(member.id, back.id, new Date(now - 10 * HOUR));
    await admin.post(`/api/crib/checkouts/${returned}/return`, { condition: 'good' });
    await cribOverdueService(deps).sendOverdueNotices(new Date(now - 49 * HOUR));

    const res = await admin.get('/api/crib/overdue');
    expect(res.status).toBe(200);
    const rows = cribOverdueSchema.array().parse(res.body);
    const ids = rows.map((row) => row.checkoutId);
    expect(ids).not.toContain(future);
    expect(ids).not.toContain(returned);
    expect(ids.indexOf(late)).toBeLessThan(ids.indexOf(later));
    const first = rows.find((row) => row.checkoutId === late)!;
    expect(first).toMatchObject({
      itemId: gauge.id,
      itemName: 'Thread pitch gauge',
      assetTag: gauge.assetTag,
      memberId: member.id,
      memberName: 'Rasmus Quill',
      memberEmail: member.email,
      noticesSent: 1,
      lastNoticeAt: new Date(now - 49 * HOUR).toISOString(),
    });
    expect(first.dueAt).toBe(new Date(now - 50 * HOUR).toISOString());
    // Tenths of an hour, rounded down; the request ran a moment after `now`.
    expect(first.overdueByHours).toBeGreaterThanOrEqual(50);
    expect(first.overdueByHours).toBeLessThan(50.2);
    expect(rows.find((row) => row.checkoutId === later)).toMatchObject({ noticesSent: 0, lastNoticeAt: null });
  });

  it('answers 403 to a member and an instructor, and 401 when signed out', async () => {
    expect((await (await signedIn(ctx, 'member')).get('/api/crib/overdue')).status).toBe(403);
    expect((await (await signedIn(ctx, 'instructor')).get('/api/crib/overdue')).status).toBe(403);
    expect((await (await browser(ctx)).get('/api/crib/overdue')).status).toBe(401);
  });
});

describe('clearance rule 8: overdue crib tools', () => {
  it('blocks machine use only when the policy is on and a tool is overdue past its days, naming the tool; returning it clears', async () => {
    const { device, machine } = await pairedDevice(ctx);
    const training = await createTraining(ctx.db, { name: `Lathe basics ${randomUUID().slice(0, 6)}`, machine_ids: [machine.id] });
    const teacher = await badgeHolder(ctx, 'instructor', { firstName: 'Bettina' });
    const holder = await badgeHolder(ctx, 'member', { firstName: 'Ines' });
    await clearedOn(ctx, holder, training.id, teacher.member.id);
    const gauge = await tool('Telescoping bore gauge set');
    const id = await checkout(holder.member.id, gauge.id, new Date(Date.now() - DAY - HOUR));
    const scan = async () => stationScanResultSchema.parse((await device.post('/api/station/scan', { badge: holder.badge })).body);

    try {
      // Off by default (product rule 8): an overdue tool alone never blocks.
      expect((await admin.get('/api/shop/policies')).body).toEqual({ overdueCheckoutBlockDays: null });
      expect((await scan()).cleared).toBe(true);

      expect((await admin.put('/api/shop/policies', { overdueCheckoutBlockDays: 2 })).status).toBe(200);
      // A day overdue is within the two days the shop allows.
      expect((await scan()).cleared).toBe(true);

      await ctx.db('crib_checkouts').where({ id }).update({ due_at: new Date(Date.now() - 3 * DAY) });
      const refused = await scan();
      expect(refused.cleared).toBe(false);
      expect(refused.reasons).toHaveLength(1);
      expect(refused.reasons[0]).toMatchObject({ rule: 8, code: 'crib_overdue' });
      expect(refused.reasons[0]!.message).toContain('Telescoping bore gauge set');
      expect(refused.rungs.find((rung) => rung.rule === 8)).toMatchObject({ passed: false });

      expect((await admin.post(`/api/crib/checkouts/${id}/return`, { condition: 'good' })).status).toBe(200);
      expect((await scan()).cleared).toBe(true);
    } finally {
      await ctx.db('shop').where({ id: 1 }).update({ overdue_checkout_block_days: null });
    }
  });
});
