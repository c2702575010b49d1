import type { Knex } from 'knex';

/**
 * The table of @socket.io/postgres-adapter, which carries live updates between server processes
 * with NOTIFY: a message too large for a notification (8,000 bytes) or holding binary data is
 * stored here and only its id is notified. The adapter deletes rows older than 30 seconds. Made by
 * a migration rather than by the adapter at run time, like every other table.
 */
export async function up(knex: Knex): Promise<void> {
  await knex.schema.createTable('socket_io_attachments', (t) => {
    t.bigIncrements('id');
    t.timestamp('created_at', { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.binary('payload');
  });
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.dropTable('socket_io_attachments');
}
