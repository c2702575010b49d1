import type { ChecklistItem, MachineCategory, Role, SignOffLevel } from '@chuckkey/core';
import type { Db } from '../../lib/db';

export type EndedBy = 'member' | 'supervisor' | 'admin' | 'heartbeat' | 'next_member';

/** What one scan at a machine needs to know, read in a single round trip. */
export interface ScanFacts {
  /** The shop's IANA time zone, for the times in the messages. */
  timeZone: string;
  machine: { id: string; name: string; category: MachineCategory; requiresPin: boolean; safetyChecklist: ChecklistItem[] };
  member: { id: string; firstName: string; role: Role; active: boolean; waiverOnFile: boolean; hasPhoto: boolean } | null;
  requiredTrainings: { id: string; name: string; teachers: string[] }[];
  signOffs: { trainingId: string; level: SignOffLevel; expiresAt: Date | null; revokedAt: Date | null }[];
  supervisorOnDuty: { firstName: string } | null;
  runningSession: { id: string; memberId: string; memberFirstName: string; startedAt: Date } | null;
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

/** Instructors named as teachers of a training: those who signed it off in this many months. */
export const TEACHER_RECENT_MONTHS = 24;
export const TEACHERS_NAMED = 3;

/*
 * One statement: the member behind the badge hash (active badge only), whether they accepted the
 * current waiver version, the machine's active required trainings with the first names of up to
 * three instructors who signed each off lately, the member's sign-offs for those trainings in any
 * state, a supervisor on duty and the machine's running session. With no badge hash (null) the
 * member parts come back empty. The shop's time zone comes along for the wording of times.
 */
const FACTS_SQL = `
with machine as (
  select m.id, m.name, m.category, m.requires_pin as "requiresPin", m.safety_checklist as "safetyChecklist"
  from machines m where m.id = :machineId
),
holder as (
  select p.id, p.first_name as "firstName", p.role, p.active,
    exists (
      select 1 from waiver_records w
      where w.member_id = p.id and w.version = (select max(v.version) from waiver_versions v)
    ) as "waiverOnFile",
    exists (select 1 from member_photos ph where ph.member_id = p.id) as "hasPhoto"
  from badges b join members p on p.id = b.member_id
  where b.code_hash = :codeHash and b.revoked_at is null
),
required as (
  select t.id, t.name,
    coalesce((
      select array_agg(recent."firstName" order by recent.latest desc)
      from (
        -- Per teacher, their latest sign-off of the training: a few index probes, however many
        -- members the training has signed off.
        select i.first_name as "firstName", last.latest
        from members i
        cross join lateral (
          select max(s.signed_at) as latest from sign_offs s
          where s.training_id = t.id and s.signed_by = i.id
            and s.signed_at > now() - make_interval(months => :recentMonths)
        ) last
        where i.active and i.role in ('instructor', 'admin') and last.latest is not null
        order by last.latest desc
        limit :teachersNamed
      ) recent
    ), '{}') as teachers
  from machine_trainings mt join trainings t on t.id = mt.training_id
  where mt.machine_id = :machineId and t.active
)
select
  (select time_zone from shop where id = 1) as "timeZone",
  (select row_to_json(machine) from machine) as machine,
  (select row_to_json(holder) from holder) as member,
  (select coalesce(json_agg(required order by required.name), '[]') from required) as "requiredTrainings",
  (
    select coalesce(json_agg(json_build_object(
      'trainingId', s.training_id, 'level', s.level, 'expiresAt', s.expires_at, 'revokedAt', s.revoked_at)), '[]')
    from sign_offs s
    where s.member_id = (select id from holder) and s.training_id in (select id from required)
  ) as "signOffs",
  (
    select json_build_object('firstName', p.first_name)
    from duty_shifts d join members p on p.id = d.member_id
    where d.ended_at is null and p.active and p.role in ('instructor', 'admin')
    order by d.started_at
    limit 1
  ) as "supervisorOnDuty",
  (
    select json_build_object('id', s.id, 'memberId', s.member_id, 'memberFirstName', p.first_name, 'startedAt', s.started_at)
    from machine_sessions s join members p on p.id = s.member_id
    where s.machine_id = :machineId and s.ended_at is null
  ) as "runningSession"
`;

interface FactsRow {
  timeZone: string | null;
  machine: ScanFacts['machine'] | null;
  member: ScanFacts['member'];
  requiredTrainings: ScanFacts['requiredTrainings'];
  signOffs: { trainingId: string; level: SignOffLevel; expiresAt: string | null; revokedAt: string | null }[];
  supervisorOnDuty: ScanFacts['supervisorOnDuty'];
  runningSession: { id: string; memberId: string; memberFirstName: string; startedAt: string } | null;
}

const date = (value: string | null) => (value === null ? null : new Date(value));

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
    async facts(machineId: string, codeHash: string | null): Promise<ScanFacts | undefined> {
      const result = await db.raw<{ rows: FactsRow[] }>(FACTS_SQL, {
        machineId,
        codeHash,
        recentMonths: TEACHER_RECENT_MONTHS,
        teachersNamed: TEACHERS_NAMED,
      });
      const row = result.rows[0];
      if (!row?.machine) return undefined;
      return {
        timeZone: row.timeZone ?? 'UTC',
        machine: row.machine,
        member: row.member,
        requiredTrainings: row.requiredTrainings,
        signOffs: row.signOffs.map((s) => ({ ...s, expiresAt: date(s.expiresAt), revokedAt: date(s.revokedAt) })),
        supervisorOnDuty: row.supervisorOnDuty,
        runningSession: row.runningSession ? { ...row.runningSession, startedAt: new Date(row.runningSession.startedAt) } : null,
      };
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
    async closeSilent(cutoff: Date): Promise<{ id: string; endedAt: Date }[]> {
      const result = await db.raw<{ rows: { id: string; endedAt: Date }[] }>(
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
        select id, ended_at as "endedAt" from closed
        `,
        { cutoff },
      );
      return result.rows;
    },
  };
}
export type MachineSessionsRepository = ReturnType<typeof machineSessionsRepository>;
