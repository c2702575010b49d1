import type { Training, TrainingInput } from '@chuckkey/core';
import { conflict, notFound, pgCode, UNIQUE_VIOLATION } from '../../lib/errors';
import type { Deps } from '../../lib/deps';
import { trainingsRepository } from './trainings.repository';

const nameTaken = () =>
  conflict('training_name_taken', 'Another training already has that name.', { name: ['Another training already has that name.'] });

export function trainingsService({ db }: Deps) {
  const trainings = trainingsRepository(db);

  async function load(id: string): Promise<Training> {
    const training = await trainings.findById(id);
    if (!training) throw notFound('training_not_found', 'There is no training with that id.');
    return training;
  }

  /** The unique index decides between two admins saving the same name at once. */
  async function uniqueName<T>(write: () => Promise<T>): Promise<T> {
    try {
      return await write();
    } catch (error) {
      if (pgCode(error) === UNIQUE_VIOLATION) throw nameTaken();
      throw error;
    }
  }

  return {
    async list(): Promise<Training[]> {
      return trainings.list();
    },

    async create(input: TrainingInput): Promise<Training> {
      if (await trainings.findByName(input.name)) throw nameTaken();
      const id = await uniqueName(() => trainings.insert(input));
      return load(id);
    },

    async update(id: string, input: TrainingInput): Promise<Training> {
      if (await trainings.findByName(input.name, id)) throw nameTaken();
      const found = await uniqueName(() => trainings.update(id, input));
      if (!found) throw notFound('training_not_found', 'There is no training with that id.');
      return load(id);
    },
  };
}
