import type { MachineCategory, Station } from '@chuckkey/core';
import type { Db } from '../../lib/db';
import { preparedRows } from '../../lib/prepared';

type StationKind = Station['kind'];

export interface StationRecord {
  id: string;
  kind: StationKind;
  name: string;
  machineId: string | null;
  machineName: string | null;
  machineCategory: MachineCategory | null;
  machineRequiresPin: boolean | null;
  pairedAt: Date | null;
  lastSeenAt: Date | null;
  revokedAt: Date | null;
  pairingExpiresAt: Date | null;
}

const columns = {
  id: 'stations.id',
  kind: 'stations.kind',
  name: 'stations.name',
  machineId: 'stations.machine_id',
  machineName: 'machines.name',
  machineCategory: 'machines.category',
  machineRequiresPin: 'machines.requires_pin',
  pairedAt: 'stations.paired_at',
  lastSeenAt: 'stations.last_seen_at',
  revokedAt: 'stations.revoked_at',
  pairingExpiresAt: 'stations.pairing_expires_at',
} as const;

const STATION_BY_DEVICE_TOKEN_SQL = `
select ${Object.entries(columns).map(([alias, column]) => `${column} as "${alias}"`).join(', ')}
from stations left join machines on machines.id = stations.machine_id
where stations.device_token_hash = $1`;

const iso = (date: Date | null) => (date ? date.toISOString() : null);

export function toStation(row: StationRecord): Station {
  return {
    id: row.id,
    kind: row.kind,
    name: row.name,
    machine: row.machineId && row.machineName ? { id: row.machineId, name: row.machineName } : null,
    pairedAt: iso(row.pairedAt),
    lastSeenAt: iso(row.lastSeenAt),
    revokedAt: iso(row.revokedAt),
    pairingExpiresAt: iso(row.pairingExpiresAt),
  };
}

export interface NewStation {
  kind: StationKind;
  machineId: string | null;
  name: string;
  pairingCodeHash: string;
  pairingExpiresAt: Date;
  createdBy: string;
}

export function stationsRepository(db: Db) {
  const selectStations = () =>
    db('stations').leftJoin('machines', 'machines.id', 'stations.machine_id').select<StationRecord[]>(columns);

  return {
    async findMachine(id: string): Promise<{ id: string; name: string } | undefined> {
      return db('machines').first('id', 'name').where({ id });
    },

    async create(station: NewStation): Promise<string> {
      const [row] = await db('stations')
        .insert({
          kind: station.kind,
          machine_id: station.machineId,
          name: station.name,
          pairing_code_hash: station.pairingCodeHash,
          pairing_expires_at: station.pairingExpiresAt,
          created_by: station.createdBy,
        })
        .returning<{ id: string }[]>('id');
      if (!row) throw new Error('station insert returned no row');
      return row.id;
    },

    async findById(id: string): Promise<StationRecord | undefined> {
      const [row] = await selectStations().where('stations.id', id);
      return row;
    },

    /** Asked on every station request, so prepared once per connection (lib/prepared). */
    async findByDeviceTokenHash(hash: string): Promise<StationRecord | undefined> {
      const [row] = await preparedRows<StationRecord>(db, 'station_by_device_token', STATION_BY_DEVICE_TOKEN_SQL, [hash]);
      return row;
    },

    async list(): Promise<StationRecord[]> {
      return selectStations().orderByRaw('stations.revoked_at is not null').orderBy('stations.name').orderBy('stations.created_at');
    },

    /** Replaces any open pairing code; a device already paired keeps working until the new code is used. */
    async setPairingCode(id: string, pairingCodeHash: string, pairingExpiresAt: Date): Promise<boolean> {
      const updated = await db('stations').where({ id }).update({ pairing_code_hash: pairingCodeHash, pairing_expires_at: pairingExpiresAt });
      return updated > 0;
    },

    /**
     * Uses a pairing code in one statement, so two devices racing with the same code cannot both
     * win; the code is gone afterwards. Returns the paired station's id and machine.
     */
    async pair(pairingCodeHash: string, deviceTokenHash: string): Promise<{ id: string; machineId: string | null } | undefined> {
      const [row] = await db('stations')
        .where({ pairing_code_hash: pairingCodeHash })
        .where('pairing_expires_at', '>', db.fn.now())
        .update({
          device_token_hash: deviceTokenHash,
          pairing_code_hash: null,
          pairing_expires_at: null,
          paired_at: db.fn.now(),
          last_seen_at: db.fn.now(),
          revoked_at: null,
          silence_reported_at: null,
        })
        .returning<{ id: string; machineId: string | null }[]>(['id', 'machine_id as machineId']);
      return row;
    },

    /** Forgets the device token and any open code, so the device is refused from its next request. */
    async revoke(id: string): Promise<boolean> {
      const updated = await db('stations')
        .where({ id })
        .whereNull('revoked_at')
        .update({ revoked_at: db.fn.now(), device_token_hash: null, pairing_code_hash: null, pairing_expires_at: null });
      return updated > 0;
    },

    /** Records a contact; a silence announced before is over. */
    async touch(id: string): Promise<Date> {
      const [row] = await db('stations')
        .where({ id })
        .update({ last_seen_at: db.fn.now(), silence_reported_at: null })
        .returning<{ last_seen_at: Date }[]>('last_seen_at');
      return row?.last_seen_at ?? new Date();
    },

    /**
     * Marks the paired machine stations not heard from since `cutoff` whose silence was not
     * announced yet, and answers their machines: each silence is announced once, whichever
     * process runs the job.
     */
    async markSilent(cutoff: Date): Promise<string[]> {
      const rows = await db('stations')
        .where({ kind: 'machine' })
        .whereNotNull('device_token_hash')
        .whereNull('revoked_at')
        .whereNull('silence_reported_at')
        .where('last_seen_at', '<', cutoff)
        .update({ silence_reported_at: db.fn.now() })
        .returning<{ machine_id: string }[]>('machine_id');
      return [...new Set(rows.map((row) => row.machine_id))];
    },

    async recordPinAttempt(stationId: string, memberId: string, succeeded: boolean): Promise<void> {
      await db('station_pin_attempts').insert({ station_id: stationId, member_id: memberId, succeeded });
    },

    /**
     * Wrong PINs in the window, at this station and by this instructor anywhere, each counted
     * since the last right PIN there, so that a slip followed by success does not add up.
     */
    async recentPinFailures(stationId: string, memberId: string, windowMinutes: number): Promise<{ station: number; member: number }> {
      const since = db.raw(`now() - make_interval(mins => ?)`, [windowMinutes]);
      const count = async (column: 'station_id' | 'member_id', value: string) => {
        const lastSuccess = db('station_pin_attempts').max('attempted_at').where({ [column]: value, succeeded: true });
        const [row] = await db('station_pin_attempts')
          .where({ [column]: value, succeeded: false })
          .where('attempted_at', '>', since)
          .where('attempted_at', '>', db.raw(`coalesce((?), '-infinity'::timestamptz)`, [lastSuccess]))
          .count<{ count: string }[]>({ count: '*' });
        return Number(row?.count ?? 0);
      };
      return { station: await count('station_id', stationId), member: await count('member_id', memberId) };
    },

    async hasPin(memberId: string): Promise<boolean> {
      const row = await db('members').first('pin_hash').where({ id: memberId });
      return Boolean(row?.pin_hash);
    },
  };
}
export type StationsRepository = ReturnType<typeof stationsRepository>;
