import type { Knex } from 'knex';

export async function up(knex: Knex): Promise<void> {
  // Reference data: the roles a person can have. Permissions per role live in packages/core.
  await knex.schema.createTable('roles', (t) => {
    t.text('name').primary();
    t.text('label').notNullable();
  });
  await knex('roles').insert([
    { name: 'member', label: 'Member' },
    { name: 'instructor', label: 'Instructor' },
    { name: 'admin', label: 'Admin' },
  ]);

  await knex.schema.createTable('members', (t) => {
    t.uuid('id').primary().defaultTo(knex.raw('gen_random_uuid()'));
    t.specificType('email', 'citext').notNullable().unique();
    t.text('first_name').notNullable();
    t.text('last_name').notNullable();
    t.text('role').notNullable().defaultTo('member').references('name').inTable('roles');
    t.text('password_hash');
    t.boolean('active').notNullable().defaultTo(true);
    t.timestamp('created_at', { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.timestamp('updated_at', { useTz: true }).notNullable().defaultTo(knex.fn.now());
  });
  await knex.raw(
    "create index members_search_idx on members using btree (lower(first_name || ' ' || last_name))",
  );

  await knex.schema.createTable('invitations', (t) => {
    t.uuid('id').primary().defaultTo(knex.raw('gen_random_uuid()'));
    t.specificType('email', 'citext').notNullable();
    t.text('first_name').notNullable();
    t.text('last_name').notNullable();
    t.text('role').notNullable().references('name').inTable('roles');
    t.text('token_hash').notNullable().unique();
    t.uuid('invited_by').notNullable().references('id').inTable('members');
    t.timestamp('expires_at', { useTz: true }).notNullable();
    t.timestamp('accepted_at', { useTz: true });
    t.timestamp('revoked_at', { useTz: true });
    t.timestamp('created_at', { useTz: true }).notNullable().defaultTo(knex.fn.now());
  });
  // At most one open invitation per address.
  await knex.raw(
    'create unique index invitations_one_open_per_email on invitations (email) where accepted_at is null and revoked_at is null',
  );

  await knex.schema.createTable('password_reset_tokens', (t) => {
    t.uuid('id').primary().defaultTo(knex.raw('gen_random_uuid()'));
    t.uuid('member_id').notNullable().references('id').inTable('members').onDelete('CASCADE');
    t.text('token_hash').notNullable().unique();
    t.timestamp('expires_at', { useTz: true }).notNullable();
    t.timestamp('used_at', { useTz: true });
    t.timestamp('created_at', { useTz: true }).notNullable().defaultTo(knex.fn.now());
  });

  // Failed and successful sign-ins, shared by every server process for throttling.
  await knex.schema.createTable('sign_in_attempts', (t) => {
    t.bigIncrements('id');
    t.specificType('email', 'citext').notNullable();
    t.specificType('ip', 'inet').notNullable();
    t.boolean('succeeded').notNullable();
    t.timestamp('attempted_at', { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.index(['email', 'attempted_at']);
    t.index(['ip', 'attempted_at']);
  });
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.dropTable('sign_in_attempts');
  await knex.schema.dropTable('password_reset_tokens');
  await knex.schema.dropTable('invitations');
  await knex.schema.dropTable('members');
  await knex.schema.dropTable('roles');
}
