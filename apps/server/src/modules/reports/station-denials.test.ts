import { Writable } from 'node:stream';
import { pino } from 'pino';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createMachine, createMember, createSignOff, createTraining, createWaiverVersion } from '@chuckkey/db/factories';
import { createDb } from '../../lib/db';
import { createLogger } from '../../lib/logger';
import { createTestContext, ownDatabase, unreachableDatabaseUrl, type TestContext } from '../../test/harness';
import { badgeHolder, clearedOn, pairedDevice } from '../station/station.fixtures';
import { denialRecorder, type Denial } from './denial-recorder';

// A database of its own: a published waiver version is shop-wide, and the cleared scan needs one.
let ctx: TestContext;
beforeAll(async () => {
  ctx = createTestContext({ DATABASE_URL: await ownDatabase('denials') });
  await createWaiverVersion(ctx.db);
});
afterAll(() => ctx.close());

const DAY = 86_400_000;

/** The machine's recorded denials once `count` have landed (they are written a second or so after the scan). */
async function denialsOf(machineId: string, count: number, timeoutMs = 5_000) {
  const deadline = Date.now() + timeoutMs;
  for (;;) {
    const rows = await ctx.db('station_denials')
      .select('station_id as stationId', 'member_id as memberId', 'code', 'rule', 'training_id as trainingId')
      .where({ machine_id: machineId })
      .orderBy('id');
    if (rows.length >= count || Date.now() > deadline) return rows;
    await new Promise((resolve) => setTimeout(resolve, 100));
  }
}

describe('refused scans at a machine station are recorded', () => {
  it('a badge no one holds leaves one unknown_badge row naming no member', async () => {
    const { device, machine, station } = await pairedDevice(ctx);
    const res = await device.post('/api/station/scan', { badge: 'q'.repeat(22) });
    expect(res.status).toBe(200);
    expect(res.body.cleared).toBe(false);
    expect(await denialsOf(machine.id, 1)).toEqual([{ stationId: station.id, memberId: null, code: 'unknown_badge', rule: null, trainingId: null }]);
  });

  it('each reason of a refusal is a row, the sign-off reasons naming their training', async () => {
    const { device, machine, station } = await pairedDevice(ctx);
    // The station lists a machine's trainings by name, and rule 2 speaks of them in that order.
    const first = await createTraining(ctx.db, { name: `A denial lathe basics ${machine.id.slice(0, 6)}`, machine_ids: [machine.id] });
    const second = await createTraining(ctx.db, { name: `B denial lathe threading ${machine.id.slice(0, 6)}`, machine_ids: [machine.id] });
    const member = await badgeHolder(ctx, 'member');
    const instructor = await createMember(ctx.db, { role: 'instructor' });
    // No waiver accepted (rule 1), no sign-off on the first training, a lapsed one on the second (rule 2).
    await createSignOff(ctx.db, {
      member_id: member.member.id,
      training_id: second.id,
      signed_by: instructor.id,
      signed_at: new Date(Date.now() - 400 * DAY),
      expires_at: new Date(Date.now() - 30 * DAY),
    });
    const res = await device.post('/api/station/scan', { badge: member.badge });
    expect(res.body.reasons.map((r: { code: string }) => r.code)).toEqual(['waiver_missing', 'sign_off_missing', 'sign_off_expired']);
    expect(await denialsOf(machine.id, 3)).toEqual([
      { stationId: station.id, memberId: member.member.id, code: 'waiver_missing', rule: 1, trainingId: null },
      { stationId: station.id, memberId: member.member.id, code: 'sign_off_missing', rule: 2, trainingId: first.id },
      { stationId: station.id, memberId: member.member.id, code: 'sign_off_expired', rule: 2, trainingId: second.id },
    ]);
  });

  it('a cleared scan records nothing', async () => {
    const { device, machine } = await pairedDevice(ctx);
    const training = await createTraining(ctx.db, { machine_ids: [machine.id] });
    const member = await badgeHolder(ctx, 'member');
    await clearedOn(ctx, member, training.id, (await createMember(ctx.db, { role: 'instructor' })).id);
    const res = await device.post('/api/station/scan', { badge: member.badge });
    expect(res.body.cleared).toBe(true);
    // Past two flush intervals: anything queued would have been written by now.
    await new Promise((resolve) => setTimeout(resolve, 2_200));
    expect(await denialsOf(machine.id, 0, 0)).toEqual([]);
  });
});

describe('the denial recorder', () => {
  const denial = (machineId: string, fields: Partial<Denial> = {}): Denial => ({
    at: new Date(),
    stationId: null,
    machineId,
    memberId: null,
    code: 'unknown_badge',
    rule: null,
    trainingId: null,
    ...fields,
  });

  it('holds rows until it flushes, then writes them all in one statement; close() writes the rest', async () => {
    const machine = await createMachine(ctx.db);
    // An hour between timed flushes: only the explicit ones below write.
    const recorder = denialRecorder({ db: ctx.db, logger: createLogger('silent') }, { flushMs: 3_600_000 });
    try {
      recorder.record([denial(machine.id), denial(machine.id, { code: 'shop_closed', rule: 7 })]);
      expect(await denialsOf(machine.id, 0, 0)).toEqual([]);
      await recorder.flush();
      expect((await denialsOf(machine.id, 2, 0)).map((r) => r.code)).toEqual(['unknown_badge', 'shop_closed']);
      recorder.record([denial(machine.id, { code: 'machine_in_use', rule: 5 })]);
    } finally {
      await recorder.close();
    }
    expect((await denialsOf(machine.id, 3, 0)).map((r) => r.code)).toEqual(['unknown_badge', 'shop_closed', 'machine_in_use']);
  });

  it('keeps a batch whose member was removed since, with the member as null, and drops rows of a removed machine', async () => {
    const machine = await createMachine(ctx.db);
    const gone = await createMachine(ctx.db);
    const member = await createMember(ctx.db);
    const recorder = denialRecorder({ db: ctx.db, logger: createLogger('silent') }, { flushMs: 3_600_000 });
    recorder.record([denial(machine.id, { memberId: member.id, code: 'waiver_missing', rule: 1 }), denial(gone.id)]);
    await ctx.db('members').where({ id: member.id }).delete();
    await ctx.db('machines').where({ id: gone.id }).delete();
    await recorder.close();
    expect(await denialsOf(machine.id, 1, 0)).toEqual([{ stationId: null, memberId: null, code: 'waiver_missing', rule: 1, trainingId: null }]);
    expect(await ctx.db('station_denials').where({ machine_id: gone.id })).toEqual([]);
  });

  it('logs a failed write and goes on, never throwing into a scan', async () => {
    const lines: string[] = [];
    const logger = pino(
      { level: 'error' },
      new Writable({
        write(chunk, _encoding, callback) {
          lines.push(String(chunk));
          callback();
        },
      }),
    );
    const down = createDb(await unreachableDatabaseUrl(), logger, 1);
    const recorder = denialRecorder({ db: down, logger }, { flushMs: 3_600_000 });
    try {
      expect(() => recorder.record([denial('00000000-0000-4000-8000-000000000000')])).not.toThrow();
      await expect(recorder.flush()).resolves.toBeUndefined();
      expect(lines.some((line) => line.includes('station denials could not be recorded'))).toBe(true);
    } finally {
      await recorder.close();
      await down.destroy();
    }
  });
});
