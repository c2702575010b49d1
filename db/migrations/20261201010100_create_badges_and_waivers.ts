import type { Knex } from 'knex';

export async function up(knex: Knex): Promise<void> {
  await knex.schema.createTable('badges', (t) => {
    t.uuid('id').primary().defaultTo(knex.raw('gen_random_uuid()'));
    t.uuid('member_id').notNullable().references('id').inTable('members').onDelete('CASCADE');
    // A scan is looked up by the code's SHA-256; the code itself is kept only encrypted with a
    // key outside the database (BADGE_SECRET), so a dump alone can neither forge nor print one.
    t.text('code_hash').notNullable().unique();
    t.text('code_encrypted').notNullable();
    t.timestamp('issued_at', { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.uuid('issued_by').references('id').inTable('members');
    t.timestamp('revoked_at', { useTz: true });
  });
  await knex.raw('create unique index badges_one_active_per_member on badges (member_id) where revoked_at is null');

  await knex.schema.alterTable('members', (t) => {
    t.text('pin_hash');
  });

  await knex.schema.createTable('member_photos', (t) => {
    t.uuid('member_id').primary().references('id').inTable('members').onDelete('CASCADE');
    t.binary('image').notNullable();
    t.text('content_type').notNullable();
    t.timestamp('updated_at', { useTz: true }).notNullable().defaultTo(knex.fn.now());
  });

  await knex.schema.createTable('waiver_versions', (t) => {
    t.integer('version').primary();
    t.text('title').notNullable();
    t.text('body').notNullable();
    t.timestamp('published_at', { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.uuid('published_by').references('id').inTable('members');
  });

  await knex.schema.createTable('waiver_records', (t) => {
    t.uuid('id').primary().defaultTo(knex.raw('gen_random_uuid()'));
    t.uuid('member_id').notNullable().references('id').inTable('members').onDelete('CASCADE');
    t.integer('version').notNullable().references('version').inTable('waiver_versions');
    t.text('method').notNullable();
    t.text('typed_name');
    t.timestamp('recorded_at', { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.uuid('recorded_by').notNullable().references('id').inTable('members');
    t.binary('scan');
    t.text('scan_type');
    t.check("method in ('accepted_online', 'uploaded_scan')", [], 'waiver_records_method_known');
    t.check("(method = 'accepted_online') = (typed_name is not null)", [], 'waiver_records_online_has_name');
    t.check("(method = 'uploaded_scan') = (scan is not null and scan_type is not null)", [], 'waiver_records_scan_has_file');
    t.index(['member_id', 'version']);
  });

  await knex.schema.createTable('stations', (t) => {
    t.uuid('id').primary().defaultTo(knex.raw('gen_random_uuid()'));
    t.text('kind').notNullable();
    // Null for the crib station and for boards.
    t.uuid('machine_id').references('id').inTable('machines').onDelete('CASCADE');
    t.text('name').notNullable();
    t.text('pairing_code_hash');
    t.timestamp('pairing_expires_at', { useTz: true });
    t.text('device_token_hash').unique();
    t.timestamp('paired_at', { useTz: true });
    t.timestamp('revoked_at', { useTz: true });
    t.timestamp('last_seen_at', { useTz: true });
    t.uuid('created_by').references('id').inTable('members');
    t.timestamp('created_at', { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.check("kind in ('machine', 'crib', 'board')", [], 'stations_kind_known');
    t.check("(kind = 'machine') = (machine_id is not null)", [], 'stations_machine_kind_has_machine');
  });
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.dropTable('stations');
  await knex.schema.dropTable('waiver_records');
  await knex.schema.dropTable('waiver_versions');
  await knex.schema.dropTable('member_photos');
  await knex.schema.alterTable('members', (t) => {
    t.dropColumn('pin_hash');
  });
  await knex.schema.dropTable('badges');
}
