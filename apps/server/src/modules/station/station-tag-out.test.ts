import { randomUUID } from 'node:crypto';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { stationStateSchema, stationTagOutResultSchema } from '@chuckkey/core';
import { createTraining } from '@chuckkey/db/factories';
import { caughtMail, createTestContext, signedIn, type TestContext } from '../../test/harness';
import { badgeHolder, clearedOn, liveStationContext, pairedBoard, pairedCrib, pairedDevice } from './station.fixtures';

let ctx: TestContext;
// The mail catcher files what it catches in the shared test database, not in this file's own.
let caught: TestContext;
let changed: string[];
beforeAll(async () => {
  ({ ctx, changed } = await liveStationContext('station_tag_out'));
  caught = createTestContext();
});
afterAll(async () => {
  await ctx.close();
  await caught.close();
});

/** Milo, cleared on the paired machine, starts a session there (its safety check has no items). */
async function runningSession(paired: Awaited<ReturnType<typeof pairedDevice>>) {
  const training = await createTraining(ctx.db, { name: `Lathe safety ${randomUUID().slice(0, 6)}`, machine_ids: [paired.machine.id] });
  const teacher = await badgeHolder(ctx, 'instructor', { firstName: 'Vera' });
  const holder = await badgeHolder(ctx, 'member', { firstName: 'Milo' });
  await clearedOn(ctx, holder, training.id, teacher.member.id);
  await ctx.db('machines').where({ id: paired.machine.id }).update({ safety_checklist: JSON.stringify([]) });
  const started = await paired.device.post('/api/station/sessions', { badge: holder.badge, checklist: [], idempotencyKey: randomUUID() });
  if (started.status !== 201) throw new Error(`session start failed: ${started.status} ${JSON.stringify(started.body)}`);
  return { holder, sessionId: started.body.id as string };
}

describe('POST /api/station/tag-out', () => {
  it('tags the station’s machine out with the scanned member as reporter; the station state shows it, the admins are mailed, the board is told', async () => {
    const paired = await pairedDevice(ctx);
    const member = await badgeHolder(ctx, 'member', { firstName: 'Nadia' });
    changed.length = 0;

    const res = await paired.device.post('/api/station/tag-out', { badge: member.badge, reason: 'Guard damaged' });

    expect(res.status).toBe(201);
    const result = stationTagOutResultSchema.parse(res.body);
    expect(result).toEqual({ tagOut: { id: expect.any(String), machineId: paired.machine.id, reason: 'Guard damaged', reportedAt: expect.any(String) }, endedSessionId: null });
    const row = await ctx.db('tag_outs').first('*').where({ id: result.tagOut.id });
    expect(row).toMatchObject({ machine_id: paired.machine.id, reported_by: member.member.id, cleared_at: null });
    expect(changed).toContain(paired.machine.id);

    const state = stationStateSchema.parse((await paired.device.get('/api/station/state')).body);
    expect(state.taggedOut).toEqual({ reason: 'Guard damaged', since: result.tagOut.reportedAt });

    const mail = await caughtMail(caught.db, paired.admin.member.email);
    expect(mail.subject).toBe(`Tagged out: ${paired.machine.name}`);
    expect(mail.text).toContain('Nadia');
    expect(mail.text).toContain('Reason: Guard damaged');
  });

  it('refuses the machine at the next scan by rule 4, with the reason', async () => {
    const paired = await pairedDevice(ctx);
    const member = await badgeHolder(ctx, 'member');
    expect((await paired.device.post('/api/station/tag-out', { badge: member.badge, reason: 'Coolant leak' })).status).toBe(201);
    const scan = await paired.device.post('/api/station/scan', { badge: member.badge });
    expect(scan.status).toBe(200);
    expect(JSON.stringify(scan.body)).toContain('tagged_out');
    expect(JSON.stringify(scan.body)).toContain('Coolant leak');
  });

  it('without a badge speaks for the running session’s member and ends the session as by them', async () => {
    const paired = await pairedDevice(ctx);
    const { holder, sessionId } = await runningSession(paired);

    const res = await paired.device.post('/api/station/tag-out', { reason: 'Strange noise' });

    expect(res.status).toBe(201);
    const result = stationTagOutResultSchema.parse(res.body);
    expect(result.endedSessionId).toBe(sessionId);
    expect(await ctx.db('tag_outs').first('reported_by').where({ id: result.tagOut.id })).toEqual({ reported_by: holder.member.id });
    const session = await ctx.db('machine_sessions').first('ended_at', 'ended_by').where({ id: sessionId });
    expect(session?.ended_at).not.toBeNull();
    expect(session?.ended_by).toBe('member');
    const state = stationStateSchema.parse((await paired.device.get('/api/station/state')).body);
    expect(state.runningSession).toBeNull();
  });

  it('needs a badge when no session runs, and refuses an unknown badge and an inactive member', async () => {
    const paired = await pairedDevice(ctx);
    const none = await paired.device.post('/api/station/tag-out', { reason: 'Electrical smell' });
    expect(none.status).toBe(400);
    expect(none.body.code).toBe('badge_required');
    expect(none.body.errors.badge).toBeDefined();

    const unknown = await paired.device.post('/api/station/tag-out', { badge: 'z'.repeat(22), reason: 'Electrical smell' });
    expect(unknown.status).toBe(401);
    expect(unknown.body.code).toBe('unknown_badge');

    const inactive = await badgeHolder(ctx, 'member', { active: false });
    const refused = await paired.device.post('/api/station/tag-out', { badge: inactive.badge, reason: 'Electrical smell' });
    expect(refused.status).toBe(403);
    expect(refused.body.code).toBe('member_inactive');
    expect(await ctx.db('tag_outs').where({ machine_id: paired.machine.id })).toEqual([]);
  });

  it('needs a reason, and answers 409 already_tagged_out for a machine already out of service', async () => {
    const paired = await pairedDevice(ctx);
    const member = await badgeHolder(ctx, 'member');
    const empty = await paired.device.post('/api/station/tag-out', { badge: member.badge, reason: ' ' });
    expect(empty.status).toBe(400);
    expect(empty.body.errors.reason).toBeDefined();

    expect((await paired.device.post('/api/station/tag-out', { badge: member.badge, reason: 'Guard damaged' })).status).toBe(201);
    const again = await paired.device.post('/api/station/tag-out', { badge: member.badge, reason: 'Guard damaged' });
    expect(again.status).toBe(409);
    expect(again.body.code).toBe('already_tagged_out');
  });

  it('is for machine stations only: a board or crib station gets 403 not_a_machine_station, a signed-in browser without a device 401', async () => {
    const member = await badgeHolder(ctx, 'member');
    for (const paired of [await pairedBoard(ctx), await pairedCrib(ctx)]) {
      const res = await paired.device.post('/api/station/tag-out', { badge: member.badge, reason: 'Guard damaged' });
      expect(res.status).toBe(403);
      expect(res.body.code).toBe('not_a_machine_station');
    }
    const web = await (await signedIn(ctx, 'member')).post('/api/station/tag-out', { badge: member.badge, reason: 'Guard damaged' });
    expect(web.status).toBe(401);
  });
});
