import { OPENING_LOOKAHEAD_DAYS, type ChecklistItem, type ClosureDays, type MachineCategory, type Role, type SignOffLevel, type WeeklyHours } from '@chuckkey/core';
import type { Db } from '../../lib/db';
import { preparedRows } from '../../lib/prepared';
import { openTagOutJson, runningSessionJson, SUPERVISOR_ON_DUTY_JSON } from '../machines/machine-live.sql';
import { closuresJson, WEEKLY_HOURS_JSON } from '../shop/shop-hours.sql';
import type { StationRecord } from '../stations/stations.repository';

export type EndedBy = 'member' | 'supervisor' | 'admin' | 'heartbeat' | 'next_member';

/** What one scan at a machine needs to know, read in a single round trip. */
export interface ScanFacts {
  /** The shop's IANA time zone, for the times in the messages. */
  timeZone: string;
  machine: {
    id: string;
    name: string;
    category: MachineCategory;
    requiresPin: boolean;
    safetyChecklist: ChecklistItem[];
    checkInMinutes: number;
    noShowGraceMinutes: number;
  };
  /** The machine's open tag-out (rule 4). */
  taggedOut: { reason: string; since: Date } | null;
  /** The machine's active blocking maintenance tasks past due at the scan's instant, by name (rule 4). */
  overdueBlockingTasks: { name: string }[];
  member: { id: string; firstName: string; role: Role; active: boolean; waiverOnFile: boolean; hasPhoto: boolean } | null;
  /** `nextClass`: the start of the soonest class meeting teaching the training, on any machine. */
  requiredTrainings: { id: string; name: string; teachers: string[]; nextClass: Date | null }[];
  signOffs: { trainingId: string; level: SignOffLevel; expiresAt: Date | null; revokedAt: Date | null }[];
  supervisorOnDuty: { firstName: string } | null;
  runningSession: { id: string; memberId: string; memberFirstName: string; startedAt: Date } | null;
  /** The shop's weekly opening hours, wall-clock 'HH:MM' in its time zone; none set means open at all times. */
  weeklyHours: WeeklyHours[];
  /** Closures around today, 'YYYY-MM-DD' in the shop's calendar. */
  closures: ClosureDays[];
  /**
   * The machine's live reservations (active or checked in) that overlap from `now` minus the
   * machine's no-show grace to `now` plus its check-in window, earliest first (rule 6, check-in).
   */
  reservations: ScanReservation[];
  /** The shop's rule 8 policy: days a crib tool may be overdue before machines refuse; null is off. */
  overdueCheckoutBlockDays: number | null;
  /** The member's tools out past their due time at the scan's instant, soonest due first; empty while the policy is off. */
  overdueCheckouts: { itemName: string; dueAt: Date }[];
}

export interface ScanReservation {
  id: string;
  memberId: string;
  memberFirstName: string;
  startsAt: Date;
  endsAt: Date;
  status: 'active' | 'checked_in';
  /** A class hold whose class the scanning member is booked into. */
  bookedInClass: boolean;
}

export interface SessionRecord {
  id: string;
  machineId: string;
  memberId: string;
  stationId: string | null;
  startedAt: Date;
  endedAt: Date | null;
  endedBy: EndedBy | null;
  endIdempotencyKey: string | null;
  hours: number | null;
}

/**
 * Closures read for a scan: those touching the days from yesterday to this many days ahead of the
 * database's date. That spans the days shopHoursAt looks at (the shop's today and 15 after), with a
 * day to spare either side, since the shop's date may be a day off the database's.
 */
const CLOSURE_DAYS_AHEAD = OPENING_LOOKAHEAD_DAYS + 2;

/** Instructors named as teachers of a training: those who signed it off in this many months. */
export const TEACHER_RECENT_MONTHS = 24;
export const TEACHERS_NAMED = 3;

/*
 * One statement: the member behind the badge hash (active badge only), whether they accepted the
 * current waiver version, the machine's active required trainings with the first names of up to
 * three instructors who signed each off lately, the member's sign-offs for those trainings in any
 * state, a supervisor on duty, the machine's running session and open tag-out (rule 4), and the
 * shop's weekly hours and the closures around today (rule 7), and the machine's live reservations
 * near $5, the scan's instant (rule 6 and check-in), the machine's blocking maintenance tasks past due
 * at $5 (rule 4), and the shop's overdue-tool policy with, while it is on, the
 * member's crib tools out past their due time at $5 (rule 8). With no badge hash (null) the member parts come back empty. The
 * shop's time zone comes along for the wording of times and for deciding whether the shop is open.
 *
 * Two forms: by machine id, and by a station's device token hash, which also answers the station
 * (so a scan is a single round trip: credential, machine and member at once). Parameters are $1
 * (machine id or device token hash), $2 (badge code hash), $3 (months a teacher counts as
 * recent), $4 (teachers named) and $5 (now). Both run as prepared statements: planning this text costs
 * more than running it.
 */
function factsSql(by: 'machine' | 'station'): string {
  const station =
    by === 'station'
      ? `station as (
  select st.id, st.kind, st.name, st.machine_id as "machineId", st.paired_at as "pairedAt",
    st.last_seen_at as "lastSeenAt", st.revoked_at as "revokedAt", st.pairing_expires_at as "pairingExpiresAt"
  from stations st where st.device_token_hash = $1 and st.revoked_at is null
),
`
      : '';
  const machineId = by === 'station' ? '(select "machineId" from station)' : '$1::uuid';
  return `
with ${station}machine as (
  select m.id, m.name, m.category, m.requires_pin as "requiresPin", m.safety_checklist as "safetyChecklist",
    m.check_in_minutes as "checkInMinutes", m.no_show_grace_minutes as "noShowGraceMinutes"
  from machines m where m.id = ${machineId}
),
holder as (
  select p.id, p.first_name as "firstName", p.role, p.active,
    exists (
      select 1 from waiver_records w
      where w.member_id = p.id and w.version = (select max(v.version) from waiver_versions v)
    ) as "waiverOnFile",
    exists (select 1 from member_photos ph where ph.member_id = p.id) as "hasPhoto"
  from badges b join members p on p.id = b.member_id
  where b.code_hash = $2::text and b.revoked_at is null
),
required as (
  select t.id, t.name,
    coalesce((
      select array_agg(recent."firstName" order by recent.latest desc)
      from (
        -- The training's teachers by their latest sign-off of it (kept by a trigger on sign_offs):
        -- the first few entries of one index, however many members the training has signed off.
        select i.first_name as "firstName", tt.last_signed_at as latest
        from training_teachers tt join members i on i.id = tt.member_id
        where tt.training_id = t.id and tt.last_signed_at > now() - make_interval(months => $3::int)
          and i.active and i.role in ('instructor', 'admin')
        order by tt.last_signed_at desc
        limit $4::int
      ) recent
    ), '{}') as teachers,
    (
      -- The soonest meeting still to start of any class teaching this training, on any machine:
      -- per class, the first entry of the partial index of class meetings by start.
      select min(next_meeting.starts_at)
      from classes c
      cross join lateral (
        select r.starts_at from reservations r
        where r.class_id = c.id and r.class_id is not null and r.status in ('active', 'checked_in') and r.starts_at > $5::timestamptz
        order by r.starts_at
        limit 1
      ) next_meeting
      where c.training_id = t.id and c.training_id is not null and c.cancelled_at is null
    ) as "nextClassAt"
  from machine_trainings mt join trainings t on t.id = mt.training_id
  where mt.machine_id = (select id from machine) and t.active
)
select
  ${by === 'station' ? '(select row_to_json(station) from station) as station,\n  ' : ''}(select time_zone from shop where id = 1) as "timeZone",
  (select row_to_json(machine) from machine) as machine,
  (select row_to_json(holder) from holder) as member,
  (select coalesce(json_agg(required order by required.name), '[]') from required) as "requiredTrainings",
  (
    select coalesce(json_agg(json_build_object(
      'trainingId', s.training_id, 'level', s.level, 'expiresAt', s.expires_at, 'revokedAt', s.revoked_at)), '[]')
    from sign_offs s
    where s.member_id = (select id from holder) and s.training_id in (select id from required)
  ) as "signOffs",
  ${SUPERVISOR_ON_DUTY_JSON} as "supervisorOnDuty",
  ${runningSessionJson('(select id from machine)')} as "runningSession",
  ${openTagOutJson('(select id from machine)')} as "taggedOut",
  ${WEEKLY_HOURS_JSON} as "weeklyHours",
  ${closuresJson(CLOSURE_DAYS_AHEAD)} as "closures",
  (
    -- The range test is the one the exclusion constraint's GiST index serves (machine, range), so
    -- this stays a probe of a few rows however many reservations the machine has had.
    select coalesce(json_agg(json_build_object(
      'id', r.id, 'memberId', r.member_id, 'memberFirstName', p.first_name,
      'startsAt', r.starts_at, 'endsAt', r.ends_at, 'status', r.status,
      -- Whether the scanning member is booked into the class this hold is for (rule 6 lets them in).
      'bookedInClass', r.class_id is not null and exists (
        select 1 from class_members cm where cm.class_id = r.class_id and cm.member_id = (select id from holder))
      ) order by r.starts_at), '[]')
    from machine mm
    join reservations r on r.machine_id = mm.id
    join members p on p.id = r.member_id
    where r.status in ('active', 'checked_in')
      and tstzrange(r.starts_at, r.blocked_until) && tstzrange(
        $5::timestamptz - make_interval(mins => mm."noShowGraceMinutes"),
        $5::timestamptz + make_interval(mins => mm."checkInMinutes"), '[]')
      and r.ends_at > $5::timestamptz - make_interval(mins => mm."noShowGraceMinutes")
  ) as "reservations",
  (select overdue_checkout_block_days from shop where id = 1) as "overdueCheckoutBlockDays",
  (
    -- Read only while the shop's policy is on (a one-time test before any row), then a probe of
    -- the partial index of open tools by member: its due times and items, a few entries at most.
    select coalesce(json_agg(json_build_object('itemName', i.name, 'dueAt', c.due_at) order by c.due_at), '[]')
    from crib_checkouts c join crib_items i on i.id = c.item_id
    where (select overdue_checkout_block_days from shop where id = 1) is not null
      and c.member_id = (select id from holder) and c.item_kind = 'tool' and c.returned_at is null
      and c.due_at < $5::timestamptz
  ) as "overdueCheckouts",
  (
    -- Core's maintenanceDue in SQL (a test compares the two): past due is the meter above the last
    -- completion's reading (or the reading when the task was set up) plus the hours, or the shop's
    -- date after the date of that completion (or set-up) plus the days. A machine has a few tasks;
    -- each one's latest completion is the first entry of its index.
    select coalesce(json_agg(json_build_object('name', t.name) order by t.name), '[]')
    from maintenance_tasks t
    join machines m on m.id = t.machine_id
    left join lateral (
      select c.done_at, c.meter_hours from maintenance_completions c
      where c.task_id = t.id order by c.done_at desc, c.id desc limit 1
    ) last on true
    cross join (select time_zone from shop where id = 1) z
    where t.machine_id = (select id from machine) and t.active and t.blocking
      and (
        (t.every_hours is not null and m.meter_hours > coalesce(last.meter_hours, t.start_meter_hours) + t.every_hours)
        or (t.every_days is not null
          and ($5::timestamptz at time zone z.time_zone)::date > (coalesce(last.done_at, t.created_at) at time zone z.time_zone)::date + t.every_days)
      )
  ) as "overdueBlockingTasks"
`;
}

const FACTS_BY_MACHINE_SQL = factsSql('machine');
const FACTS_BY_STATION_SQL = factsSql('station');

interface FactsRow {
  timeZone: string | null;
  machine: ScanFacts['machine'] | null;
  member: ScanFacts['member'];
  requiredTrainings: (Omit<ScanFacts['requiredTrainings'][number], 'nextClass'> & { nextClassAt: string | null })[];
  signOffs: { trainingId: string; level: SignOffLevel; expiresAt: string | null; revokedAt: string | null }[];
  supervisorOnDuty: { firstName: string; lastName: string } | null;
  runningSession: { id: string; memberId: string; firstName: string; lastName: string; startedAt: string } | null;
  taggedOut: { reason: string; since: string } | null;
  weeklyHours: WeeklyHours[];
  closures: ClosureDays[];
  reservations: (Omit<ScanReservation, 'startsAt' | 'endsAt'> & { startsAt: string; endsAt: string })[];
  overdueCheckoutBlockDays: number | null;
  overdueCheckouts: { itemName: string; dueAt: string }[];
  overdueBlockingTasks: { name: string }[];
}

interface StationJson {
  id: string;
  kind: StationRecord['kind'];
  name: string;
  machineId: string | null;
  pairedAt: string | null;
  lastSeenAt: string | null;
  revokedAt: string | null;
  pairingExpiresAt: string | null;
}

const date = (value: string | null) => (value === null ? null : new Date(value));

const factsValues = (key: string, codeHash: string | null, now: Date) => [key, codeHash, TEACHER_RECENT_MONTHS, TEACHERS_NAMED, now];

function toFacts(row: FactsRow, machine: ScanFacts['machine']): ScanFacts {
  return {
    timeZone: row.timeZone ?? 'UTC',
    machine,
    taggedOut: row.taggedOut ? { reason: row.taggedOut.reason, since: new Date(row.taggedOut.since) } : null,
    overdueBlockingTasks: row.overdueBlockingTasks,
    member: row.member,
    requiredTrainings: row.requiredTrainings.map(({ nextClassAt, ...training }) => ({ ...training, nextClass: date(nextClassAt) })),
    signOffs: row.signOffs.map((s) => ({ ...s, expiresAt: date(s.expiresAt), revokedAt: date(s.revokedAt) })),
    supervisorOnDuty: row.supervisorOnDuty ? { firstName: row.supervisorOnDuty.firstName } : null,
    runningSession: row.runningSession
      ? { id: row.runningSession.id, memberId: row.runningSession.memberId, memberFirstName: row.runningSession.firstName, startedAt: new Date(row.runningSession.startedAt) }
      : null,
    weeklyHours: row.weeklyHours,
    closures: row.closures,
    reservations: row.reservations.map((r) => ({ ...r, startsAt: new Date(r.startsAt), endsAt: new Date(r.endsAt) })),
    overdueCheckoutBlockDays: row.overdueCheckoutBlockDays,
    overdueCheckouts: row.overdueCheckouts.map((c) => ({ itemName: c.itemName, dueAt: new Date(c.dueAt) })),
  };
}

const sessionColumns = {
  id: 'id',
  machineId: 'machine_id',
  memberId: 'member_id',
  stationId: 'station_id',
  startedAt: 'started_at',
  endedAt: 'ended_at',
  endedBy: 'ended_by',
  endIdempotencyKey: 'end_idempotency_key',
  hours: 'hours',
} as const;

const returningColumns = Object.entries(sessionColumns).map(([alias, column]) => `${column} as ${alias}`);

function toSession(row: Record<string, unknown>): SessionRecord {
  const record = row as unknown as SessionRecord & { hours: string | null };
  return { ...record, hours: record.hours === null ? null : Number(record.hours) };
}

/** Pass a transaction as `db` to make several calls one change. */
export function machineSessionsRepository(db: Db) {
  return {
    async facts(machineId: string, codeHash: string | null, now: Date): Promise<ScanFacts | undefined> {
      const [row] = await preparedRows<FactsRow>(db, 'scan_facts_by_machine', FACTS_BY_MACHINE_SQL, factsValues(machineId, codeHash, now));
      return row?.machine ? toFacts(row, row.machine) : undefined;
    },

    /**
     * The paired, unrevoked station holding the device token hash and, when it is at a machine
     * that exists, the scan's facts; one round trip.
     */
    async stationFacts(deviceTokenHash: string, codeHash: string | null, now: Date): Promise<{ station: StationRecord; facts: ScanFacts | null } | undefined> {
      const [row] = await preparedRows<FactsRow & { station: StationJson | null }>(
        db,
        'scan_facts_by_station',
        FACTS_BY_STATION_SQL,
        factsValues(deviceTokenHash, codeHash, now),
      );
      if (!row?.station) return undefined;
      const { station: s, machine } = row;
      const station: StationRecord = {
        id: s.id,
        kind: s.kind,
        name: s.name,
        machineId: s.machineId,
        machineName: machine?.name ?? null,
        machineCategory: machine?.category ?? null,
        machineRequiresPin: machine?.requiresPin ?? null,
        pairedAt: date(s.pairedAt),
        lastSeenAt: date(s.lastSeenAt),
        revokedAt: date(s.revokedAt),
        pairingExpiresAt: date(s.pairingExpiresAt),
      };
      return { station, facts: machine ? toFacts(row, machine) : null };
    },

    /** The machine's earliest live reservation not over at `now`, however far ahead it starts. */
    async nextReservation(machineId: string, now: Date): Promise<ScanReservation | undefined> {
      const row = (await db('reservations as r')
        .join('members as p', 'p.id', 'r.member_id')
        .first({
          id: 'r.id',
          memberId: 'r.member_id',
          memberFirstName: 'p.first_name',
          startsAt: 'r.starts_at',
          endsAt: 'r.ends_at',
          status: 'r.status',
        })
        .where('r.machine_id', machineId)
        .whereIn('r.status', ['active', 'checked_in'])
        .where('r.ends_at', '>', now)
        .orderBy('r.starts_at')) as ScanReservation | undefined;
      return row ? { ...row, bookedInClass: false } : undefined;
    },

    /** The machine's live reservations overlapping [from, to), earliest first, with their holders' first names. */
    async reservationsBetween(machineId: string, from: Date, to: Date): Promise<{ startsAt: Date; endsAt: Date; kind: 'member' | 'class'; memberFirstName: string }[]> {
      return db('reservations as r')
        .join('members as p', 'p.id', 'r.member_id')
        .where('r.machine_id', machineId)
        .whereIn('r.status', ['active', 'checked_in'])
        .where('r.starts_at', '<', to)
        .where('r.ends_at', '>', from)
        .orderBy('r.starts_at')
        .select({ startsAt: 'r.starts_at', endsAt: 'r.ends_at', kind: 'r.kind', memberFirstName: 'p.first_name' });
    },

    /** Fails with a unique violation when the machine already has a running session. */
    async start(session: { machineId: string; memberId: string; stationId: string; checklist: ChecklistItem[] }): Promise<SessionRecord> {
      const [row] = await db('machine_sessions')
        .insert({
          machine_id: session.machineId,
          member_id: session.memberId,
          station_id: session.stationId,
          checklist: JSON.stringify(session.checklist),
        })
        .returning(returningColumns);
      return toSession(row as Record<string, unknown>);
    },

    /** Locks the session row until the transaction ends, so two ends of it run one after the other. */
    async findForUpdate(id: string): Promise<SessionRecord | undefined> {
      const row = await db('machine_sessions').first(sessionColumns).where({ id }).forUpdate();
      return row ? toSession(row) : undefined;
    },

    async findByEndKey(key: string): Promise<SessionRecord | undefined> {
      const row = await db('machine_sessions').first(sessionColumns).where({ end_idempotency_key: key });
      return row ? toSession(row) : undefined;
    },

    /**
     * Ends the session and adds its hours to the machine's meter; call inside a transaction. Hours
     * are kept to the meter's own precision (0.01 h), so the meter moves by exactly what is recorded.
     */
    async end(id: string, fields: { endedAt: Date; endedBy: EndedBy; idempotencyKey: string | null }): Promise<SessionRecord> {
      const [row] = await db('machine_sessions')
        .where({ id })
        .whereNull('ended_at')
        .update({
          ended_at: fields.endedAt,
          ended_by: fields.endedBy,
          end_idempotency_key: fields.idempotencyKey,
          hours: db.raw('round((extract(epoch from (?::timestamptz - started_at)) / 3600)::numeric, 2)', [fields.endedAt]),
        })
        .returning(returningColumns);
      if (!row) throw new Error(`session ${id} was not running`);
      const session = toSession(row as Record<string, unknown>);
      await db('machines').where({ id: session.machineId }).increment('meter_hours', session.hours ?? 0);
      return session;
    },

    /**
     * Closes, in one statement, every running session whose station has not been heard from since
     * `cutoff`, each at the station's last contact, and adds the hours to the machines' meters.
     */
    async closeSilent(cutoff: Date): Promise<{ id: string; machineId: string; endedAt: Date }[]> {
      const result = await db.raw<{ rows: { id: string; machineId: string; endedAt: Date }[] }>(
        `
        with closed as (
          update machine_sessions s
          set ended_at = greatest(st.last_seen_at, s.started_at),
              ended_by = 'heartbeat',
              hours = round((extract(epoch from (greatest(st.last_seen_at, s.started_at) - s.started_at)) / 3600)::numeric, 2)
          from stations st
          where st.id = s.station_id and s.ended_at is null and st.last_seen_at < :cutoff
          returning s.id, s.machine_id, s.hours, s.ended_at
        ),
        meters as (
          update machines m
          set meter_hours = m.meter_hours + totals.hours
          from (select machine_id, sum(hours) as hours from closed group by machine_id) totals
          where m.id = totals.machine_id
        )
        select id, machine_id as "machineId", ended_at as "endedAt" from closed
        `,
        { cutoff },
      );
      return result.rows;
    },
  };
}
export type MachineSessionsRepository = ReturnType<typeof machineSessionsRepository>;
