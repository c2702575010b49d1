import type { Training, TrainingInput } from '@chuckkey/core';
import type { Db } from '../../lib/db';

const columns = {
  id: 'trainings.id',
  name: 'trainings.name',
  description: 'trainings.description',
  checklist: 'trainings.checklist',
  validityMonths: 'trainings.validity_months',
  active: 'trainings.active',
} as const;

export function trainingsRepository(db: Db) {
  const select = () =>
    db('trainings').select({
      ...columns,
      // The machines that require the training, so a sign-off can say what it opens.
      machineIds: db.raw(
        "coalesce((select array_agg(mt.machine_id::text order by mt.machine_id) from machine_trainings mt where mt.training_id = trainings.id), '{}')",
      ),
    });

  function values(input: TrainingInput) {
    return {
      name: input.name,
      description: input.description,
      checklist: JSON.stringify(input.checklist),
      validity_months: input.validityMonths,
      active: input.active,
    };
  }

  return {
    async list(): Promise<Training[]> {
      return select().orderBy('trainings.name');
    },

    async findById(id: string): Promise<Training | undefined> {
      return select().where('trainings.id', id).first();
    },

    /** Another training with the same name, ignoring case and spaces around it. */
    async findByName(name: string, exceptId?: string): Promise<{ id: string } | undefined> {
      const q = db('trainings').first('id').whereRaw('lower(name) = lower(?)', [name.trim()]);
      if (exceptId) q.whereNot({ id: exceptId });
      return q;
    },

    async insert(input: TrainingInput): Promise<string> {
      const [row] = await db('trainings').insert(values(input)).returning('id');
      return (row as { id: string }).id;
    },

    async update(id: string, input: TrainingInput): Promise<boolean> {
      const count = await db('trainings')
        .where({ id })
        .update({ ...values(input), updated_at: db.fn.now() });
      return count > 0;
    },

    /** Which of these ids name a training. */
    async existingIds(ids: readonly string[]): Promise<string[]> {
      if (ids.length === 0) return [];
      return db('trainings').whereIn('id', ids).pluck('id');
    },
  };
}
export type TrainingsRepository = ReturnType<typeof trainingsRepository>;
