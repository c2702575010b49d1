import { randomUUID } from 'node:crypto';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { PAIRING_ALPHABET, PAIRING_CODE_LENGTH, stationListSchema, stationWithCodeSchema } from '@chuckkey/core';
import { createMachine } from '@chuckkey/db/factories';
import { browser, createTestContext, signedIn, type TestContext } from '../../test/harness';
import { createStation } from '../station/station.fixtures';
import { newPairingCode, pairingCodeHash } from './stations.service';

let ctx: TestContext;
beforeAll(() => {
  ctx = createTestContext();
});
afterAll(() => ctx.close());

const codePattern = new RegExp(`^[${PAIRING_ALPHABET}]{${PAIRING_CODE_LENGTH}}$`);

describe('pairing codes', () => {
  it('are 8 characters from the alphabet without look-alikes, every symbol in use', () => {
    const codes = Array.from({ length: 2_000 }, newPairingCode);
    expect(codes.every((code) => codePattern.test(code))).toBe(true);
    // 16,000 draws from 31 symbols: a symbol that never turns up would mean a biased draw.
    expect(new Set(codes.join('')).size).toBe(PAIRING_ALPHABET.length);
    expect(PAIRING_ALPHABET).not.toMatch(/[01ILO]/);
  });

  it('are stored as a keyed hash that changes with the secret', () => {
    const code = 'ABCD2345';
    expect(pairingCodeHash('secret-one', code)).toMatch(/^[0-9a-f]{64}$/);
    expect(pairingCodeHash('secret-one', code)).not.toBe(pairingCodeHash('secret-two', code));
  });
});

describe('who may manage stations', () => {
  it('signed out, every route answers 401', async () => {
    const client = await browser(ctx);
    const id = randomUUID();
    for (const res of [
      await client.get('/api/stations'),
      await client.post('/api/stations', { kind: 'crib' }),
      await client.post(`/api/stations/${id}/revoke`),
      await client.post(`/api/stations/${id}/pairing-code`),
    ]) {
      expect(res.status).toBe(401);
      expect(res.body.code).toBe('unauthenticated');
    }
  });

  for (const role of ['member', 'instructor'] as const) {
    it(`a signed-in ${role} is refused with 403 on every route`, async () => {
      const { station } = await createStation(ctx);
      const client = await signedIn(ctx, role);
      for (const res of [
        await client.get('/api/stations'),
        await client.post('/api/stations', { machineId: (await createMachine(ctx.db)).id }),
        await client.post(`/api/stations/${station.id}/revoke`),
        await client.post(`/api/stations/${station.id}/pairing-code`),
      ]) {
        expect(res.status).toBe(403);
        expect(res.body.code).toBe('forbidden');
      }
      const row = await ctx.db('stations').first('revoked_at').where({ id: station.id });
      expect(row.revoked_at).toBeNull();
    });
  }
});

describe('POST /api/stations', () => {
  it('creates a machine station named after its machine, with a code valid for 10 minutes', async () => {
    const admin = await signedIn(ctx, 'admin');
    const machine = await createMachine(ctx.db, { name: `Lathe ${randomUUID().slice(0, 6)}` });
    const before = Date.now();

    const res = await admin.post('/api/stations', { machineId: machine.id });

    expect(res.status).toBe(201);
    const station = stationWithCodeSchema.parse(res.body);
    expect(station).toMatchObject({ kind: 'machine', name: machine.name, machine: { id: machine.id, name: machine.name }, pairedAt: null, lastSeenAt: null, revokedAt: null });
    expect(station.pairingCode).toMatch(codePattern);
    const expires = Date.parse(station.pairingExpiresAt!);
    expect(expires - before).toBeGreaterThanOrEqual(10 * 60_000 - 1_000);
    expect(expires - Date.now()).toBeLessThanOrEqual(10 * 60_000);
  });

  it('keeps only a hash of the code, never the code itself', async () => {
    const { station } = await createStation(ctx);
    const row = await ctx.db('stations').first('*').where({ id: station.id });
    expect(row.pairing_code_hash).toBe(pairingCodeHash(ctx.config.SESSION_SECRET, station.pairingCode));
    expect(JSON.stringify(row)).not.toContain(station.pairingCode);
  });

  it('records station.created in the audit log with the admin as actor', async () => {
    const { admin, station } = await createStation(ctx);
    const entry = await ctx.db('audit_log').first('*').where({ action: 'station.created', entity_id: station.id });
    expect(entry).toMatchObject({ actor_id: admin.member.id, entity: 'station' });
    expect(entry.details).toMatchObject({ kind: 'machine', name: station.name });
  });

  it('creates a crib station and a board without a machine, with a name of their own or a default', async () => {
    const admin = await signedIn(ctx, 'admin');
    const crib = await admin.post('/api/stations', { kind: 'crib' });
    const board = await admin.post('/api/stations', { kind: 'board', name: 'Welding bay board' });
    expect(crib.status).toBe(201);
    expect(crib.body).toMatchObject({ kind: 'crib', name: 'Tool crib', machine: null });
    expect(board.body).toMatchObject({ kind: 'board', name: 'Welding bay board', machine: null });
  });

  it('an unknown machine answers 404 machine_not_found; a machine station without one answers 400', async () => {
    const admin = await signedIn(ctx, 'admin');
    const unknown = await admin.post('/api/stations', { machineId: randomUUID() });
    expect(unknown.status).toBe(404);
    expect(unknown.body.code).toBe('machine_not_found');
    const missing = await admin.post('/api/stations', {});
    expect(missing.status).toBe(400);
    expect(missing.body.errors.machineId).toBeDefined();
  });
});

describe('GET /api/stations', () => {
  it('lists stations with their last contact, which pairing sets', async () => {
    const { admin, station } = await createStation(ctx);
    const before = stationListSchema.parse((await admin.get('/api/stations')).body).find((s) => s.id === station.id);
    expect(before).toMatchObject({ lastSeenAt: null, pairedAt: null });
    expect(before).not.toHaveProperty('pairingCode');

    const device = await browser(ctx);
    await device.post('/api/station/pair', { pairingCode: station.pairingCode });

    const after = stationListSchema.parse((await admin.get('/api/stations')).body).find((s) => s.id === station.id);
    expect(after?.lastSeenAt).not.toBeNull();
    expect(after?.pairedAt).not.toBeNull();
    expect(after?.pairingExpiresAt).toBeNull();
  });
});

describe('POST /api/stations/:id/revoke', () => {
  it('revokes the station, records station.revoked, and a second revoke answers 409', async () => {
    const { admin, station } = await createStation(ctx);

    const res = await admin.post(`/api/stations/${station.id}/revoke`);

    expect(res.status).toBe(200);
    expect(res.body.revokedAt).not.toBeNull();
    expect(res.body.pairingExpiresAt).toBeNull();
    const entry = await ctx.db('audit_log').first('actor_id').where({ action: 'station.revoked', entity_id: station.id });
    expect(entry.actor_id).toBe(admin.member.id);
    const again = await admin.post(`/api/stations/${station.id}/revoke`);
    expect(again.status).toBe(409);
    expect(again.body.code).toBe('already_revoked');
  });

  it('the open code of a revoked station no longer pairs', async () => {
    const { admin, station } = await createStation(ctx);
    await admin.post(`/api/stations/${station.id}/revoke`);
    const res = await (await browser(ctx)).post('/api/station/pair', { pairingCode: station.pairingCode });
    expect(res.status).toBe(400);
    expect(res.body.code).toBe('invalid_pairing_code');
  });

  it('an unknown station answers 404 station_not_found', async () => {
    const admin = await signedIn(ctx, 'admin');
    const res = await admin.post(`/api/stations/${randomUUID()}/revoke`);
    expect(res.status).toBe(404);
    expect(res.body.code).toBe('station_not_found');
  });
});

describe('POST /api/stations/:id/pairing-code', () => {
  it('gives a new code and the old one stops working', async () => {
    const { admin, station } = await createStation(ctx);

    const res = await admin.post(`/api/stations/${station.id}/pairing-code`);

    expect(res.status).toBe(200);
    const renewed = stationWithCodeSchema.parse(res.body);
    expect(renewed.pairingCode).toMatch(codePattern);
    expect(renewed.pairingCode).not.toBe(station.pairingCode);
    const old = await (await browser(ctx)).post('/api/station/pair', { pairingCode: station.pairingCode });
    expect(old.status).toBe(400);
    const fresh = await (await browser(ctx)).post('/api/station/pair', { pairingCode: renewed.pairingCode });
    expect(fresh.status).toBe(200);
  });

  it('for an unknown station answers 404', async () => {
    const admin = await signedIn(ctx, 'admin');
    const res = await admin.post(`/api/stations/${randomUUID()}/pairing-code`);
    expect(res.status).toBe(404);
  });

  it('a bad id answers 400 naming it', async () => {
    const res = await (await signedIn(ctx, 'admin')).post('/api/stations/not-an-id/pairing-code');
    expect(res.status).toBe(400);
    expect(res.body.errors.id).toBeDefined();
  });
});
