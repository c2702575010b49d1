import { maintenanceDue, type MachineMaintenance, type MaintenanceCompletion, type MaintenanceTask, type MaintenanceTaskInput } from '@chuckkey/core';
import type { Deps } from '../../lib/deps';
import { conflict, notFound, pgCode, UNIQUE_VIOLATION } from '../../lib/errors';
import { auditLog } from '../audit/audit.repository';
import { maintenanceRepository, type MaintenanceCompletionRecord, type MaintenanceTaskRecord } from './maintenance.repository';

const machineNotFound = () => notFound('machine_not_found', 'There is no machine with that id.');
const taskNotFound = () => notFound('maintenance_task_not_found', 'There is no maintenance task with that id.');
const nameTaken = () =>
  conflict('maintenance_task_name_taken', 'This machine already has a task of that name.', { name: ['This machine already has a task of that name.'] });

function toTask(row: MaintenanceTaskRecord, now: Date, timeZone: string): MaintenanceTask {
  const last = row.lastDoneAt && row.lastMeterHours !== null ? { doneAt: row.lastDoneAt, meterHours: row.lastMeterHours } : null;
  const due = maintenanceDue(row, last, row.machineMeterHours, now, timeZone);
  return {
    id: row.id,
    machine: { id: row.machineId, name: row.machineName, meterHours: row.machineMeterHours },
    name: row.name,
    instructions: row.instructions,
    everyHours: row.everyHours,
    everyDays: row.everyDays,
    blocking: row.blocking,
    active: row.active,
    createdAt: row.createdAt.toISOString(),
    ...due,
    lastDone: last && { doneAt: last.doneAt.toISOString(), meterHours: last.meterHours },
  };
}

const toCompletion = (row: MaintenanceCompletionRecord): MaintenanceCompletion => ({
  id: row.id,
  taskId: row.taskId,
  taskName: row.taskName,
  doneAt: row.doneAt.toISOString(),
  meterHours: row.meterHours,
  doneBy: row.doneById && row.doneByName ? { id: row.doneById, name: row.doneByName } : null,
  note: row.note,
});

/**
 * Maintenance tasks per machine, due by the meter and the calendar (core's maintenanceDue). A
 * blocking task past due stops clearance (rule 4, read in the scan's statement), so adding,
 * changing and completing one is announced to the board's listeners like a tag-out.
 */
export function maintenanceService({ db, live }: Deps) {
  return {
    async list(now = new Date()): Promise<MaintenanceTask[]> {
      const repository = maintenanceRepository(db);
      const [timeZone, rows] = await Promise.all([repository.timeZone(), repository.activeTasks()]);
      return rows.map((row) => toTask(row, now, timeZone));
    },

    async forMachine(machineId: string, now = new Date()): Promise<MachineMaintenance> {
      const repository = maintenanceRepository(db);
      const machine = await repository.machine(machineId);
      if (!machine) throw machineNotFound();
      const [timeZone, tasks, history] = await Promise.all([repository.timeZone(), repository.machineTasks(machineId), repository.history(machineId)]);
      return { machine, tasks: tasks.map((row) => toTask(row, now, timeZone)), history: history.map(toCompletion) };
    },

    async create(actor: Express.User, machineId: string, input: MaintenanceTaskInput): Promise<MaintenanceTask> {
      const id = await db.transaction(async (trx) => {
        const repository = maintenanceRepository(trx);
        if (!(await repository.machine(machineId))) throw machineNotFound();
        let created: string;
        try {
          created = await repository.create(machineId, input);
        } catch (error) {
          if (pgCode(error) === UNIQUE_VIOLATION) throw nameTaken();
          throw error;
        }
        await auditLog(trx).record({ actorId: actor.id, action: 'maintenance.task_created', entity: 'machine', entityId: machineId, details: { taskId: created, ...input } });
        return created;
      });
      live.machineChanged(machineId);
      return this.one(id);
    },

    async update(actor: Express.User, id: string, input: MaintenanceTaskInput): Promise<MaintenanceTask> {
      const machineId = await db.transaction(async (trx) => {
        const repository = maintenanceRepository(trx);
        const task = await repository.lockTask(id);
        if (!task) throw taskNotFound();
        try {
          await repository.update(id, input);
        } catch (error) {
          if (pgCode(error) === UNIQUE_VIOLATION) throw nameTaken();
          throw error;
        }
        await auditLog(trx).record({ actorId: actor.id, action: 'maintenance.task_updated', entity: 'machine', entityId: task.machineId, details: { taskId: id, ...input } });
        return task.machineId;
      });
      live.machineChanged(machineId);
      return this.one(id);
    },

    async complete(actor: Express.User, id: string, note: string): Promise<MaintenanceTask> {
      const machineId = await db.transaction(async (trx) => {
        const repository = maintenanceRepository(trx);
        const task = await repository.lockTask(id);
        if (!task) throw taskNotFound();
        const done = await repository.complete(id, { doneBy: actor.id, note });
        await auditLog(trx).record({
          actorId: actor.id,
          action: 'maintenance.completed',
          entity: 'machine',
          entityId: task.machineId,
          details: { taskId: id, taskName: task.name, completionId: done.id, meterHours: done.meterHours, note },
        });
        return task.machineId;
      });
      live.machineChanged(machineId);
      return this.one(id);
    },

    async one(id: string, now = new Date()): Promise<MaintenanceTask> {
      const repository = maintenanceRepository(db);
      const [timeZone, row] = await Promise.all([repository.timeZone(), repository.task(id)]);
      if (!row) throw taskNotFound();
      return toTask(row, now, timeZone);
    },
  };
}
