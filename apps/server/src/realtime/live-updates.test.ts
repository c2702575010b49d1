import { randomUUID } from 'node:crypto';
import pg from 'pg';
import type { Socket as ClientSocket } from 'socket.io-client';
import { afterAll, afterEach, beforeAll, describe, expect, it } from 'vitest';
import { HEARTBEAT_SILENCE_MINUTES, LIVE_JOIN, SHOP_UPDATE, shopUpdateSchema } from '@chuckkey/core';
import { createWaiverVersion, recordWaiver } from '@chuckkey/db/factories';
import { machineSessionsService } from '../modules/machine-sessions/machine-sessions.service';
import { badgeHolder, pairedBoard, pairedDevice, type BadgeHolder } from '../modules/station/station.fixtures';
import { stationsRepository } from '../modules/stations/stations.repository';
import { ownDatabase } from '../test/harness';
import { connected, liveClient, nextEvent, nextUpdate, refusal, serversSeeEachOther, signedInWithCookie, startLiveServer, type LiveServer } from '../test/live';
import { machineRoom } from './live-updates';

let a: LiveServer;
let b: LiveServer;
let waiverVersion: number;
beforeAll(async () => {
  // Two server processes of one shop: two apps, two HTTP servers, two socket.io servers, one
  // database. Their own database keeps the PostgreSQL notifications of other test files away.
  const url = await ownDatabase('live');
  a = await startLiveServer({ DATABASE_URL: url });
  b = await startLiveServer({ DATABASE_URL: url });
  // A cleared member needs the current waiver on file.
  waiverVersion = (await createWaiverVersion(a.db)).version;
});
afterAll(async () => {
  await a?.close();
  await b?.close();
});

const sockets: ClientSocket[] = [];
afterEach(() => {
  for (const socket of sockets.splice(0)) socket.disconnect();
});

function client(server: LiveServer, cookie?: string): ClientSocket {
  const socket = liveClient(server, cookie);
  sockets.push(socket);
  return socket;
}

/** A member cleared for a machine that needs no training: active, with a badge and the waiver on file. */
async function clearedMember(server: LiveServer, fields: { firstName?: string } = {}): Promise<BadgeHolder> {
  const holder = await badgeHolder(server, 'member', { pin: null, firstName: fields.firstName });
  await recordWaiver(server.db, { memberId: holder.member.id, version: waiverVersion });
  return holder;
}

async function startSession(station: Awaited<ReturnType<typeof pairedDevice>>, holder: BadgeHolder) {
  const res = await station.device.post('/api/station/sessions', { badge: holder.badge, checklist: [] });
  expect(res.status, JSON.stringify(res.body)).toBe(201);
  return res.body as { id: string };
}

describe('the live-updates handshake (socket.io at /api/live)', () => {
  it('refuses a client without a device cookie or a sign-in with connect_error "unauthorized"', async () => {
    expect(await refusal(client(a))).toBe('unauthorized');
  });

  it('refuses a revoked board', async () => {
    const { admin, station, cookie } = await pairedBoard(a);
    await admin.post(`/api/stations/${station.id}/revoke`);
    expect(await refusal(client(a, cookie))).toBe('unauthorized');
  });

  it('refuses a made-up device token and a session that signed out', async () => {
    expect(await refusal(client(a, `chuckkey.station=${'x'.repeat(43)}`))).toBe('unauthorized');
    const person = await signedInWithCookie(a);
    expect((await person.post('/api/auth/logout')).status).toBe(204);
    expect(await refusal(client(a, person.cookie))).toBe('unauthorized');
  });

  it('admits a paired board, a machine station and a signed-in person', async () => {
    const board = await pairedBoard(a);
    const station = await pairedDevice(a);
    const person = await signedInWithCookie(a, 'member');
    for (const cookie of [board.cookie, station.cookie, person.cookie]) {
      expect((await connected(client(a, cookie))).connected).toBe(true);
    }
  });

  it('puts a machine station’s socket in its machine’s room', async () => {
    const station = await pairedDevice(a);
    const socket = await connected(client(a, station.cookie));
    const inRoom = await a.io.in(machineRoom(station.machine.id)).fetchSockets();
    expect(inRoom.map((s) => s.id)).toContain(socket.id);
  });

  it('lets a signed-in person join one machine’s room, and no device', async () => {
    const station = await pairedDevice(a);
    const person = await connected(client(a, (await signedInWithCookie(a, 'instructor')).cookie));
    const board = await connected(client(a, (await pairedBoard(a)).cookie));

    expect(await person.emitWithAck(LIVE_JOIN, { machineId: station.machine.id })).toEqual({ ok: true });
    expect(await person.emitWithAck(LIVE_JOIN, { machineId: 'lathe-1' })).toEqual({ ok: false, code: 'validation_failed' });
    expect(await board.emitWithAck(LIVE_JOIN, { machineId: station.machine.id })).toEqual({ ok: false, code: 'forbidden' });

    const inRoom = (await a.io.in(machineRoom(station.machine.id)).fetchSockets()).map((s) => s.id);
    expect(inRoom).toContain(person.id);
    expect(inRoom).not.toContain(board.id);
  });
});

describe('machine:update', () => {
  it('reaches a board device and a signed-in person when a session starts and ends at the station', async () => {
    const station = await pairedDevice(a);
    const machineId = station.machine.id;
    const board = await connected(client(a, (await pairedBoard(a)).cookie));
    const person = await connected(client(a, (await signedInWithCookie(a, 'member')).cookie));
    const holder = await clearedMember(a);

    const onBoard = nextUpdate(board, machineId, 'in_use');
    const onPhone = nextUpdate(person, machineId, 'in_use');
    const before = Date.now();
    const session = await startSession(station, holder);
    const [seen, alsoSeen] = await Promise.all([onBoard, onPhone]);

    expect(seen.update).toEqual({ machineId, state: 'in_use', at: expect.any(String) });
    expect(Object.keys(seen.raw as object).sort()).toEqual(['at', 'machineId', 'state']);
    expect(alsoSeen.update).toEqual(seen.update);
    // `at` is when the change was committed: after the request was sent, before the event arrived.
    expect(Date.parse(seen.update.at)).toBeGreaterThanOrEqual(before);
    expect(Date.parse(seen.update.at)).toBeLessThanOrEqual(Date.now());

    const ended = nextUpdate(board, machineId, 'available');
    const res = await station.device.post(`/api/station/sessions/${session.id}/end`, { idempotencyKey: randomUUID() });
    expect(res.status).toBe(200);
    expect((await ended).update.state).toBe('available');
  });

  it('carries no e-mail, last name, member id or badge code of the member on the machine', async () => {
    const station = await pairedDevice(a);
    const board = await connected(client(a, (await pairedBoard(a)).cookie));
    const holder = await clearedMember(a, { firstName: 'Wren' });
    await a.db('members').where({ id: holder.member.id }).update({ last_name: 'Quillfeather' });

    const arriving = nextUpdate(board, station.machine.id, 'in_use');
    await startSession(station, holder);
    const text = JSON.stringify((await arriving).raw);

    for (const secret of [holder.member.email, 'Quillfeather', holder.member.id, holder.badge, 'Wren']) {
      expect(text).not.toContain(secret);
    }
  });

  it('announces a tag-out and its clearing with the machine’s state', async () => {
    const station = await pairedDevice(a);
    const machineId = station.machine.id;
    const board = await connected(client(a, (await pairedBoard(a)).cookie));
    const reporter = await signedInWithCookie(a, 'member');

    const tagged = nextUpdate(board, machineId, 'tagged_out');
    expect((await reporter.post(`/api/machines/${machineId}/tag-out`, { reason: 'Chuck guard switch broken.' })).status).toBe(201);
    expect((await tagged).update.state).toBe('tagged_out');

    const cleared = nextUpdate(board, machineId, 'available');
    expect((await station.admin.post(`/api/machines/${machineId}/tag-out/clear`, { note: 'New switch fitted.' })).status).toBe(200);
    expect((await cleared).update.state).toBe('available');
  });

  it('announces a station gone silent as offline, closing its session, and back once it is heard again', async () => {
    const station = await pairedDevice(a);
    const machineId = station.machine.id;
    const board = await connected(client(a, (await pairedBoard(a)).cookie));
    await startSession(station, await clearedMember(a));
    const silentSince = new Date(Date.now() - (HEARTBEAT_SILENCE_MINUTES + 2) * 60_000);
    await a.db('stations').where({ id: station.station.id }).update({ last_seen_at: silentSince });

    const offline = nextUpdate(board, machineId, 'offline');
    // What the silent-stations job runs every minute.
    await machineSessionsService(a.deps).closeSilentSessions(new Date());
    expect((await offline).update.state).toBe('offline');
    expect(await a.db('machine_sessions').where({ machine_id: machineId }).whereNull('ended_at').first()).toBeUndefined();

    const back = nextUpdate(board, machineId, 'available');
    expect((await station.device.post('/api/station/heartbeat')).status).toBe(204);
    expect((await back).update.state).toBe('available');
  });

  it('announces each silence once, whichever process runs the job', async () => {
    const station = await pairedDevice(a);
    const cutoff = new Date();
    await a.db('stations').where({ id: station.station.id }).update({ last_seen_at: new Date(cutoff.getTime() - 60_000) });

    expect(await stationsRepository(a.db).markSilent(cutoff)).toContain(station.machine.id);
    expect(await stationsRepository(b.db).markSilent(cutoff)).not.toContain(station.machine.id);
  });
});

describe('shop:update', () => {
  it('reaches the board when a supervisor goes on duty and off again', async () => {
    const station = await pairedDevice(a);
    const board = await connected(client(a, (await pairedBoard(a)).cookie));
    const supervisor = await badgeHolder(a, 'instructor', { firstName: 'Bettina' });

    for (const onDuty of [true, false]) {
      const arriving = nextEvent(board, SHOP_UPDATE);
      const res = await station.device.post('/api/station/duty', { badge: supervisor.badge, pin: supervisor.pin });
      expect(res.body.onDuty).toBe(onDuty);
      const [update] = await arriving;
      expect(shopUpdateSchema.parse(update)).toEqual({ kind: 'duty', at: expect.any(String) });
    }
  });
});

describe('revoking a station', () => {
  it('closes its device’s open socket, and the client is told it was the server', async () => {
    const { admin, station, cookie } = await pairedBoard(a);
    const socket = await connected(client(a, cookie));

    const closed = nextEvent(socket, 'disconnect');
    await admin.post(`/api/stations/${station.id}/revoke`);

    expect((await closed)[0]).toBe('io server disconnect');
  });
});

describe('several server processes on one database', () => {
  it('a session started through process A reaches a board connected to process B, and a tag-out through B a person on A', async () => {
    await serversSeeEachOther([a, b]);
    const station = await pairedDevice(a);
    const machineId = station.machine.id;
    const boardOnB = await connected(client(b, (await pairedBoard(b)).cookie));
    const personOnA = await connected(client(a, (await signedInWithCookie(a, 'member')).cookie));

    const onB = nextUpdate(boardOnB, machineId, 'in_use');
    await startSession(station, await clearedMember(a));
    expect((await onB).update).toMatchObject({ machineId, state: 'in_use' });

    const reporter = await signedInWithCookie(b, 'member');
    const onA = nextUpdate(personOnA, machineId, 'tagged_out');
    expect((await reporter.post(`/api/machines/${machineId}/tag-out`, { reason: 'Coolant pump leaking.' })).status).toBe(201);
    expect((await onA).update).toMatchObject({ machineId, state: 'tagged_out' });
  });
});

describe('between processes, at rest', () => {
  it('a process with the default heartbeat sends a handful of notifications a minute, not a stream', async () => {
    const server = await startLiveServer({}, {});
    const listener = new pg.Client({ connectionString: server.config.DATABASE_URL });
    await listener.connect();
    let notifications = 0;
    listener.on('notification', () => {
      notifications += 1;
    });
    try {
      // The adapter's channel for the default namespace.
      await listener.query('LISTEN "socket.io#/"');
      await new Promise((resolve) => setTimeout(resolve, 1_500));
      // @socket.io/postgres-adapter's heartbeat is every 5 s by default: at most one or two here.
      expect(notifications).toBeLessThanOrEqual(2);
    } finally {
      await listener.end();
      await server.close();
    }
  });
});
