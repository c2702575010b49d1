import type { Knex } from 'knex';

/**
 * Classes: an instructor's (or admin's) hold of a machine for teaching, once or weekly. Each
 * occurrence is a reservation row of kind 'class' held by the instructor, so the reservations'
 * exclusion constraint keeps classes and members' reservations apart with no code of its own.
 */
export async function up(knex: Knex): Promise<void> {
  await knex.schema.createTable('classes', (t) => {
    t.uuid('id').primary().defaultTo(knex.raw('gen_random_uuid()'));
    t.text('title').notNullable();
    t.uuid('training_id').references('id').inTable('trainings').onDelete('SET NULL');
    t.uuid('machine_id').notNullable().references('id').inTable('machines').onDelete('CASCADE');
    t.uuid('instructor_id').notNullable().references('id').inTable('members').onDelete('CASCADE');
    t.timestamp('starts_at', { useTz: true }).notNullable();
    t.timestamp('ends_at', { useTz: true }).notNullable();
    t.integer('weeks').notNullable().defaultTo(1);
    // RFC 5545 RRULE of the series, kept so calendars and people read the same schedule; null when once.
    t.text('rrule');
    t.integer('capacity');
    t.timestamp('created_at', { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.timestamp('cancelled_at', { useTz: true });
    t.check('ends_at > starts_at', [], 'classes_end_after_start');
    t.check('weeks between 1 and 26', [], 'classes_weeks_range');
    t.check('(weeks = 1) = (rrule is null)', [], 'classes_rrule_when_repeating');
    t.check('capacity is null or capacity between 1 and 500', [], 'classes_capacity_range');
    t.check("length(btrim(title)) between 1 and 120", [], 'classes_title_length');
    t.index(['machine_id']);
  });

  await knex.schema.alterTable('reservations', (t) => {
    t.uuid('class_id').references('id').inTable('classes').onDelete('CASCADE');
    // A row of a class is a class hold. Not the converse: kind 'class' was allowed before classes
    // were kept, and a hold stored then has no class to name, so requiring one would fail here.
    t.check("class_id is null or kind = 'class'", [], 'reservations_class_kind');
  });
  // A class's meetings by start, of any status: a scan names each required training's next class
  // from the first entries after now per class of the training, so it stays a probe however many
  // meetings have gone by; a class's own page and its cancelling read its meetings here too.
  await knex.raw('create index reservations_class_start_idx on reservations (class_id, starts_at) where class_id is not null');
  // The wall board lists the next few class meetings of all classes, soonest first.
  await knex.raw(`
    create index reservations_class_upcoming_idx on reservations (starts_at)
    where class_id is not null and status in ('active', 'checked_in')
  `);
  await knex.raw('create index classes_training_idx on classes (training_id) where training_id is not null and cancelled_at is null');

  await knex.schema.createTable('class_members', (t) => {
    t.uuid('class_id').notNullable().references('id').inTable('classes').onDelete('CASCADE');
    t.uuid('member_id').notNullable().references('id').inTable('members').onDelete('CASCADE');
    t.uuid('added_by').references('id').inTable('members').onDelete('SET NULL');
    t.timestamp('added_at', { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.primary(['class_id', 'member_id']);
    // A member's own classes, for their list, their calendar feed and the scan's rule 6.
    t.index(['member_id']);
  });
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.dropTable('class_members');
  // Class holds cannot outlive their classes: without class_id they would break the kind check's meaning.
  await knex('reservations').where({ kind: 'class' }).delete();
  await knex.raw('drop index reservations_class_upcoming_idx');
  await knex.raw('drop index reservations_class_start_idx');
  await knex.schema.alterTable('reservations', (t) => {
    t.dropChecks(['reservations_class_kind']);
    t.dropColumn('class_id');
  });
  await knex.schema.dropTable('classes');
}
