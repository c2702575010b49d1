import { randomUUID } from 'node:crypto';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createMachine, createMember, createSignOff, createTraining } from '@chuckkey/db/factories';
import type { Deps } from '../../lib/deps';
import { createLogger } from '../../lib/logger';
import { createMailer, type Mailer } from '../../lib/mailer';
import { quietPublisher } from '../../realtime/publisher';
import { caughtMail, countMail, createTestContext, type TestContext } from '../../test/harness';
import { signOffRemindersService } from './reminders.service';

let ctx: TestContext;
let mailer: Mailer;
let deps: Deps;
beforeAll(() => {
  ctx = createTestContext();
  const logger = createLogger('silent');
  mailer = createMailer(ctx.config.SMTP_URL, ctx.config.MAIL_FROM, logger);
  deps = { config: ctx.config, db: ctx.db, logger, mailer, live: quietPublisher };
});
afterAll(async () => {
  mailer.close();
  await ctx.close();
});

const DAY = 86_400_000;
const HOUR = 3_600_000;

/**
 * Each test runs the reminders at its own instant, years ahead, so the sign-offs other tests
 * make around today are long expired there and never mailed or claimed by these runs.
 */
function futureNow(year: number): Date {
  return new Date(`${year}-06-15T13:00:00Z`);
}

async function signOffLapsingIn(now: Date, days: number, overrides: Parameters<typeof createSignOff>[1] = {}) {
  const member = overrides.member_id ? undefined : await createMember(ctx.db, { first_name: 'Juniper' });
  const machine = await createMachine(ctx.db, { name: `MIG ${randomUUID().slice(0, 8)}`, category: 'mig_welder' });
  const training = overrides.training_id
    ? undefined
    : await createTraining(ctx.db, { name: `MIG welding ${randomUUID().slice(0, 8)}`, machine_ids: [machine.id] });
  const signOff = await createSignOff(ctx.db, {
    member_id: member?.id,
    training_id: training?.id,
    signed_at: new Date(now.getTime() - 300 * DAY),
    expires_at: new Date(now.getTime() + days * DAY),
    ...overrides,
  });
  const email = member?.email ?? (await ctx.db('members').first('email').where({ id: signOff.member_id })).email;
  return { signOff, email: email as string, trainingName: training?.name, machineName: machine.name };
}

const service = () => signOffRemindersService(deps);
const settle = () => new Promise((resolve) => setTimeout(resolve, 300));

describe('signOffRemindersService(deps).sendDue(now)', () => {
  it('29 days before a sign-off lapses, mails the member once, and not again on the next run', async () => {
    const now = futureNow(2041);
    const { signOff, email, trainingName, machineName } = await signOffLapsingIn(now, 29);

    const first = await service().sendDue(now);
    const mail = await caughtMail(ctx.db, email);
    const second = await service().sendDue(new Date(now.getTime() + HOUR));
    await settle();

    expect(first).toContainEqual({ signOffId: signOff.id, kind: '30' });
    expect(mail.subject).toBe(`Your ${trainingName} sign-off lapses in 29 days`);
    expect(mail.text).toContain('Hello Juniper,');
    expect(mail.text).toContain(machineName);
    expect(second.map((s) => s.signOffId)).not.toContain(signOff.id);
    expect(await countMail(ctx.db, email)).toBe(1);
    const row = await ctx.db('sign_offs').first('reminded_30_at', 'reminded_7_at').where({ id: signOff.id });
    expect(row.reminded_30_at).toEqual(now);
    expect(row.reminded_7_at).toBeNull();
  });

  it('6 days before, sends the 7-day mail after the 30-day one, once', async () => {
    const now = futureNow(2042);
    const { signOff, email } = await signOffLapsingIn(now, 6, { reminded_30_at: new Date(now.getTime() - 23 * DAY) });

    const first = await service().sendDue(now);
    const mail = await caughtMail(ctx.db, email);
    const second = await service().sendDue(new Date(now.getTime() + HOUR));
    await settle();

    expect(first).toContainEqual({ signOffId: signOff.id, kind: '7' });
    expect(mail.subject).toMatch(/lapses in 6 days$/);
    expect(second.map((s) => s.signOffId)).not.toContain(signOff.id);
    expect(await countMail(ctx.db, email)).toBe(1);
  });

  it('6 days before a sign-off that never had its 30-day mail, sends only the 7-day one', async () => {
    const now = futureNow(2043);
    const { signOff, email } = await signOffLapsingIn(now, 6);

    const sent = await service().sendDue(now);
    await caughtMail(ctx.db, email);
    await service().sendDue(new Date(now.getTime() + HOUR));
    await settle();

    expect(sent.filter((s) => s.signOffId === signOff.id)).toEqual([{ signOffId: signOff.id, kind: '7' }]);
    expect(await countMail(ctx.db, email)).toBe(1);
    const row = await ctx.db('sign_offs').first('reminded_30_at', 'reminded_7_at').where({ id: signOff.id });
    expect(row).toEqual({ reminded_30_at: now, reminded_7_at: now });
  });

  it('sends nothing for a revoked sign-off', async () => {
    const now = futureNow(2044);
    const { signOff, email } = await signOffLapsingIn(now, 29, { revoked_at: new Date(now.getTime() - DAY), revoke_reason: 'Unsafe grinding' });

    const sent = await service().sendDue(now);
    await settle();

    expect(sent.map((s) => s.signOffId)).not.toContain(signOff.id);
    expect(await countMail(ctx.db, email)).toBe(0);
  });

  it('sends nothing for a sign-off renewed by a newer one, nor for a member who left', async () => {
    const now = futureNow(2045);
    const old = await signOffLapsingIn(now, 20);
    await createSignOff(ctx.db, {
      member_id: old.signOff.member_id,
      training_id: old.signOff.training_id,
      signed_at: new Date(now.getTime() - 2 * DAY),
      expires_at: new Date(now.getTime() + 363 * DAY),
    });
    const gone = await createMember(ctx.db, { active: false });
    const leftShop = await signOffLapsingIn(now, 20, { member_id: gone.id });

    const sent = (await service().sendDue(now)).map((s) => s.signOffId);
    await settle();

    expect(sent).not.toContain(old.signOff.id);
    expect(sent).not.toContain(leftShop.signOff.id);
    expect(await countMail(ctx.db, old.email)).toBe(0);
    expect(await countMail(ctx.db, gone.email)).toBe(0);
  });

  it('sends nothing more than 30 days ahead, after it lapsed, or for a sign-off that never lapses', async () => {
    const now = futureNow(2046);
    const far = await signOffLapsingIn(now, 31);
    const lapsed = await signOffLapsingIn(now, -1);
    const forever = await signOffLapsingIn(now, 0, { expires_at: null });

    const sent = (await service().sendDue(now)).map((s) => s.signOffId);

    for (const quiet of [far, lapsed, forever]) expect(sent).not.toContain(quiet.signOff.id);
  });

  it('when two processes run at the same instant, the member gets one mail', async () => {
    const now = futureNow(2047);
    const { signOff, email } = await signOffLapsingIn(now, 25);

    const [a, b] = await Promise.all([service().sendDue(now), service().sendDue(now)]);
    await caughtMail(ctx.db, email);
    await settle();

    const claims = [...a, ...b].filter((s) => s.signOffId === signOff.id);
    expect(claims).toEqual([{ signOffId: signOff.id, kind: '30' }]);
    expect(await countMail(ctx.db, email)).toBe(1);
  });

  it('when the mail cannot be sent, keeps the reminder due for the next run', async () => {
    const now = futureNow(2048);
    const { signOff } = await signOffLapsingIn(now, 25);
    const failing: Mailer = {
      send: () => Promise.reject(new Error('SMTP is down')),
      close: () => {},
    };

    const sent = await signOffRemindersService({ ...deps, mailer: failing }).sendDue(now);

    expect(sent.map((s) => s.signOffId)).not.toContain(signOff.id);
    expect((await ctx.db('sign_offs').first('reminded_30_at').where({ id: signOff.id })).reminded_30_at).toBeNull();
    const retried = await service().sendDue(new Date(now.getTime() + HOUR));
    expect(retried).toContainEqual({ signOffId: signOff.id, kind: '30' });
  });
});
