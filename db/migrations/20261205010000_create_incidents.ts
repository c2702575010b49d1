import type { Knex } from 'knex';

/**
 * Incident reports: injuries, near misses and damage, with their photos and the admins'
 * follow-up notes. A report outlives the accounts of the people in it (SET NULL), and its notes
 * are a record: they are added, never rewritten.
 */
export async function up(knex: Knex): Promise<void> {
  await knex.schema.createTable('incidents', (t) => {
    t.uuid('id').primary().defaultTo(knex.raw('gen_random_uuid()'));
    t.timestamp('occurred_at', { useTz: true }).notNullable();
    t.uuid('area_id').references('id').inTable('areas').onDelete('SET NULL');
    t.text('location');
    t.uuid('machine_id').references('id').inTable('machines').onDelete('SET NULL');
    t.text('kind').notNullable();
    t.text('description').notNullable();
    t.text('first_aid');
    t.uuid('reported_by').references('id').inTable('members').onDelete('SET NULL');
    t.timestamp('reported_at', { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.text('status').notNullable().defaultTo('open');
    t.timestamp('updated_at', { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.check("kind in ('injury', 'near_miss', 'damage')", [], 'incidents_kind_known');
    t.check("status in ('open', 'under_review', 'closed')", [], 'incidents_status_known');
    t.check("btrim(description) <> ''", [], 'incidents_description_given');
    // Where it happened: a shop area, words of the reporter's own, or both.
    t.check("area_id is not null or btrim(coalesce(location, '')) <> ''", [], 'incidents_place_given');
    t.index(['status', 'occurred_at']);
  });

  await knex.schema.createTable('incident_photos', (t) => {
    t.uuid('incident_id').notNullable().references('id').inTable('incidents').onDelete('CASCADE');
    // 1–5: the primary key and this check together keep a report to five photos.
    t.smallint('position').notNullable();
    t.binary('image').notNullable();
    t.text('content_type').notNullable();
    t.integer('size').notNullable();
    t.primary(['incident_id', 'position']);
    t.check('position between 1 and 5', [], 'incident_photos_at_most_five');
    t.check("content_type in ('image/jpeg', 'image/png')", [], 'incident_photos_type_known');
    t.check('size > 0 and size <= 10485760 and size = octet_length(image)', [], 'incident_photos_size_within_limit');
  });

  await knex.schema.createTable('incident_notes', (t) => {
    t.uuid('id').primary().defaultTo(knex.raw('gen_random_uuid()'));
    t.uuid('incident_id').notNullable().references('id').inTable('incidents').onDelete('CASCADE');
    t.uuid('author_id').references('id').inTable('members').onDelete('SET NULL');
    t.timestamp('at', { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.text('note').notNullable();
    t.check("btrim(note) <> ''", [], 'incident_notes_note_given');
    t.index(['incident_id', 'at']);
  });
  // A follow-up note is part of the record: refuse any change to its words, whoever asks. The
  // author may still become null when their account is deleted.
  await knex.raw(`
    create function incident_notes_keep_words() returns trigger language plpgsql as $$
    begin
      if new.note is distinct from old.note or new.at is distinct from old.at or new.incident_id is distinct from old.incident_id
        or (new.author_id is not null and new.author_id is distinct from old.author_id) then
        raise exception 'incident notes are never edited' using errcode = 'check_violation';
      end if;
      return new;
    end $$`);
  await knex.raw('create trigger incident_notes_never_edited before update on incident_notes for each row execute function incident_notes_keep_words()');
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.dropTable('incident_notes');
  await knex.raw('drop function incident_notes_keep_words()');
  await knex.schema.dropTable('incident_photos');
  await knex.schema.dropTable('incidents');
}
