import type { ClosureDays, MachineCategory, WeeklyHours } from '@chuckkey/core';
import type { Db } from '../../lib/db';
import { preparedRows } from '../../lib/prepared';
import { openTagOutJson, runningSessionJson, SUPERVISOR_ON_DUTY_JSON } from '../machines/machine-live.sql';
import { closuresJson, WEEKLY_HOURS_JSON } from '../shop/shop-hours.sql';

/** What decides one machine's tile, as read from the database; names stay here, not in answers. */
export interface MachineTileRow {
  id: string;
  name: string;
  category: MachineCategory;
  tagOut: { reason: string; since: string } | null;
  session: { startedAt: string; firstName: string; lastName: string } | null;
  /** Paired, unrevoked stations at the machine, and the latest contact of any of them. */
  stations: number;
  lastHeardAt: string | null;
  /** The earliest active reservation that starts today or later (the shop's day) and has not ended. */
  nextReservation: { startsAt: string; endsAt: string; checkInMinutes: number } | null;
}

export interface BoardRow {
  shop: { name: string; timeZone: string } | null;
  weeklyHours: WeeklyHours[];
  closures: ClosureDays[];
  supervisor: { firstName: string; lastName: string } | null;
  areas: { id: string; name: string; machines: MachineTileRow[] }[];
  classes: { id: string; classId: string; title: string; startsAt: string; machineName: string }[];
}

/** The most class meetings the board's footer lists. */
export const BOARD_CLASSES = 6;

/*
 * Per machine: its open tag-out (at most one, by a unique index), its running session with the
 * member's name, its next reservation not yet checked into, and its paired, unrevoked stations (a revoked one has no device token). Written
 * once and used by both statements below, so a tile and a `machine:update` never disagree.
 */
const tileColumns = `
  m.id, m.name, m.category,
  ${openTagOutJson('m.id')} as "tagOut",
  ${runningSessionJson('m.id')} as session,
  (
    select json_build_object('startsAt', r.starts_at, 'endsAt', r.ends_at, 'checkInMinutes', m.check_in_minutes)
    from reservations r
    where r.machine_id = m.id and r.status = 'active' and r.ends_at > now()
      and r.starts_at >= (select date_trunc('day', now() at time zone time_zone) at time zone time_zone from shop where id = 1)
    order by r.starts_at
    limit 1
  ) as "nextReservation",
  heard.stations, heard."lastHeardAt"`;

const heardJoin = `
  cross join lateral (
    select count(*)::int as stations, max(st.last_seen_at) as "lastHeardAt"
    from stations st
    where st.machine_id = m.id and st.kind = 'machine' and st.device_token_hash is not null and st.revoked_at is null
  ) heard`;

/*
 * The whole board in one statement: the shop, its weekly hours and the closures around today (the
 * shop's date may be a day off the database's), the longest-serving supervisor on duty, and every
 * area that has machines, in the shop's order, with its machines by name.
 */
const BOARD_SQL = `
with tiles as (
  select m.area_id, ${tileColumns}
  from machines m ${heardJoin}
)
select
  (select json_build_object('name', name, 'timeZone', time_zone) from shop where id = 1) as shop,
  ${WEEKLY_HOURS_JSON} as "weeklyHours",
  ${closuresJson(1)} as closures,
  ${SUPERVISOR_ON_DUTY_JSON} as supervisor,
  (
    select coalesce(json_agg(json_build_object('id', a.id, 'name', a.name, 'machines', area.machines) order by a.sort_order, a.name), '[]')
    from areas a
    cross join lateral (
      select json_agg(json_build_object(
        'id', t.id, 'name', t.name, 'category', t.category, 'tagOut', t."tagOut", 'session', t.session,
        'stations', t.stations, 'lastHeardAt', t."lastHeardAt", 'nextReservation', t."nextReservation") order by t.name) as machines
      from tiles t where t.area_id = a.id
    ) area
    where area.machines is not null
  ) as areas,
  (
    -- Class meetings not yet over that start by the end of the seventh day after the shop's today.
    select coalesce(json_agg(json_build_object(
      'id', meeting.id, 'classId', meeting.class_id, 'title', meeting.title, 'startsAt', meeting.starts_at, 'machineName', meeting.machine_name)
      order by meeting.starts_at), '[]')
    from (
      select r.id, r.class_id, c.title, r.starts_at, m.name as machine_name
      from reservations r
      join classes c on c.id = r.class_id and c.cancelled_at is null
      join machines m on m.id = r.machine_id
      -- A meeting lasts at most a day (classCreateSchema), so the start's lower bound keeps the
      -- index scan off the past meetings, which stay active: no job releases class holds.
      where r.class_id is not null and r.status in ('active', 'checked_in') and r.ends_at > now()
        and r.starts_at > now() - interval '1 day'
        and r.starts_at < (select (date_trunc('day', now() at time zone time_zone) + interval '8 days') at time zone time_zone from shop where id = 1)
      order by r.starts_at
      limit ${BOARD_CLASSES}
    ) meeting
  ) as classes
`;

const MACHINE_TILE_SQL = `
select ${tileColumns}
from machines m ${heardJoin}
where m.id = $1::uuid
`;

export function boardRepository(db: Db) {
  return {
    /** Every board request reads this, and every client refetches on each event: prepared once per connection. */
    async board(): Promise<BoardRow> {
      const [row] = await preparedRows<BoardRow>(db, 'board', BOARD_SQL, []);
      if (!row) throw new Error('the board statement returned no row');
      return row;
    },

    /** One machine's tile, for its `machine:update`; undefined when the machine no longer exists. */
    async machine(machineId: string): Promise<MachineTileRow | undefined> {
      const [row] = await preparedRows<MachineTileRow>(db, 'board_machine', MACHINE_TILE_SQL, [machineId]);
      return row;
    },
  };
}
