import type { Knex } from 'knex';

/**
 * Maintenance: recurring tasks per machine, due every so many meter hours and/or every so many
 * days, and the record of each time one was done. A task is never deleted once it has history
 * (it is made inactive instead), and a completion is never edited: the machine's record outlives
 * the people and the settings of the day.
 */
export async function up(knex: Knex): Promise<void> {
  await knex.schema.createTable('maintenance_tasks', (t) => {
    t.uuid('id').primary().defaultTo(knex.raw('gen_random_uuid()'));
    t.uuid('machine_id').notNullable().references('id').inTable('machines').onDelete('CASCADE');
    t.text('name').notNullable();
    t.text('instructions').notNullable().defaultTo('');
    t.integer('every_hours');
    t.integer('every_days');
    t.boolean('blocking').notNullable().defaultTo(false);
    t.boolean('active').notNullable().defaultTo(true);
    // A task never done counts from when it was set up, at the machine's meter then.
    t.decimal('start_meter_hours', 10, 2).notNullable();
    t.timestamp('created_at', { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.check("btrim(name) <> ''", [], 'maintenance_tasks_name_given');
    t.check('every_hours is not null or every_days is not null', [], 'maintenance_tasks_has_interval');
    t.check('every_hours is null or every_hours > 0', [], 'maintenance_tasks_every_hours_positive');
    t.check('every_days is null or every_days > 0', [], 'maintenance_tasks_every_days_positive');
    t.check('start_meter_hours >= 0', [], 'maintenance_tasks_start_meter_not_negative');
    t.unique(['machine_id', 'name'], { indexName: 'maintenance_tasks_one_name_per_machine' });
  });

  await knex.schema.createTable('maintenance_completions', (t) => {
    t.bigIncrements('id').primary();
    t.uuid('task_id').notNullable().references('id').inTable('maintenance_tasks').onDelete('CASCADE');
    t.timestamp('done_at', { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.decimal('meter_hours', 10, 2).notNullable();
    // Kept as null if the person is deleted: the machine's history outlives their account.
    t.uuid('done_by').references('id').inTable('members').onDelete('SET NULL');
    t.text('note').notNullable().defaultTo('');
    t.check('meter_hours >= 0', [], 'maintenance_completions_meter_not_negative');
  });
  // The scan reads each task's latest completion: the first entry of this index per task.
  await knex.raw('create index maintenance_completions_latest on maintenance_completions (task_id, done_at desc, id desc)');

  // History is kept as it was written. The one change allowed is the database's own, clearing
  // the person when their account is deleted.
  await knex.raw(`
    create function maintenance_completions_unchanged() returns trigger language plpgsql as $$
    begin
      if new.task_id is distinct from old.task_id or new.done_at is distinct from old.done_at
        or new.meter_hours is distinct from old.meter_hours or new.note is distinct from old.note
        or (new.done_by is not null and new.done_by is distinct from old.done_by) then
        raise exception 'maintenance completions are never edited' using errcode = 'check_violation';
      end if;
      return new;
    end $$;
  `);
  await knex.raw(`
    create trigger maintenance_completions_unchanged before update on maintenance_completions
    for each row execute function maintenance_completions_unchanged()
  `);
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.dropTable('maintenance_completions');
  await knex.raw('drop function maintenance_completions_unchanged()');
  await knex.schema.dropTable('maintenance_tasks');
}
