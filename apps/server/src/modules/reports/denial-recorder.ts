import type { Knex } from 'knex';
import type { Db } from '../../lib/db';
import type { Logger } from '../../lib/logger';

/** One reason a scan at a machine station was refused. */
export interface Denial {
  at: Date;
  stationId: string | null;
  machineId: string;
  /** Null for a badge that belongs to no one. */
  memberId: string | null;
  code: string;
  rule: number | null;
  trainingId: string | null;
}

export interface DenialRecorder {
  /** Queues the rows and returns at once; they are written with the next flush. */
  record(denials: readonly Denial[]): void;
  /** Writes what is queued now, as one statement. */
  flush(): Promise<void>;
  /** Stops the timer and writes what is left. */
  close(): Promise<void>;
}

interface PgConnection {
  query(text: string, values: unknown[]): Promise<{ rowCount: number | null }>;
}

/** Every second by default: a scan answers without waiting for its denials (docs/decisions/015). */
export const DENIAL_FLUSH_MS = 1_000;
/** A flush starts early once this many rows wait, so a burst makes several modest statements. */
const FLUSH_AT_ROWS = 500;
/** While the database is away rows pile up; past this the oldest go, so memory stays bounded. */
const MAX_QUEUED = 20_000;

/*
 * Column arrays unnested into rows: one statement and seven parameters however many rows. Rows of a
 * machine removed since the scan are dropped, and a station, member or training removed since is
 * kept as null, so one vanished row does not fail the batch on a foreign key. Rows keep the order
 * they were queued in, so a scan's reasons stay in rule order.
 */
const INSERT_SQL = `
insert into station_denials (at, station_id, machine_id, member_id, code, rule, training_id)
select d.at, (select s.id from stations s where s.id = d.station_id), d.machine_id,
  (select p.id from members p where p.id = d.member_id), d.code, d.rule,
  (select t.id from trainings t where t.id = d.training_id)
from unnest($1::timestamptz[], $2::uuid[], $3::uuid[], $4::uuid[], $5::text[], $6::smallint[], $7::uuid[])
  with ordinality as d(at, station_id, machine_id, member_id, code, rule, training_id, n)
where exists (select 1 from machines m where m.id = d.machine_id)
order by d.n
`;

export function denialRecorder({ db, logger }: { db: Db; logger: Logger }, { flushMs = DENIAL_FLUSH_MS }: { flushMs?: number } = {}): DenialRecorder {
  let queued: Denial[] = [];
  let writing: Promise<void> = Promise.resolve();
  // Rows dropped since the last flush, reported once by it rather than on every scan.
  let dropped = 0;
  // A flush waiting behind the one running: later calls join it instead of queueing more.
  let waiting = false;

  async function write(batch: Denial[]): Promise<void> {
    // Straight on a pooled connection rather than through knex's query events: the write belongs to
    // no request, and listeners counting a request's statements (the scan's one round trip) should
    // not see it land in the middle of theirs.
    const client = db.client as Knex.Client;
    const connection = (await client.acquireConnection()) as PgConnection;
    try {
      await connection.query(INSERT_SQL, [
        batch.map((d) => d.at),
        batch.map((d) => d.stationId),
        batch.map((d) => d.machineId),
        batch.map((d) => d.memberId),
        batch.map((d) => d.code),
        batch.map((d) => d.rule),
        batch.map((d) => d.trainingId),
      ]);
    } finally {
      await client.releaseConnection(connection);
    }
  }

  function flush(): Promise<void> {
    // One write at a time, in order: a flush waits for the one before it, then takes what is queued.
    if (waiting) return writing;
    waiting = true;
    writing = writing.then(async () => {
      waiting = false;
      if (dropped > 0) {
        logger.warn({ dropped }, 'station denials dropped while the database was not taking them');
        dropped = 0;
      }
      if (queued.length === 0) return;
      const batch = queued;
      queued = [];
      try {
        await write(batch);
      } catch (error) {
        logger.error({ err: error, rows: batch.length }, 'station denials could not be recorded');
      }
    });
    return writing;
  }

  const timer = setInterval(() => void flush(), flushMs);
  // The timer alone must not keep a process alive that is otherwise done.
  timer.unref();

  return {
    record(denials) {
      if (denials.length === 0) return;
      queued.push(...denials);
      if (queued.length > MAX_QUEUED) {
        const excess = queued.length - MAX_QUEUED;
        queued.splice(0, excess);
        dropped += excess;
      }
      if (queued.length >= FLUSH_AT_ROWS) void flush();
    },
    flush,
    async close() {
      clearInterval(timer);
      await flush();
    },
  };
}
