import type { ClearanceSignOff, ReservationKind, ReservationRules, ReservationRulesInput, ReservationStatus } from '@chuckkey/core';
import type { Knex } from 'knex';
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

export interface ReservationMailRecord extends ReservationRecord {
  machineName: string;
  memberEmail: string;
  memberFirstName: string;
  memberLastName: string;
}

export interface ReservationListFilters {
  from?: Date;
  to?: Date;
  machineId?: string;
  status?: ReservationStatus;
}

export interface ReservationListRecord {
  id: string;
  machineId: string;
  machineName: string;
  memberId: string;
  memberFirstName: string;
  memberLastName: string;
  startsAt: Date;
  endsAt: Date;
  status: ReservationStatus;
  kind: ReservationKind;
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

/** Narrows a query over `reservations as r`; a time range keeps the reservations that overlap it. */
function filtered(query: Knex.QueryBuilder, filters: ReservationListFilters): Knex.QueryBuilder {
  if (filters.from) query.where('r.ends_at', '>', filters.from);
  if (filters.to) query.where('r.starts_at', '<', filters.to);
  if (filters.machineId) query.where('r.machine_id', filters.machineId);
  if (filters.status) query.where('r.status', filters.status);
  return query;
}

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

    /** Gives the rest of a checked-in reservation back at `at`; call on a row locked in the same transaction. */
    async release(id: string, at: Date): Promise<ReservationRecord> {
      const [row] = await db('reservations')
        .where({ id, status: 'checked_in' })
        .update({ status: 'released', released_at: at })
        .returning<ReservationRecord[]>(returning);
      if (!row) throw new Error(`reservation ${id} was not checked in while locked`);
      return row;
    },

    /**
     * Locks the member's own checked-in reservation on the machine that has not ended at `at`, if
     * there is one; a class hold is the shop's time, not the instructor's to give back.
     */
    async checkedInRunningForUpdate(machineId: string, memberId: string, at: Date): Promise<ReservationRecord | undefined> {
      return db('reservations')
        .first<ReservationRecord | undefined>(columns)
        .where({ machine_id: machineId, member_id: memberId, status: 'checked_in', kind: 'member' })
        .where('ends_at', '>', at)
        .orderBy('starts_at')
        .forUpdate();
    },

    /**
     * The member's reservations, and the meetings of classes they are booked into, with the
     * machines' names and the classes' titles, newest start first, at most `limit`.
     */
    async ofMember(memberId: string, limit: number): Promise<(ReservationRecord & { machineName: string; classTitle: string | null })[]> {
      return db('reservations as r')
        .join('machines as m', 'm.id', 'r.machine_id')
        .leftJoin('classes as c', 'c.id', 'r.class_id')
        .where((mine) => {
          mine.where('r.member_id', memberId).orWhereIn('r.class_id', db('class_members').where({ member_id: memberId }).select('class_id'));
        })
        .orderBy('r.starts_at', 'desc')
        .limit(limit)
        .select({ ...Object.fromEntries(Object.entries(columns).map(([alias, column]) => [alias, `r.${column}`])), machineName: 'm.name', classTitle: 'c.title' });
    },

    /**
     * Marks every member's reservation not checked into by its start plus the machine's no-show
     * grace as a no-show, in one statement: the time is free again, and a repeated run finds nothing.
     */
    async releaseNoShows(now: Date): Promise<{ id: string; machineId: string; memberId: string }[]> {
      return db('reservations as r')
        .update({ status: 'no_show' })
        .updateFrom('machines as m')
        .whereRaw('m.id = r.machine_id')
        .where({ 'r.status': 'active', 'r.kind': 'member' })
        .whereRaw("r.starts_at + make_interval(mins => m.no_show_grace_minutes) <= ?", [now])
        .returning(['r.id as id', 'r.machine_id as machineId', 'r.member_id as memberId']);
    },

    /** Machines where an active reservation's check-in window opened, or the reservation ended, in (after, until]. */
    async machinesTurning(after: Date, until: Date): Promise<string[]> {
      const rows: { machineId: string }[] = await db('reservations as r')
        .join('machines as m', 'm.id', 'r.machine_id')
        .where('r.status', 'active')
        .where((turn) => {
          turn
            .where((opening) => {
              opening.whereRaw('r.starts_at - make_interval(mins => m.check_in_minutes) > ?', [after]).whereRaw('r.starts_at - make_interval(mins => m.check_in_minutes) <= ?', [until]);
            })
            .orWhere((ending) => {
              ending.where('r.ends_at', '>', after).where('r.ends_at', '<=', until);
            });
        })
        .distinct({ machineId: 'r.machine_id' });
      return rows.map((row) => row.machineId);
    },

    /** Members' active reservations starting within `lead` of now that have had no reminder, booked before that lead began. */
    async dueReminders(now: Date, leadMs: number): Promise<string[]> {
      const until = new Date(now.getTime() + leadMs);
      const rows: { id: string }[] = await db('reservations')
        .where({ status: 'active', kind: 'member' })
        .whereNull('reminded_at')
        .where('starts_at', '>', now)
        .where('starts_at', '<=', until)
        .whereRaw('created_at < starts_at - ?::interval', [`${leadMs / 1000} seconds`])
        .orderBy('starts_at')
        .select('id');
      return rows.map((row) => row.id);
    },

    /** Claims the reminder; false when another run took it first or the reservation is no longer active. */
    async claimReminder(id: string, now: Date): Promise<boolean> {
      const claimed = await db('reservations').where({ id, status: 'active' }).whereNull('reminded_at').update({ reminded_at: now });
      return claimed === 1;
    },

    /** All reservations matching the filters (a time range keeps those overlapping it), earliest start first, with the total. */
    async list(filters: ReservationListFilters, page: { limit: number; offset: number }): Promise<{ items: ReservationListRecord[]; total: number }> {
      const query = filtered(db('reservations as r').join('machines as m', 'm.id', 'r.machine_id').join('members as p', 'p.id', 'r.member_id'), filters);
      const rows: (ReservationListRecord & { total: string | number })[] = await query
        .orderBy([{ column: 'r.starts_at' }, { column: 'r.id' }])
        .limit(page.limit)
        .offset(page.offset)
        .select({
          id: 'r.id',
          machineId: 'r.machine_id',
          machineName: 'm.name',
          memberId: 'r.member_id',
          memberFirstName: 'p.first_name',
          memberLastName: 'p.last_name',
          startsAt: 'r.starts_at',
          endsAt: 'r.ends_at',
          status: 'r.status',
          kind: 'r.kind',
          total: db.raw('count(*) over ()'),
        });
      // Past the last page no row carries the total, so it is counted on its own.
      const total = rows[0]?.total ?? (page.offset > 0 ? await this.count(filters) : 0);
      return { items: rows.map(({ total: _total, ...row }) => row), total: Number(total) };
    },

    async count(filters: ReservationListFilters): Promise<number> {
      const query = filtered(db('reservations as r'), filters);
      const [row] = await query.count({ n: '*' });
      return Number(row?.n ?? 0);
    },

    /** The reservation with what its mails name: the machine and the member who holds it. */
    async forMail(id: string): Promise<ReservationMailRecord | undefined> {
      return db('reservations as r')
        .join('machines as m', 'm.id', 'r.machine_id')
        .join('members as p', 'p.id', 'r.member_id')
        .where('r.id', id)
        .first<ReservationMailRecord | undefined>({
          ...Object.fromEntries(Object.entries(columns).map(([alias, column]) => [alias, `r.${column}`])),
          machineName: 'm.name',
          memberEmail: 'p.email',
          memberFirstName: 'p.first_name',
          memberLastName: 'p.last_name',
        });
    },

    /** Live claims on the machine whose time with its buffer touches [from, to), earliest first. */
    async taken(machineId: string, from: Date, to: Date): Promise<{ startsAt: Date; endsAt: Date; blockedUntil: Date; kind: ReservationKind; classTitle: string | null }[]> {
      return db('reservations as r')
        .leftJoin('classes as c', 'c.id', 'r.class_id')
        .where({ 'r.machine_id': machineId })
        .whereIn('r.status', LIVE)
        .where('r.starts_at', '<', to)
        .where('r.blocked_until', '>', from)
        .orderBy('r.starts_at')
        .select({ startsAt: 'r.starts_at', endsAt: 'r.ends_at', blockedUntil: 'r.blocked_until', kind: 'r.kind', classTitle: 'c.title' });
    },
  };
}
