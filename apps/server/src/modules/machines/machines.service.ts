import type { Area, MachineDetail, MachineInput } from '@chuckkey/core';
import { badRequest, conflict, notFound, pgCode, UNIQUE_VIOLATION } from '../../lib/errors';
import type { Deps } from '../../lib/deps';
import type { Db } from '../../lib/db';
import { trainingsRepository } from '../trainings/trainings.repository';
import { machinesRepository } from './machines.repository';

const nameTaken = () =>
  conflict('machine_name_taken', 'Another machine already has that name.', { name: ['Another machine already has that name.'] });

/** Checks what the input points at (area, trainings) before anything is written. */
async function checkReferences(db: Db, input: MachineInput): Promise<void> {
  if (!(await machinesRepository(db).areaExists(input.areaId))) {
    throw badRequest('unknown_area', 'There is no area with that id.', { areaId: ['Choose one of the shop’s areas.'] });
  }
  const wanted = [...new Set(input.trainingIds)];
  const found = new Set(await trainingsRepository(db).existingIds(wanted));
  const unknown = wanted.filter((id) => !found.has(id));
  if (unknown.length) {
    throw badRequest('unknown_training', `There is no training with the id ${unknown.join(', ')}.`, {
      trainingIds: unknown.map((id) => `No training has the id ${id}.`),
    });
  }
}

export function machinesService({ db }: Deps) {
  const machines = machinesRepository(db);

  async function load(id: string, from: Db = db): Promise<MachineDetail> {
    const machine = await machinesRepository(from).findById(id);
    if (!machine) throw notFound('machine_not_found', 'There is no machine with that id.');
    return machine;
  }

  /** Writes the machine and its required trainings together; the unique index settles name races. */
  async function save(input: MachineInput, write: (trx: Db) => Promise<string>): Promise<MachineDetail> {
    try {
      return await db.transaction(async (trx) => {
        await checkReferences(trx, input);
        const id = await write(trx);
        await machinesRepository(trx).setTrainings(id, [...new Set(input.trainingIds)]);
        return load(id, trx);
      });
    } catch (error) {
      if (pgCode(error) === UNIQUE_VIOLATION) throw nameTaken();
      throw error;
    }
  }

  return {
    list: (): Promise<MachineDetail[]> => machines.list(),

    get: (id: string): Promise<MachineDetail> => load(id),

    listAreas: (): Promise<Area[]> => machines.listAreas(),

    async create(input: MachineInput): Promise<MachineDetail> {
      if (await machines.findByName(input.name)) throw nameTaken();
      return save(input, (trx) => machinesRepository(trx).insert(input));
    },

    async update(id: string, input: MachineInput): Promise<MachineDetail> {
      await load(id);
      if (await machines.findByName(input.name, id)) throw nameTaken();
      return save(input, async (trx) => {
        await machinesRepository(trx).update(id, input);
        return id;
      });
    },
  };
}
