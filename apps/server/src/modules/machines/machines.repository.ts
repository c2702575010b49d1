import type { Area, MachineDetail, MachineInput } from '@chuckkey/core';
import type { Db } from '../../lib/db';

export function machinesRepository(db: Db) {
  const select = () =>
    db('machines')
      .join('areas', 'areas.id', 'machines.area_id')
      .select({
        id: 'machines.id',
        name: 'machines.name',
        category: 'machines.category',
        area: 'areas.name',
        areaId: 'machines.area_id',
        reservable: 'machines.reservable',
        meterHours: 'machines.meter_hours',
        description: 'machines.description',
        requiresPin: 'machines.requires_pin',
        safetyChecklist: 'machines.safety_checklist',
        trainings: db.raw(
          `coalesce((
            select json_agg(json_build_object('id', t.id, 'name', t.name) order by t.name)
            from machine_trainings mt join trainings t on t.id = mt.training_id
            where mt.machine_id = machines.id
          ), '[]'::json)`,
        ),
      });

  function values(input: MachineInput) {
    return {
      name: input.name,
      category: input.category,
      area_id: input.areaId,
      reservable: input.reservable,
      description: input.description,
      requires_pin: input.requiresPin,
      safety_checklist: JSON.stringify(input.safetyChecklist),
    };
  }

  return {
    async list(): Promise<MachineDetail[]> {
      return select().orderBy([{ column: 'areas.sort_order' }, { column: 'areas.name' }, { column: 'machines.name' }]);
    },

    async findById(id: string): Promise<MachineDetail | undefined> {
      return select().where('machines.id', id).first();
    },

    async findByName(name: string, exceptId?: string): Promise<{ id: string } | undefined> {
      const q = db('machines').first('id').whereRaw('lower(name) = lower(?)', [name.trim()]);
      if (exceptId) q.whereNot({ id: exceptId });
      return q;
    },

    async insert(input: MachineInput): Promise<string> {
      const [row] = await db('machines').insert(values(input)).returning('id');
      return (row as { id: string }).id;
    },

    async update(id: string, input: MachineInput): Promise<void> {
      await db('machines').where({ id }).update(values(input));
    },

    /** Replaces the trainings the machine requires. */
    async setTrainings(machineId: string, trainingIds: readonly string[]): Promise<void> {
      await db('machine_trainings').where({ machine_id: machineId }).delete();
      if (trainingIds.length) {
        await db('machine_trainings').insert(trainingIds.map((trainingId) => ({ machine_id: machineId, training_id: trainingId })));
      }
    },

    async listAreas(): Promise<Area[]> {
      return db('areas').select('id', 'name').orderBy([{ column: 'sort_order' }, { column: 'name' }]);
    },

    async areaExists(id: string): Promise<boolean> {
      return Boolean(await db('areas').first('id').where({ id }));
    },
  };
}
