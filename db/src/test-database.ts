import knexFactory, { type Knex } from 'knex';
import { register } from 'tsx/esm/api';
import { afterAll, beforeAll } from 'vitest';
import { knexConfig } from './config';
import { dropDatabase, setupDatabase } from './setup';

// Knex imports migration files at run time; tsx lets this process import TypeScript.
register();

/**
 * A migrated database of the calling test file's own, beside DATABASE_URL's (its name plus
 * `_<suffix>`), made before the file's tests and dropped after them; no demo data.
 * `ready` runs once it is migrated. Read `.db` inside tests.
 */
export function ownMigratedDatabase(suffix: string, ready?: (db: Knex) => Promise<void>): { readonly db: Knex } {
  const url = process.env.DATABASE_URL;
  if (!url) throw new Error('DATABASE_URL must name a database these tests may drop and create (npm test sets it).');
  const sibling = new URL(url);
  sibling.pathname = `${sibling.pathname}_${suffix}`;
  const databaseUrl = sibling.toString();
  let db: Knex | undefined;
  beforeAll(async () => {
    await dropDatabase(databaseUrl);
    await setupDatabase(databaseUrl, { seed: false });
    db = knexFactory(knexConfig(databaseUrl, { min: 0, max: 2 }));
    if (ready) await ready(db);
  });
  afterAll(async () => {
    await db?.destroy();
    await dropDatabase(databaseUrl);
  });
  return {
    get db() {
      if (!db) throw new Error('the test database is made in beforeAll; use it inside tests');
      return db;
    },
  };
}
