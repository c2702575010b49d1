import type { Knex } from 'knex';
import { hashPassword } from '../src/passwords';

/** Stations ask instructors for a PIN; the demo instructor and admin share the one README lists. */
export const DEMO_PIN = '2468';

export async function seed(knex: Knex): Promise<void> {
  const pinHash = await hashPassword(DEMO_PIN);
  await knex('members').whereIn('email', ['instructor@example.org', 'admin@example.org']).update({ pin_hash: pinHash });
}
