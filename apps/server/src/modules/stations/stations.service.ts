import { createHmac, randomInt } from 'node:crypto';
import {
  PAIRING_ALPHABET,
  PAIRING_CODE_LENGTH,
  PAIRING_MINUTES,
  type Station,
  type StationCreate,
  type StationWithCode,
} from '@chuckkey/core';
import type { Deps } from '../../lib/deps';
import { conflict, notFound } from '../../lib/errors';
import { auditLog } from '../audit/audit.repository';
import { stationsRepository, toStation } from './stations.repository';

/** 8 characters drawn uniformly (crypto.randomInt) from 31 symbols: about 40 bits. */
export function newPairingCode(): string {
  let code = '';
  for (let i = 0; i < PAIRING_CODE_LENGTH; i += 1) code += PAIRING_ALPHABET[randomInt(PAIRING_ALPHABET.length)];
  return code;
}

/**
 * A pairing code is short enough to type, so a plain SHA-256 of it could be reversed from a
 * database dump by trying every code; keyed with the server's secret, the dump alone is useless.
 */
export function pairingCodeHash(secret: string, code: string): string {
  return createHmac('sha256', secret).update(`station-pairing:${code}`).digest('hex');
}

const defaultNames = { crib: 'Tool crib', board: 'Board' } as const;

const stationNotFound = () => notFound('station_not_found', 'There is no station with that id.');

export function stationsService({ config, db, live }: Deps) {
  const stations = stationsRepository(db);

  function issueCode(): { code: string; hash: string; expiresAt: Date } {
    const code = newPairingCode();
    return { code, hash: pairingCodeHash(config.SESSION_SECRET, code), expiresAt: new Date(Date.now() + PAIRING_MINUTES * 60_000) };
  }

  async function load(id: string): Promise<Station> {
    const row = await stations.findById(id);
    if (!row) throw stationNotFound();
    return toStation(row);
  }

  return {
    async list(): Promise<Station[]> {
      return (await stations.list()).map(toStation);
    },

    async create(actor: Express.User, input: StationCreate): Promise<StationWithCode> {
      const kind = input.kind ?? 'machine';
      let machineId: string | null = null;
      let name = input.name?.trim() ?? '';
      if (kind === 'machine') {
        const machine = input.machineId ? await stations.findMachine(input.machineId) : undefined;
        if (!machine) throw notFound('machine_not_found', 'There is no machine with that id.');
        machineId = machine.id;
        name ||= machine.name;
      } else {
        name ||= defaultNames[kind];
      }
      const code = issueCode();
      const id = await db.transaction(async (trx) => {
        const created = await stationsRepository(trx).create({
          kind,
          machineId,
          name,
          pairingCodeHash: code.hash,
          pairingExpiresAt: code.expiresAt,
          createdBy: actor.id,
        });
        await auditLog(trx).record({ actorId: actor.id, action: 'station.created', entity: 'station', entityId: created, details: { kind, name, machineId } });
        return created;
      });
      return { ...(await load(id)), pairingCode: code.code };
    },

    /** A new code for this station; pairing a device with it replaces the device paired before. */
    async newPairingCode(id: string): Promise<StationWithCode> {
      const code = issueCode();
      if (!(await stations.setPairingCode(id, code.hash, code.expiresAt))) throw stationNotFound();
      return { ...(await load(id)), pairingCode: code.code };
    },

    async revoke(actor: Express.User, id: string): Promise<Station> {
      const revoked = await db.transaction(async (trx) => {
        const repository = stationsRepository(trx);
        const existing = await repository.findById(id);
        if (!existing) throw stationNotFound();
        if (!(await repository.revoke(id))) throw conflict('already_revoked', 'This station was already revoked.');
        await auditLog(trx).record({ actorId: actor.id, action: 'station.revoked', entity: 'station', entityId: id, details: { name: existing.name } });
        return existing;
      });
      live.stationRevoked(id);
      // A machine without a reporting station is no longer offline because of this one.
      if (revoked.machineId) live.machineChanged(revoked.machineId);
      return load(id);
    },
  };
}
export type StationsService = ReturnType<typeof stationsService>;
