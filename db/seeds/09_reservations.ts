import type { Knex } from 'knex';

/** The machines the demo members reserve from home; each keeps the booking rules' defaults. */
export const demoReservableCategories = ['mig_welder', 'band_saw'] as const;

export async function seed(knex: Knex): Promise<void> {
  await knex('machines').whereIn('category', demoReservableCategories).update({ reservable: true });
}
