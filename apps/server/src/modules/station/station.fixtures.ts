import { randomUUID } from 'node:crypto';
import { STATION_COOKIE, type Role, type StationWithCode } from '@chuckkey/core';
import { hashPassword } from '@chuckkey/db';
import { createBadge, createMachine, createMember, createSignOff, createTraining, createWaiverVersion, recordWaiver, type CreatedMember, type MachineRow } from '@chuckkey/db/factories';
import { browser, createTestContext, ownDatabase, recordingPublisher, signedIn, type TestContext } from '../../test/harness';

type SignedIn = Awaited<ReturnType<typeof signedIn>>;

/**
 * A context on a database of its own (waiver versions and opening hours are shop-wide) with a
 * waiver published, recording the machines announced live into `changed`.
 */
export async function liveStationContext(name: string): Promise<{ ctx: TestContext; changed: string[] }> {
  const changed: string[] = [];
  const ctx = createTestContext({ DATABASE_URL: await ownDatabase(name) }, { live: recordingPublisher(changed) });
  await createWaiverVersion(ctx.db);
  return { ctx, changed };
}

export const minutesFromNow = (minutes: number) => new Date(Date.now() + minutes * 60_000);

/** An admin creates a station for a new machine through the API and gets its pairing code. */
export async function createStation(ctx: TestContext): Promise<{ admin: SignedIn; machine: MachineRow; station: StationWithCode }> {
  const client = await signedIn(ctx, 'admin');
  const machine = await createMachine(ctx.db);
  const res = await client.post('/api/stations', { machineId: machine.id });
  if (res.status !== 201) throw new Error(`station create failed: ${res.status} ${JSON.stringify(res.body)}`);
  return { admin: client, machine, station: res.body as StationWithCode };
}

/** A kiosk's browser that paired with a fresh station and now holds its device cookie. */
export async function pairedDevice(ctx: TestContext) {
  const created = await createStation(ctx);
  const device = await browser(ctx);
  const res = await device.post('/api/station/pair', { pairingCode: created.station.pairingCode });
  if (res.status !== 200) throw new Error(`pairing failed: ${res.status} ${JSON.stringify(res.body)}`);
  return { ...created, device, cookie: setCookie(res, STATION_COOKIE) };
}

/** The `name=value` of a cookie the answer set, for sending it from a client that keeps none. */
export function setCookie(res: { headers: Record<string, unknown> }, name: string): string {
  const cookies = (res.headers['set-cookie'] as string[] | undefined) ?? [];
  // The device cookie's answer first removes the one at its earlier path: that one is empty.
  const cookie = cookies.find((c) => c.startsWith(`${name}=`) && !c.startsWith(`${name}=;`));
  if (!cookie) throw new Error(`the answer set no ${name} cookie`);
  return cookie.split(';')[0] ?? '';
}

/** A wall board's browser, paired with a new board station; `cookie` is its device cookie. */
export async function pairedBoard(ctx: TestContext) {
  const admin = await signedIn(ctx, 'admin');
  const created = await admin.post('/api/stations', { kind: 'board' });
  if (created.status !== 201) throw new Error(`board create failed: ${created.status} ${JSON.stringify(created.body)}`);
  const station = created.body as StationWithCode;
  const device = await browser(ctx);
  const res = await device.post('/api/station/pair', { pairingCode: station.pairingCode });
  if (res.status !== 200) throw new Error(`pairing failed: ${res.status} ${JSON.stringify(res.body)}`);
  return { admin, station, device, cookie: setCookie(res, STATION_COOKIE) };
}

/** A crib station's browser, paired with a new crib station; `cookie` is its device cookie. */
export async function pairedCrib(ctx: TestContext) {
  const admin = await signedIn(ctx, 'admin');
  const created = await admin.post('/api/stations', { kind: 'crib' });
  if (created.status !== 201) throw new Error(`crib station create failed: ${created.status} ${JSON.stringify(created.body)}`);
  const station = created.body as StationWithCode;
  const device = await browser(ctx);
  const res = await device.post('/api/station/pair', { pairingCode: station.pairingCode });
  if (res.status !== 200) throw new Error(`pairing failed: ${res.status} ${JSON.stringify(res.body)}`);
  return { admin, station, device, cookie: setCookie(res, STATION_COOKIE) };
}

export interface BadgeHolder {
  member: CreatedMember;
  badge: string;
  pin: string;
}

/** A person with an active badge and, unless `pin: null`, a PIN. */
export async function badgeHolder(
  ctx: TestContext,
  role: Role,
  options: { pin?: string | null; active?: boolean; firstName?: string } = {},
): Promise<BadgeHolder> {
  const member = await createMember(ctx.db, { role, active: options.active ?? true, first_name: options.firstName ?? 'Test' });
  const { code } = await createBadge(ctx.db, { memberId: member.id, badgeSecret: ctx.config.BADGE_SECRET });
  const pin = options.pin === undefined ? '4827' : options.pin;
  // Stored as PUT /api/profile/pin stores it: an argon2id hash, like a password.
  if (pin !== null) await ctx.db('members').where({ id: member.id }).update({ pin_hash: await hashPassword(pin) });
  return { member, badge: code, pin: pin ?? '' };
}

/** The holder accepts the waiver in force and is signed off independently on the training. */
export async function clearedOn(ctx: TestContext, holder: BadgeHolder, trainingId: string, signedBy: string): Promise<void> {
  const current = await ctx.db('waiver_versions').max<{ max: number }>({ max: 'version' }).first();
  await recordWaiver(ctx.db, { memberId: holder.member.id, version: Number(current?.max) });
  await createSignOff(ctx.db, { member_id: holder.member.id, training_id: trainingId, signed_by: signedBy, level: 'independent' });
}

/**
 * A paired welder station needing one training, with Ines and Jonas cleared on it (a waiver
 * version must be in force) and Ines holding a reservation from `startsAt` to `endsAt`, in the
 * given status. `machine` sets the welder's booking rules first.
 */
export async function welderReservedByInes(
  ctx: TestContext,
  reservation: { startsAt: Date; endsAt: Date; status: 'active' | 'checked_in' | 'cancelled' },
  machine: Record<string, unknown> = {},
) {
  const paired = await pairedDevice(ctx);
  if (Object.keys(machine).length > 0) await ctx.db('machines').where({ id: paired.machine.id }).update(machine);
  const training = await createTraining(ctx.db, { name: `MIG welding safety ${randomUUID().slice(0, 6)}`, machine_ids: [paired.machine.id] });
  const teacher = await badgeHolder(ctx, 'instructor', { firstName: 'Bettina' });
  const holder = await badgeHolder(ctx, 'member', { firstName: 'Ines' });
  const other = await badgeHolder(ctx, 'member', { firstName: 'Jonas' });
  await clearedOn(ctx, holder, training.id, teacher.member.id);
  await clearedOn(ctx, other, training.id, teacher.member.id);
  const { startsAt, endsAt, status } = reservation;
  const [row] = await ctx
    .db('reservations')
    .insert({
      machine_id: paired.machine.id,
      member_id: holder.member.id,
      starts_at: startsAt,
      ends_at: endsAt,
      blocked_until: endsAt,
      status,
      checked_in_at: status === 'checked_in' ? startsAt : null,
      cancelled_at: status === 'cancelled' ? new Date() : null,
    })
    .returning<{ id: string }[]>('id');
  return { ...paired, holder, other, reservationId: row!.id, startsAt, endsAt };
}
