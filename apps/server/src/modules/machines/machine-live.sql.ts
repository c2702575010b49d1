/*
 * SQL fragments for the statements that read a machine's live state together with other facts in
 * one round trip (the station's scan, the wall board), so that both read it the same way. Each is
 * a scalar sub-select for a select list; `machineId` is an SQL expression naming the machine.
 */

/** The machine's open tag-out as `{reason, since}`, or null: at most one is open, by a unique index. */
export const openTagOutJson = (machineId: string) => `(
    select json_build_object('reason', t.reason, 'since', t.reported_at)
    from tag_outs t
    where t.machine_id = ${machineId} and t.cleared_at is null
  )`;

/** The machine's running session as `{id, memberId, firstName, lastName, startedAt}`, or null: one at most, by a unique index. */
export const runningSessionJson = (machineId: string) => `(
    select json_build_object('id', s.id, 'memberId', s.member_id, 'firstName', p.first_name, 'lastName', p.last_name, 'startedAt', s.started_at)
    from machine_sessions s join members p on p.id = s.member_id
    where s.machine_id = ${machineId} and s.ended_at is null
  )`;

/** The longest-serving active instructor or admin on duty, shop-wide, as `{firstName, lastName}`, or null. */
export const SUPERVISOR_ON_DUTY_JSON = `(
    select json_build_object('firstName', p.first_name, 'lastName', p.last_name)
    from duty_shifts d join members p on p.id = d.member_id
    where d.ended_at is null and p.active and p.role in ('instructor', 'admin')
    order by d.started_at
    limit 1
  )`;
