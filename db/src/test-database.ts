import knexFactory, { type Knex } from 'knex';
import { register } from 'tsx/esm/api';
import { afterAll, beforeAll } from 'vitest';
import { knexConfig } from './config';
import { dropDatabase, setupDatabase } from './setup';

// Knex imports migration files at run time; tsx lets this process import TypeScript.
register();

export interface OwnDatabaseOptions {
  /** Seed the demo shop as `npm start` does (default: migrations only). */
  seed?: boolean;
  /** Environment variables set (or, when undefined, unset) while the database is set up. */
  env?: Record<string, string | undefined>;
  /** Runs once the database is set up. */
  ready?: (db: Knex) => Promise<void>;
}

/** Sets the variables for the length of `work`, then puts back what was there. */
async function withEnv<T>(env: Record<string, string | undefined>, work: () => Promise<T>): Promise<T> {
  const before = Object.fromEntries(Object.keys(env).map((name) => [name, process.env[name]]));
  const put = (values: Record<string, string | undefined>) => {
    for (const [name, value] of Object.entries(values)) {
      if (value === undefined) delete process.env[name];
      else process.env[name] = value;
    }
  };
  put(env);
  try {
    return await work();
  } finally {
    put(before);
  }
}

/**
 * A database of the calling test file's own, beside DATABASE_URL's (its name plus `_<suffix>`),
 * made before the file's tests and dropped after them: migrated, and seeded with the demo shop
 * when asked. Read `.db` inside tests.
 */
export function ownDatabase(suffix: string, options: OwnDatabaseOptions = {}): { readonly db: Knex } {
  const url = process.env.DATABASE_URL;
  if (!url) throw new Error('DATABASE_URL must name a database these tests may drop and create (npm test sets it).');
  const sibling = new URL(url);
  sibling.pathname = `${sibling.pathname}_${suffix}`;
  const databaseUrl = sibling.toString();
  let db: Knex | undefined;
  beforeAll(async () => {
    await dropDatabase(databaseUrl);
    await withEnv(options.env ?? {}, () => setupDatabase(databaseUrl, { seed: options.seed ?? false }));
    db = knexFactory(knexConfig(databaseUrl, { min: 0, max: 2 }));
    if (options.ready) await options.ready(db);
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

/** A migrated database of the calling test file's own with no demo data; `ready` runs once it is migrated. */
export function ownMigratedDatabase(suffix: string, ready?: (db: Knex) => Promise<void>): { readonly db: Knex } {
  return ownDatabase(suffix, { ready });
}
