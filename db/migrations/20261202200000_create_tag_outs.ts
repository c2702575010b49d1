import type { Knex } from 'knex';

/**
 * Tag-outs: a machine taken out of service, with the reason and who reported it. A tag-out stays
 * open until it is cleared; clearance rule 4 refuses the machine while one is open, and the wall
 * board shows its reason.
 */
export async function up(knex: Knex): Promise<void> {
  await knex.schema.createTable('tag_outs', (t) => {
    t.uuid('id').primary().defaultTo(knex.raw('gen_random_uuid()'));
    t.uuid('machine_id').notNullable().references('id').inTable('machines').onDelete('CASCADE');
    t.text('reason').notNullable();
    // Kept as null if the person is deleted: the machine's history outlives their account.
    t.uuid('reported_by').references('id').inTable('members').onDelete('SET NULL');
    t.timestamp('reported_at', { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.timestamp('cleared_at', { useTz: true });
    t.uuid('cleared_by').references('id').inTable('members').onDelete('SET NULL');
    t.text('clear_note');
    t.check("btrim(reason) <> ''", [], 'tag_outs_reason_given');
    t.check('cleared_at is null or cleared_at >= reported_at', [], 'tag_outs_cleared_after_reported');
    t.check('cleared_at is not null or (cleared_by is null and clear_note is null)', [], 'tag_outs_open_has_no_clearing');
    t.index(['machine_id', 'reported_at']);
  });
  // At most one open tag-out per machine, whatever races between requests or processes; the scan
  // and the board find the open one through it.
  await knex.raw('create unique index tag_outs_one_open_per_machine on tag_outs (machine_id) where cleared_at is null');
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.dropTable('tag_outs');
}
