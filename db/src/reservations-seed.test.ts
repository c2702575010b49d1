import knexFactory, { type Knex } from 'knex';
import { register } from 'tsx/esm/api';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createMachine } from '../factories';
import { seed } from '../seeds/09_reservations';
import { knexConfig } from './config';
import { dropDatabase, setupDatabase } from './setup';

// Knex imports migration files at run time; tsx lets this process import TypeScript.
register();

const url = process.env.DATABASE_URL;
if (!url) throw new Error('DATABASE_URL must name a database these tests may drop and create (npm test sets it).');

/** A database of this file's own, migrated without the rest of the demo: only machines are needed. */
const sibling = new URL(url);
sibling.pathname = `${sibling.pathname}_reservations_seed`;
const databaseUrl = sibling.toString();

let db: Knex;
beforeAll(async () => {
  await dropDatabase(databaseUrl);
  await setupDatabase(databaseUrl, { seed: false });
  db = knexFactory(knexConfig(databaseUrl, { min: 0, max: 2 }));
});
afterAll(async () => {
  await db?.destroy();
  await dropDatabase(databaseUrl);
});

describe('the demo shop’s reservable machines', () => {
  it('are the MIG welders and band saws, with the default booking rules; other machines stay walk-up only', async () => {
    const welder = await createMachine(db, { category: 'mig_welder' });
    const saw = await createMachine(db, { category: 'band_saw' });
    const lathe = await createMachine(db, { category: 'lathe' });

    await seed(db);

    const rows = await db('machines').whereIn('id', [welder.id, saw.id, lathe.id]).select('id', 'reservable', 'slot_minutes', 'check_in_minutes', 'no_show_grace_minutes');
    const byId = new Map(rows.map((row) => [row.id, row]));
    expect(byId.get(welder.id)).toMatchObject({ reservable: true, slot_minutes: 15, check_in_minutes: 10, no_show_grace_minutes: 15 });
    expect(byId.get(saw.id)).toMatchObject({ reservable: true });
    expect(byId.get(lathe.id)).toMatchObject({ reservable: false });
  });
});
