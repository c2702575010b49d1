import type { Knex } from 'knex';

/**
 * When the silent-stations job announced that a station went quiet (its machine shows offline on
 * the board). Cleared when the station is heard again, so each silence is announced once, by
 * whichever server process runs the job.
 */
export async function up(knex: Knex): Promise<void> {
  await knex.schema.alterTable('stations', (t) => {
    t.timestamp('silence_reported_at', { useTz: true });
  });
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.alterTable('stations', (t) => {
    t.dropColumn('silence_reported_at');
  });
}
