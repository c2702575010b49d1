import type { Knex } from 'knex';

// When the holder gave the rest of a checked-in reservation back. Like a cancellation, the status
// and its time go together, so a release can never be recorded without saying when.
export async function up(knex: Knex): Promise<void> {
  await knex.schema.alterTable('reservations', (t) => {
    t.timestamp('released_at', { useTz: true });
    t.check("(status = 'released') = (released_at is not null)", [], 'reservations_released_has_time');
  });
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.alterTable('reservations', (t) => {
    t.dropChecks('reservations_released_has_time');
    t.dropColumn('released_at');
  });
}
