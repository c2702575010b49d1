import { randomUUID } from 'node:crypto';
import { register } from 'tsx/esm/api';
import { afterAll, beforeAll, describe, expect, inject, it } from 'vitest';
import { STATION_REQUEST_HEADER, sessionEndedSchema, sessionStartedSchema, stationScanResultSchema, stationStateSchema } from '@chuckkey/core';
import { dropDatabase, setupDatabase } from '@chuckkey/db';
import { createSignOff, createTraining, createWaiverVersion, recordWaiver } from '@chuckkey/db/factories';
import type { Deps } from '../../lib/deps';
import { createLogger } from '../../lib/logger';
import { createMailer } from '../../lib/mailer';
import { quietPublisher } from '../../realtime/publisher';
import { machineSessionsService } from '../machine-sessions/machine-sessions.service';
import { browser, createTestContext, signedIn, type TestContext } from '../../test/harness';
import { badgeHolder, pairedDevice, type BadgeHolder } from './station.fixtures';
import { SCANS_PER_MINUTE } from './station.routes';

let ctx: TestContext;
let deps: Deps;
beforeAll(async () => {
  // Clearance needs a published waiver, and waiver versions are shop-wide: publishing one in the
  // shared test database would change what the waiver tests, running beside these, start from.
  // So these tests get a database of their own, migrated like the shared one.
  const url = new URL(inject('databaseUrl'));
  url.pathname = `${url.pathname}_check_in`;
  const unregister = register();
  await dropDatabase(url.toString());
  await setupDatabase(url.toString(), { seed: false });
  await unregister();
  ctx = createTestContext({ DATABASE_URL: url.toString() });
  const logger = createLogger('silent');
  deps = { config: ctx.config, db: ctx.db, logger, mailer: createMailer(ctx.config.SMTP_URL, ctx.config.MAIL_FROM, logger), live: quietPublisher };
  // Every member below must have accepted the newest waiver version to be cleared.
  await createWaiverVersion(ctx.db);
});
afterAll(async () => {
  deps.mailer.close();
  await ctx.close();
});

const HOUR = 3_600_000;
const SAFETY = [
  { id: 'chuck-key-out', label: 'The chuck key is out of the chuck' },
  { id: 'guards-closed', label: 'The chuck guard is closed' },
  { id: 'eyes-protected', label: 'I am wearing safety glasses' },
];
const ALL_ITEMS = SAFETY.map((item) => item.id);

async function waiverOnFile(holder: BadgeHolder): Promise<void> {
  const current = await ctx.db('waiver_versions').max<{ max: number }>({ max: 'version' }).first();
  await recordWaiver(ctx.db, { memberId: holder.member.id, version: Number(current?.max) });
}

/** A paired lathe station needing one training, with a safety checklist, and a member signed off on it. */
async function arrange(options: { level?: 'independent' | 'supervised'; requiresPin?: boolean } = {}) {
  const paired = await pairedDevice(ctx);
  await ctx.db('machines').where({ id: paired.machine.id }).update({ safety_checklist: JSON.stringify(SAFETY), requires_pin: options.requiresPin ?? false });
  const training = await createTraining(ctx.db, { name: `Lathe basics ${randomUUID().slice(0, 6)}`, machine_ids: [paired.machine.id] });
  const teacher = await badgeHolder(ctx, 'instructor', { firstName: 'Bettina' });
  const member = await badgeHolder(ctx, 'member', { firstName: 'Ines' });
  await waiverOnFile(member);
  await createSignOff(ctx.db, { member_id: member.member.id, training_id: training.id, signed_by: teacher.member.id, level: options.level ?? 'independent' });
  return { ...paired, training, teacher, member };
}

async function start(device: Awaited<ReturnType<typeof arrange>>['device'], holder: BadgeHolder, extra: object = {}) {
  return device.post('/api/station/sessions', { badge: holder.badge, checklist: ALL_ITEMS, ...extra });
}

/** Scans and returns the answer with every statement the database was sent meanwhile. */
async function scanCountingStatements(device: Awaited<ReturnType<typeof arrange>>['device'], badge: string) {
  const statements: string[] = [];
  const listen = (query: { sql: string }) => statements.push(query.sql);
  ctx.db.on('query', listen);
  try {
    const res = await device.post('/api/station/scan', { badge });
    return { statements, answer: stationScanResultSchema.parse(res.body) };
  } finally {
    ctx.db.off('query', listen);
  }
}

/** Ends any open duty shifts so that the supervision rule is tested from a known state. */
async function nobodyOnDuty() {
  await ctx.db('duty_shifts').whereNull('ended_at').update({ ended_at: ctx.db.fn.now() });
}

describe('POST /api/station/scan', () => {
  it('a badge no one holds answers 200 unknown_badge and names no member', async () => {
    const { device } = await arrange();
    const res = await device.post('/api/station/scan', { badge: 'q'.repeat(22) });
    expect(res.status).toBe(200);
    const body = stationScanResultSchema.parse(res.body);
    expect(body).toMatchObject({ member: null, cleared: false, canSupervise: false });
    expect(body.reasons.map((r) => r.code)).toEqual(['unknown_badge']);
  });

  it('a revoked badge is unknown too', async () => {
    const { device, member } = await arrange();
    await ctx.db('badges').where({ member_id: member.member.id }).update({ revoked_at: ctx.db.fn.now() });
    const res = await device.post('/api/station/scan', { badge: member.badge });
    expect(res.status).toBe(200);
    expect(res.body.member).toBeNull();
    expect(res.body.reasons[0].code).toBe('unknown_badge');
    expect(JSON.stringify(res.body)).not.toContain('Ines');
  });

  it('clears a signed-off member with the waiver on file and sends the safety checklist', async () => {
    const { device, member } = await arrange({ requiresPin: true });
    const res = await device.post('/api/station/scan', { badge: member.badge });
    expect(res.status).toBe(200);
    const body = stationScanResultSchema.parse(res.body);
    expect(body).toMatchObject({
      member: { id: member.member.id, firstName: 'Ines', role: 'member' },
      cleared: true,
      reasons: [],
      canSupervise: false,
      runningSession: null,
      requiresPin: true,
      safetyChecklist: SAFETY,
    });
    expect(body.rungs.every((rung) => rung.passed)).toBe(true);
  });

  it('answers a scan in one statement: the station, its machine and the member together', async () => {
    const { device, member } = await arrange();
    await device.get('/api/station/state');
    const { statements, answer } = await scanCountingStatements(device, member.badge);
    expect(answer.cleared).toBe(true);
    expect(statements).toHaveLength(1);
    expect(statements[0]).toContain('device_token_hash');
  });

  it('neither reads nor writes a web session', async () => {
    const { device, member } = await arrange();
    const sessionsBefore = await ctx.db('web_sessions').count<{ count: string }[]>({ count: '*' });
    const res = await device.agent
      .post('/api/station/scan')
      .set('x-forwarded-for', device.ip)
      .set(STATION_REQUEST_HEADER, '1')
      .send({ badge: member.badge });
    expect(res.status).toBe(200);
    expect(res.headers['set-cookie'] ?? []).not.toEqual(expect.arrayContaining([expect.stringMatching(/^chuckkey\.sid=/)]));
    expect(await ctx.db('web_sessions').count<{ count: string }[]>({ count: '*' })).toEqual(sessionsBefore);
  });

  it('a web session’s CSRF token alone does not pass: station writes need the station header', async () => {
    const { device, member } = await arrange();
    const res = await device.agent.post('/api/station/scan').set('x-forwarded-for', device.ip).set('x-csrf-token', device.token).send({ badge: member.badge });
    expect(res.status).toBe(403);
    expect(res.body.code).toBe('csrf_invalid');
  });

  it('bad input from a paired station answers 400; from an unpaired device, 401', async () => {
    const { device } = await arrange();
    const paired = await device.post('/api/station/scan', { badge: '' });
    expect(paired.status).toBe(400);
    expect(paired.body.errors.badge).toBeDefined();
    const unpaired = await (await browser(ctx)).post('/api/station/scan', { badge: '' });
    expect(unpaired.status).toBe(401);
    expect(unpaired.body.code).toBe('station_required');
  });

  it('a member without the sign-off is told which training and who teaches it', async () => {
    const { device, training } = await arrange();
    const other = await badgeHolder(ctx, 'member', { firstName: 'Jonas' });
    await waiverOnFile(other);
    const res = await device.post('/api/station/scan', { badge: other.badge });
    expect(res.body.cleared).toBe(false);
    expect(res.body.reasons).toHaveLength(1);
    expect(res.body.reasons[0]).toMatchObject({ code: 'sign_off_missing', rule: 2 });
    expect(res.body.reasons[0].message).toContain(training.name);
    // The instructor who signed the training off is named as the one to ask.
    expect(res.body.reasons[0].nextStep).toContain('Bettina');
  });

  it('an expired sign-off names the training and says it lapsed', async () => {
    const { device, training, teacher } = await arrange();
    const other = await badgeHolder(ctx, 'member');
    await waiverOnFile(other);
    await createSignOff(ctx.db, {
      member_id: other.member.id,
      training_id: training.id,
      signed_by: teacher.member.id,
      signed_at: new Date(Date.now() - 400 * 24 * HOUR),
      expires_at: new Date(Date.now() - 35 * 24 * HOUR),
    });
    const res = await device.post('/api/station/scan', { badge: other.badge });
    expect(res.body.cleared).toBe(false);
    expect(res.body.reasons[0].code).toBe('sign_off_expired');
    expect(res.body.reasons[0].message).toContain(training.name);
  });

  it('a member without the current waiver is not cleared', async () => {
    const { device, training, teacher } = await arrange();
    const other = await badgeHolder(ctx, 'member');
    await createSignOff(ctx.db, { member_id: other.member.id, training_id: training.id, signed_by: teacher.member.id });
    const res = await device.post('/api/station/scan', { badge: other.badge });
    expect(res.body.reasons.map((r: { code: string }) => r.code)).toEqual(['waiver_missing']);
  });

  it('a supervised-only member needs a supervisor on duty', async () => {
    const { device, member, teacher } = await arrange({ level: 'supervised' });
    await nobodyOnDuty();
    const without = await device.post('/api/station/scan', { badge: member.badge });
    expect(without.body.cleared).toBe(false);
    expect(without.body.reasons.map((r: { code: string }) => r.code)).toEqual(['supervisor_required']);

    const duty = await device.post('/api/station/duty', { badge: teacher.badge, pin: teacher.pin });
    expect(duty.status).toBe(200);
    expect(duty.body).toEqual({ onDuty: true, supervisor: { firstName: 'Bettina' } });

    const withSupervisor = await device.post('/api/station/scan', { badge: member.badge });
    expect(withSupervisor.body.cleared).toBe(true);
    expect((await device.get('/api/station/state')).body.supervisorOnDuty).toEqual({ firstName: 'Bettina' });

    const off = await device.post('/api/station/duty', { badge: teacher.badge, pin: teacher.pin });
    expect(off.body.onDuty).toBe(false);
    expect((await device.post('/api/station/scan', { badge: member.badge })).body.cleared).toBe(false);
  });

  it('an instructor’s scan can supervise', async () => {
    const { device, teacher } = await arrange();
    const res = await device.post('/api/station/scan', { badge: teacher.badge });
    expect(res.body.canSupervise).toBe(true);
  });

  describe('tag-outs (rule 4)', () => {
    it('a tagged-out machine refuses a cleared member with the tag’s reason, still in one statement; once cleared, they may start', async () => {
      const { admin, device, machine, member } = await arrange();
      const reporter = await signedIn(ctx, 'member');
      expect((await reporter.post(`/api/machines/${machine.id}/tag-out`, { reason: 'Chuck guard cracked.' })).status).toBe(201);

      const { statements, answer } = await scanCountingStatements(device, member.badge);
      expect(answer.cleared).toBe(false);
      expect(answer.reasons).toEqual([expect.objectContaining({ code: 'tagged_out', rule: 4, message: `${machine.name} is tagged out: Chuck guard cracked.` })]);
      expect(statements).toHaveLength(1);
      expect(statements[0]).toContain('tag_outs');
      const refused = await start(device, member);
      expect(refused.status).toBe(409);
      expect(refused.body.reasons.map((r: { code: string }) => r.code)).toEqual(['tagged_out']);

      expect((await admin.post(`/api/machines/${machine.id}/tag-out/clear`, { note: 'New guard fitted.' })).status).toBe(200);
      expect((await scanCountingStatements(device, member.badge)).answer.cleared).toBe(true);
      expect((await start(device, member)).status).toBe(201);
    });
  });

  describe('opening hours (rule 7)', () => {
    const DAY = 24 * HOUR;
    // This database's shop keeps UTC (set-up's plain shop record), so its calendar is UTC's.
    const utcDate = (offsetDays: number) => new Date(Date.now() + offsetDays * DAY).toISOString().slice(0, 10);
    // ISO 8601 weekday numbering: Monday 1 … Sunday 7.
    const isoWeekday = (offsetDays: number) => ((new Date(Date.now() + offsetDays * DAY).getUTCDay() + 6) % 7) + 1;
    const weekdayName = (offsetDays: number) => new Intl.DateTimeFormat('en-GB', { weekday: 'long', timeZone: 'UTC' }).format(Date.now() + offsetDays * DAY);

    /** Hours are shop-wide and the other tests here expect the shop open: they go after each test. */
    async function withHours(rows: { weekday: number; opens_at: string; closes_at: string }[], closures: object[], test: () => Promise<void>) {
      await ctx.db('shop_hours').insert(rows);
      if (closures.length > 0) await ctx.db('shop_closures').insert(closures);
      try {
        await test();
      } finally {
        await ctx.db('shop_closures').delete();
        await ctx.db('shop_hours').delete();
      }
    }

    it('outside the hours a member is refused with shop_closed and told the next opening; an instructor is not held by rule 7', async () => {
      const { device, member, training, teacher } = await arrange();
      const instructor = await badgeHolder(ctx, 'instructor', { firstName: 'Tobias' });
      await waiverOnFile(instructor);
      await createSignOff(ctx.db, { member_id: instructor.member.id, training_id: training.id, signed_by: teacher.member.id });

      // Open only tomorrow, 10:00–12:00: closed for the whole of today.
      await withHours([{ weekday: isoWeekday(1), opens_at: '10:00', closes_at: '12:00' }], [], async () => {
        const refused = stationScanResultSchema.parse((await device.post('/api/station/scan', { badge: member.badge })).body);
        expect(refused.cleared).toBe(false);
        expect(refused.reasons).toEqual([
          { code: 'shop_closed', rule: 7, message: 'The shop is closed now.', nextStep: `Come back when the shop opens, ${weekdayName(1)} 10:00.` },
        ]);
        expect(refused.rungs[0]).toMatchObject({ rule: 7, passed: false });
        const start = await device.post('/api/station/sessions', { badge: member.badge, checklist: ALL_ITEMS });
        expect(start.status).toBe(409);
        expect(start.body.reasons.map((r: { code: string }) => r.code)).toEqual(['shop_closed']);

        const supervisor = stationScanResultSchema.parse((await device.post('/api/station/scan', { badge: instructor.badge })).body);
        expect(supervisor.cleared).toBe(true);
        expect(supervisor.rungs.find((rung) => rung.rule === 7)).toMatchObject({ passed: true, reasons: [] });
      });

      expect((await device.post('/api/station/scan', { badge: member.badge })).body.cleared).toBe(true);
    });

    it('a closure covering today refuses a member with its reason, though the weekly hours say open', async () => {
      const { device, member } = await arrange();
      const allDay = [1, 2, 3, 4, 5, 6, 7].map((weekday) => ({ weekday, opens_at: '00:00', closes_at: '24:00' }));

      await withHours(allDay, [{ starts_on: utcDate(-1), ends_on: utcDate(0), reason: 'Winter deep clean' }], async () => {
        const res = stationScanResultSchema.parse((await device.post('/api/station/scan', { badge: member.badge })).body);
        expect(res.reasons).toEqual([
          {
            code: 'shop_closed',
            rule: 7,
            message: 'The shop is closed today: Winter deep clean.',
            // Open around the clock again from tomorrow's midnight.
            nextStep: `Come back when the shop opens, ${weekdayName(1)} 0:00.`,
          },
        ]);
      });
    });

    it('inside the hours a member is cleared, and the scan is still one statement', async () => {
      const { device, member } = await arrange();

      await withHours([{ weekday: isoWeekday(0), opens_at: '00:00', closes_at: '24:00' }], [{ starts_on: utcDate(3), ends_on: utcDate(4), reason: 'Stocktaking' }], async () => {
        const { statements, answer } = await scanCountingStatements(device, member.badge);
        expect(answer.cleared).toBe(true);
        expect(statements).toHaveLength(1);
        expect(statements[0]).toContain('shop_hours');
      });
    });
  });

  it('another member scanning while a session runs is told who is on the machine', async () => {
    const { device, member, training, teacher } = await arrange();
    expect((await start(device, member)).status).toBe(201);
    const other = await badgeHolder(ctx, 'member', { firstName: 'Jonas' });
    await waiverOnFile(other);
    await createSignOff(ctx.db, { member_id: other.member.id, training_id: training.id, signed_by: teacher.member.id });

    const res = await device.post('/api/station/scan', { badge: other.badge });
    expect(res.body.cleared).toBe(false);
    expect(res.body.reasons.map((r: { code: string }) => r.code)).toEqual(['machine_in_use']);
    expect(res.body.reasons[0].message).toContain('Ines');
    expect(res.body.runningSession).toMatchObject({ memberFirstName: 'Ines', own: false });
    // The member on the machine sees their own session.
    expect((await device.post('/api/station/scan', { badge: member.badge })).body.runningSession.own).toBe(true);
  });

  it('a revoked station’s credential answers 401', async () => {
    const { device, admin, station, member } = await arrange();
    expect((await admin.post(`/api/stations/${station.id}/revoke`)).status).toBeLessThan(300);
    const res = await device.post('/api/station/scan', { badge: member.badge });
    expect(res.status).toBe(401);
    expect(res.body.code).toBe('station_required');
  });

  it('a crib station answers 403 not_a_machine_station', async () => {
    const { admin, member } = await arrange();
    const created = await admin.post('/api/stations', { kind: 'crib', name: 'Tool crib' });
    expect(created.status).toBe(201);
    const crib = await browser(ctx);
    expect((await crib.post('/api/station/pair', { pairingCode: created.body.pairingCode })).status).toBe(200);
    const res = await crib.post('/api/station/scan', { badge: member.badge });
    expect(res.status).toBe(403);
    expect(res.body.code).toBe('not_a_machine_station');
  });

  it('is rate limited per station', async () => {
    const { device } = await arrange();
    for (let i = 0; i < SCANS_PER_MINUTE; i += 1) await device.post('/api/station/scan', { badge: 'q'.repeat(22) });
    const res = await device.post('/api/station/scan', { badge: 'q'.repeat(22) });
    expect(res.status).toBe(429);
    // RFC 9110 §10.2.3: delay-seconds, here at most the one-minute window.
    expect(Number(res.headers['retry-after'])).toBeGreaterThan(0);
    expect(Number(res.headers['retry-after'])).toBeLessThanOrEqual(60);
    // Another station is not held up.
    const other = await pairedDevice(ctx);
    expect((await other.device.post('/api/station/scan', { badge: 'q'.repeat(22) })).status).toBe(200);
  });
});

describe('POST /api/station/sessions', () => {
  it('refuses a start without every safety item, naming the missing ones', async () => {
    const { device, member, machine } = await arrange();
    const res = await start(device, member, { checklist: ['chuck-key-out'] });
    expect(res.status).toBe(400);
    expect(res.body.code).toBe('checklist_incomplete');
    expect(res.body.errors.checklist).toEqual(['The chuck guard is closed', 'I am wearing safety glasses']);
    expect(await ctx.db('machine_sessions').where({ machine_id: machine.id }).first()).toBeUndefined();
  });

  it('refuses a wrong PIN where the machine requires one', async () => {
    const { device, member } = await arrange({ requiresPin: true });
    expect((await start(device, member, { pin: '0000' })).status).toBe(401);
    expect((await start(device, member)).body.code).toBe('wrong_pin');
    expect((await start(device, member, { pin: member.pin })).status).toBe(201);
  });

  it('refuses a member who is not cleared, with the reasons', async () => {
    const { device } = await arrange();
    const other = await badgeHolder(ctx, 'member');
    const res = await start(device, other);
    expect(res.status).toBe(409);
    expect(res.body.code).toBe('not_cleared');
    expect(res.body.reasons.map((r: { code: string }) => r.code)).toEqual(['waiver_missing', 'sign_off_missing']);
  });

  it('the database allows one running session per machine', async () => {
    const { machine, member } = await arrange();
    await ctx.db('machine_sessions').insert({ machine_id: machine.id, member_id: member.member.id });
    await expect(ctx.db('machine_sessions').insert({ machine_id: machine.id, member_id: member.member.id })).rejects.toMatchObject({ code: '23505' });
  });
});

describe('POST /api/station/sessions/:id/end', () => {
  it('start then end moves the meter by the session’s hours', async () => {
    const { device, member, machine } = await arrange();
    const started = await start(device, member);
    expect(started.status).toBe(201);
    const session = sessionStartedSchema.parse(started.body);
    expect(session.member).toEqual({ id: member.member.id, firstName: 'Ines' });
    expect((await device.get('/api/station/state')).body.runningSession).toMatchObject({ id: session.id, memberFirstName: 'Ines' });
    // Ninety minutes of work, as if the session had started then.
    await ctx.db('machine_sessions').where({ id: session.id }).update({ started_at: new Date(Date.now() - 1.5 * HOUR) });

    const res = await device.post(`/api/station/sessions/${session.id}/end`, { idempotencyKey: randomUUID() });

    expect(res.status).toBe(200);
    const ended = sessionEndedSchema.parse(res.body);
    expect(ended.hours).toBe(1.5);
    const row = await ctx.db('machines').first('meter_hours').where({ id: machine.id });
    expect(Number(row.meter_hours)).toBe(1.5);
    expect(stationStateSchema.parse((await device.get('/api/station/state')).body).runningSession).toBeNull();
  });

  it('the same idempotency key again answers the same and is applied once', async () => {
    const { device, member, machine } = await arrange();
    const { id } = (await start(device, member)).body;
    await ctx.db('machine_sessions').where({ id }).update({ started_at: new Date(Date.now() - HOUR) });
    const key = randomUUID();
    const first = await device.post(`/api/station/sessions/${id}/end`, { idempotencyKey: key });
    const again = await device.post(`/api/station/sessions/${id}/end`, { idempotencyKey: key });
    expect(again.status).toBe(200);
    expect(again.body).toEqual(first.body);
    expect(Number((await ctx.db('machines').first('meter_hours').where({ id: machine.id })).meter_hours)).toBe(1);
    // A different key for an ended session is a conflict, not a second end.
    expect((await device.post(`/api/station/sessions/${id}/end`, { idempotencyKey: randomUUID() })).status).toBe(409);
  });

  it('an end pressed offline records the time it was pressed', async () => {
    const { device, member } = await arrange();
    const { id } = (await start(device, member)).body;
    await ctx.db('machine_sessions').where({ id }).update({ started_at: new Date(Date.now() - 2 * HOUR) });
    const pressed = new Date(Date.now() - HOUR);
    const res = await device.post(`/api/station/sessions/${id}/end`, { idempotencyKey: randomUUID(), endedAt: pressed.toISOString() });
    expect(res.status).toBe(200);
    expect(res.body.endedAt).toBe(pressed.toISOString());
    expect(res.body.hours).toBe(1);
    const row = await ctx.db('machine_sessions').first('*').where({ id });
    expect(row.ended_at.toISOString()).toBe(pressed.toISOString());
    expect(row.ended_by).toBe('member');
  });

  it('refuses an end time before the start or in the future', async () => {
    const { device, member } = await arrange();
    const { id, startedAt } = (await start(device, member)).body;
    const before = new Date(new Date(startedAt).getTime() - 60_000).toISOString();
    expect((await device.post(`/api/station/sessions/${id}/end`, { idempotencyKey: randomUUID(), endedAt: before })).status).toBe(400);
    const future = new Date(Date.now() + HOUR).toISOString();
    expect((await device.post(`/api/station/sessions/${id}/end`, { idempotencyKey: randomUUID(), endedAt: future })).status).toBe(400);
  });

  it('another member’s badge cannot end the session; theirs or a supervisor’s can', async () => {
    const { device, member, teacher } = await arrange();
    const other = await badgeHolder(ctx, 'member', { firstName: 'Jonas' });
    const { id } = (await start(device, member)).body;

    const refused = await device.post(`/api/station/sessions/${id}/end`, { badge: other.badge, idempotencyKey: randomUUID() });
    expect(refused.status).toBe(403);
    expect(refused.body.code).toBe('not_allowed');

    const bySupervisor = await device.post(`/api/station/sessions/${id}/end`, { badge: teacher.badge, idempotencyKey: randomUUID() });
    expect(bySupervisor.status).toBe(200);
    expect((await ctx.db('machine_sessions').first('ended_by').where({ id })).ended_by).toBe('supervisor');

    const second = (await start(device, member)).body;
    const byOwner = await device.post(`/api/station/sessions/${second.id}/end`, { badge: member.badge, idempotencyKey: randomUUID() });
    expect(byOwner.status).toBe(200);
  });

  it('another machine’s station cannot end the session', async () => {
    const { device, member } = await arrange();
    const { id } = (await start(device, member)).body;
    const other = await pairedDevice(ctx);
    const res = await other.device.post(`/api/station/sessions/${id}/end`, { idempotencyKey: randomUUID() });
    expect(res.status).toBe(404);
  });
});

describe('closeSilentSessions', () => {
  it('closes the session of a station silent for three minutes at its last heartbeat', async () => {
    const { device, member, machine, station } = await arrange();
    const { id } = (await start(device, member)).body;
    const startedAt = new Date(Date.now() - HOUR);
    const lastSeen = new Date(Date.now() - 30 * 60_000);
    await ctx.db('machine_sessions').where({ id }).update({ started_at: startedAt });
    await ctx.db('stations').where({ id: station.id }).update({ last_seen_at: lastSeen });
    const service = machineSessionsService(deps);

    // Two minutes after the last heartbeat the station still counts as there.
    expect((await service.closeSilentSessions(new Date(lastSeen.getTime() + 2 * 60_000))).map((s) => s.id)).not.toContain(id);
    const closed = await service.closeSilentSessions(new Date());

    expect(closed.map((s) => s.id)).toContain(id);
    const row = await ctx.db('machine_sessions').first('*').where({ id });
    expect(row.ended_at.toISOString()).toBe(lastSeen.toISOString());
    expect(row.ended_by).toBe('heartbeat');
    expect(Number(row.hours)).toBe(0.5);
    expect(Number((await ctx.db('machines').first('meter_hours').where({ id: machine.id })).meter_hours)).toBe(0.5);
    // Run again, nothing more happens.
    expect((await service.closeSilentSessions(new Date())).map((s) => s.id)).not.toContain(id);
  });
});

describe('GET /api/station/members/:id/photo', () => {
  it('shows the photo of a member just scanned at this station, and to no other station', async () => {
    const { device, member } = await arrange();
    await ctx.db('member_photos').insert({ member_id: member.member.id, image: Buffer.from([0xff, 0xd8, 0xff, 0xd9]), content_type: 'image/jpeg' });
    const scan = stationScanResultSchema.parse((await device.post('/api/station/scan', { badge: member.badge })).body);
    expect(scan.member?.hasPhoto).toBe(true);
    const token = scan.member?.photoToken;
    expect(token).toBeTruthy();

    const photo = await device.get(`/api/station/members/${member.member.id}/photo?t=${encodeURIComponent(token!)}`);
    expect(photo.status).toBe(200);
    expect(photo.headers['content-type']).toContain('image/jpeg');

    const other = await pairedDevice(ctx);
    const elsewhere = await other.device.get(`/api/station/members/${member.member.id}/photo?t=${encodeURIComponent(token!)}`);
    expect(elsewhere.status).toBe(403);
    expect(elsewhere.body.code).toBe('photo_not_allowed');
    const forged = await device.get(`/api/station/members/${member.member.id}/photo?t=9999999999999.forged`);
    expect(forged.status).toBe(403);
  });

  it('a member without a photo scans with no photo grant', async () => {
    const { device, member } = await arrange();
    const scan = stationScanResultSchema.parse((await device.post('/api/station/scan', { badge: member.badge })).body);
    expect(scan.member).toMatchObject({ hasPhoto: false, photoToken: null });
  });
});
