import type { ClearanceSignOff, ReservationKind, ReservationRules, ReservationRulesInput, ReservationStatus } from '@chuckkey/core';
import type { Db } from '../../lib/db';

export interface ReservationRecord {
  id: string;
  machineId: string;
  memberId: string;
  startsAt: Date;
  endsAt: Date;
  blockedUntil: Date;
  status: ReservationStatus;
  kind: ReservationKind;
  createdAt: Date;
  cancelledAt: Date | null;
  checkedInAt: Date | null;
}

export interface MachineBookingRecord {
  id: string;
  name: string;
  reservable: boolean;
  rules: ReservationRules;
}

const columns = {
  id: 'id',
  machineId: 'machine_id',
  memberId: 'member_id',
  startsAt: 'starts_at',
  endsAt: 'ends_at',
  blockedUntil: 'blocked_until',
  status: 'status',
  kind: 'kind',
  createdAt: 'created_at',
  cancelledAt: 'cancelled_at',
  checkedInAt: 'checked_in_at',
} as const;

const returning = Object.entries(columns).map(([alias, column]) => `${column} as ${alias}`);

const ruleColumns = {
  slotMinutes: 'slot_minutes',
  maxMinutes: 'max_minutes',
  bufferMinutes: 'buffer_minutes',
  horizonDays: 'horizon_days',
  weeklyQuotaMinutes: 'weekly_quota_minutes',
  checkInMinutes: 'check_in_minutes',
  noShowGraceMinutes: 'no_show_grace_minutes',
  noShowLimit: 'no_show_limit',
  noShowWindowDays: 'no_show_window_days',
  suspensionDays: 'suspension_days',
} as const;

/** Claims that hold the machine: the exclusion constraint judges only these. */
const LIVE = ['active', 'checked_in'] as const;

/** Pass a transaction as `db` to make several calls one change. */
export function reservationsRepository(db: Db) {
  return {
    async machine(machineId: string): Promise<MachineBookingRecord | undefined> {
      const row = await db('machines')
        .first<(Omit<MachineBookingRecord, 'rules'> & ReservationRules) | undefined>({ id: 'id', name: 'name', reservable: 'reservable', ...ruleColumns })
        .where({ id: machineId });
      if (!row) return undefined;
      const { id, name, reservable, ...rules } = row;
      return { id, name, reservable, rules };
    },

    /** Holds the machine's row until the transaction ends, so two changes of its rules run one after the other. */
    async machineForUpdate(machineId: string): Promise<MachineBookingRecord | undefined> {
      await db('machines').where({ id: machineId }).forUpdate().first('id');
      return this.machine(machineId);
    },

    async updateRules(machineId: string, input: ReservationRulesInput): Promise<void> {
      const { reservable, ...rules } = input;
      const update: Record<string, unknown> = { reservable };
      for (const [key, column] of Object.entries(ruleColumns)) update[column] = rules[key as keyof ReservationRules];
      await db('machines').where({ id: machineId }).update(update);
    },

    /** Holds the member's row until the transaction ends, so one member's bookings are judged one after another (the weekly quota). */
    async lockMember(memberId: string): Promise<void> {
      await db('members').where({ id: memberId }).forUpdate().first('id');
    },

    /** The machine's active required trainings, by name. */
    async requiredTrainings(machineId: string): Promise<{ id: string; name: string }[]> {
      return db('machine_trainings as mt')
        .join('trainings as t', 't.id', 'mt.training_id')
        .where({ 'mt.machine_id': machineId, 't.active': true })
        .orderBy('t.name')
        .select({ id: 't.id', name: 't.name' });
    },

    async signOffs(memberId: string, trainingIds: readonly string[]): Promise<ClearanceSignOff[]> {
      if (trainingIds.length === 0) return [];
      return db('sign_offs')
        .where({ member_id: memberId })
        .whereIn('training_id', trainingIds)
        .select({ trainingId: 'training_id', level: 'level', expiresAt: 'expires_at', revokedAt: 'revoked_at' });
    },

    /** The member's own live claims on the machine that overlap [from, to); a class they hold is the shop's time, not theirs. */
    async memberClaims(machineId: string, memberId: string, from: Date, to: Date): Promise<{ start: Date; end: Date }[]> {
      return db('reservations')
        .where({ machine_id: machineId, member_id: memberId, kind: 'member' })
        .whereIn('status', LIVE)
        .where('starts_at', '<', to)
        .where('ends_at', '>', from)
        .select({ start: 'starts_at', end: 'ends_at' });
    },

    /** Starts of the member's no-shows on the machine since `since`. */
    async noShowsSince(machineId: string, memberId: string, since: Date): Promise<Date[]> {
      const rows: { startsAt: Date }[] = await db('reservations')
        .where({ machine_id: machineId, member_id: memberId, status: 'no_show' })
        .where('starts_at', '>=', since)
        .select({ startsAt: 'starts_at' });
      return rows.map((row) => row.startsAt);
    },

    /** Fails with SQLSTATE 23P01 when the claim overlaps a live one on the machine. */
    async insert(reservation: { machineId: string; memberId: string; start: Date; end: Date; blockedUntil: Date }): Promise<ReservationRecord> {
      const [row] = await db('reservations')
        .insert({
          machine_id: reservation.machineId,
          member_id: reservation.memberId,
          starts_at: reservation.start,
          ends_at: reservation.end,
          blocked_until: reservation.blockedUntil,
        })
        .returning<ReservationRecord[]>(returning);
      if (!row) throw new Error('reservation insert returned no row');
      return row;
    },

    /** Locks the reservation until the transaction ends, so a cancellation and a check-in run one after the other. */
    async findForUpdate(id: string): Promise<ReservationRecord | undefined> {
      return db('reservations').first<ReservationRecord | undefined>(columns).where({ id }).forUpdate();
    },

    async cancel(id: string): Promise<ReservationRecord> {
      const [row] = await db('reservations')
        .where({ id })
        .update({ status: 'cancelled', cancelled_at: db.fn.now() })
        .returning<ReservationRecord[]>(returning);
      if (!row) throw new Error(`reservation ${id} vanished while locked`);
      return row;
    },

    /** The member's reservations with their machines' names, newest start first, at most `limit`. */
    async ofMember(memberId: string, limit: number): Promise<(ReservationRecord & { machineName: string })[]> {
      return db('reservations as r')
        .join('machines as m', 'm.id', 'r.machine_id')
        .where('r.member_id', memberId)
        .orderBy('r.starts_at', 'desc')
        .limit(limit)
        .select({ ...Object.fromEntries(Object.entries(columns).map(([alias, column]) => [alias, `r.${column}`])), machineName: 'm.name' });
    },

    /** Live claims on the machine whose time with its buffer touches [from, to), earliest first. */
    async taken(machineId: string, from: Date, to: Date): Promise<{ startsAt: Date; endsAt: Date; blockedUntil: Date; kind: ReservationKind }[]> {
      return db('reservations')
        .where({ machine_id: machineId })
        .whereIn('status', LIVE)
        .where('starts_at', '<', to)
        .where('blocked_until', '>', from)
        .orderBy('starts_at')
        .select({ startsAt: 'starts_at', endsAt: 'ends_at', blockedUntil: 'blocked_until', kind: 'kind' });
    },
  };
}
