import type { MaintenanceTaskInput } from '@chuckkey/core';
import type { Db } from '../../lib/db';

export interface MaintenanceTaskRecord {
  id: string;
  machineId: string;
  machineName: string;
  machineMeterHours: number;
  name: string;
  instructions: string;
  everyHours: number | null;
  everyDays: number | null;
  blocking: boolean;
  active: boolean;
  startMeterHours: number;
  createdAt: Date;
  lastDoneAt: Date | null;
  lastMeterHours: number | null;
}

export interface MaintenanceCompletionRecord {
  id: number;
  taskId: string;
  taskName: string;
  doneAt: Date;
  meterHours: number;
  doneById: string | null;
  doneByName: string | null;
  note: string;
}

/** Rows as the driver gives them: numeric columns (the meters, a bigint id) arrive as text. */
type TaskRow = Omit<MaintenanceTaskRecord, 'machineMeterHours' | 'startMeterHours' | 'lastMeterHours'> & {
  machineMeterHours: string;
  startMeterHours: string;
  lastMeterHours: string | null;
};
type CompletionRow = Omit<MaintenanceCompletionRecord, 'id' | 'meterHours'> & { id: string; meterHours: string };

/** The meters are kept to 0.01 h, well inside a double. */
const hours = (value: string) => Number(value);
const maybeHours = (value: string | null) => (value === null ? null : Number(value));

function toTask(row: TaskRow): MaintenanceTaskRecord {
  return {
    ...row,
    machineMeterHours: hours(row.machineMeterHours),
    startMeterHours: hours(row.startMeterHours),
    lastMeterHours: maybeHours(row.lastMeterHours),
  };
}

/**
 * Tasks with their machine's name and meter and their latest completion (the first entry of the
 * completions index per task).
 */
function tasksQuery(db: Db) {
  return db('maintenance_tasks as t')
    .join('machines as m', 'm.id', 't.machine_id')
    .joinRaw(
      'left join lateral (select c.done_at, c.meter_hours from maintenance_completions c where c.task_id = t.id order by c.done_at desc, c.id desc limit 1) last on true',
    )
    .select({
      id: 't.id',
      machineId: 't.machine_id',
      machineName: 'm.name',
      machineMeterHours: 'm.meter_hours',
      name: 't.name',
      instructions: 't.instructions',
      everyHours: 't.every_hours',
      everyDays: 't.every_days',
      blocking: 't.blocking',
      active: 't.active',
      startMeterHours: 't.start_meter_hours',
      createdAt: 't.created_at',
      lastDoneAt: 'last.done_at',
      lastMeterHours: 'last.meter_hours',
    });
}

const taskColumns = (task: MaintenanceTaskInput) => ({
  name: task.name,
  instructions: task.instructions,
  every_hours: task.everyHours,
  every_days: task.everyDays,
  blocking: task.blocking,
  active: task.active,
});

/** Pass a transaction as `db` to make several calls one change. */
export function maintenanceRepository(db: Db) {
  return {
    async timeZone(): Promise<string> {
      const row = (await db('shop').first('time_zone').where({ id: 1 })) as { time_zone: string } | undefined;
      return row?.time_zone ?? 'UTC';
    },

    async machine(machineId: string): Promise<{ id: string; name: string; meterHours: number } | undefined> {
      const row = (await db('machines').first('id', 'name', 'meter_hours').where({ id: machineId })) as
        | { id: string; name: string; meter_hours: string }
        | undefined;
      return row && { id: row.id, name: row.name, meterHours: hours(row.meter_hours) };
    },

    async activeTasks(): Promise<MaintenanceTaskRecord[]> {
      const rows = (await tasksQuery(db).where('t.active', true).orderBy([{ column: 'm.name' }, { column: 't.name' }])) as TaskRow[];
      return rows.map(toTask);
    },

    async machineTasks(machineId: string): Promise<MaintenanceTaskRecord[]> {
      const rows = (await tasksQuery(db).where('t.machine_id', machineId).orderBy([{ column: 't.active', order: 'desc' }, { column: 't.name' }])) as TaskRow[];
      return rows.map(toTask);
    },

    async task(id: string): Promise<MaintenanceTaskRecord | undefined> {
      const row = (await tasksQuery(db).where('t.id', id).first()) as TaskRow | undefined;
      return row && toTask(row);
    },

    /** Locks the task until the transaction ends, so changes and completions of it run one after another. */
    async lockTask(id: string): Promise<{ id: string; machineId: string; name: string } | undefined> {
      return db('maintenance_tasks').first<{ id: string; machineId: string; name: string } | undefined>({ id: 'id', machineId: 'machine_id', name: 'name' }).where({ id }).forUpdate();
    },

    async history(machineId: string): Promise<MaintenanceCompletionRecord[]> {
      const rows = (await db('maintenance_completions as c')
        .join('maintenance_tasks as t', 't.id', 'c.task_id')
        .leftJoin('members as p', 'p.id', 'c.done_by')
        .where('t.machine_id', machineId)
        .orderBy([{ column: 'c.done_at', order: 'desc' }, { column: 'c.id', order: 'desc' }])
        .select({
          id: 'c.id',
          taskId: 'c.task_id',
          taskName: 't.name',
          doneAt: 'c.done_at',
          meterHours: 'c.meter_hours',
          doneById: 'c.done_by',
          doneByName: db.raw("p.first_name || ' ' || p.last_name"),
          note: 'c.note',
        })) as CompletionRow[];
      return rows.map((row) => ({ ...row, id: Number(row.id), meterHours: hours(row.meterHours) }));
    },

    /** Fails with a unique violation when the machine already has a task of that name. The count starts at the machine's meter now. */
    async create(machineId: string, task: MaintenanceTaskInput): Promise<string> {
      const [row] = (await db('maintenance_tasks')
        .insert({
          machine_id: machineId,
          ...taskColumns(task),
          start_meter_hours: db('machines').select('meter_hours').where({ id: machineId }),
        })
        .returning('id')) as { id: string }[];
      if (!row) throw new Error('maintenance task insert returned no row');
      return row.id;
    },

    async update(id: string, task: MaintenanceTaskInput): Promise<void> {
      await db('maintenance_tasks').where({ id }).update(taskColumns(task));
    },

    /** Records the task done now, at the machine's meter now. */
    async complete(taskId: string, fields: { doneBy: string; note: string }): Promise<{ id: number; doneAt: Date; meterHours: number }> {
      const result = await db.raw<{ rows: { id: string; doneAt: Date; meterHours: string }[] }>(
        `insert into maintenance_completions (task_id, meter_hours, done_by, note)
         select t.id, m.meter_hours, :doneBy, :note from maintenance_tasks t join machines m on m.id = t.machine_id where t.id = :taskId
         returning id, done_at as "doneAt", meter_hours as "meterHours"`,
        { taskId, doneBy: fields.doneBy, note: fields.note },
      );
      const [row] = result.rows;
      if (!row) throw new Error(`maintenance task ${taskId} not found`);
      return { id: Number(row.id), doneAt: row.doneAt, meterHours: hours(row.meterHours) };
    },
  };
}
export type MaintenanceRepository = ReturnType<typeof maintenanceRepository>;
