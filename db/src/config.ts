import path from 'node:path';
import { fileURLToPath } from 'node:url';
import type { Knex } from 'knex';
import pg from 'pg';

const here = path.dirname(fileURLToPath(import.meta.url));
export const migrationsDirectory = path.resolve(here, '../migrations');
export const seedsDirectory = path.resolve(here, '../seeds');

// Row values come back as JS numbers for bigint counts and numerics the app treats as numbers
// (meter hours, counts), never as strings.
pg.types.setTypeParser(pg.types.builtins.INT8, (v) => Number(v));
pg.types.setTypeParser(pg.types.builtins.NUMERIC, (v) => Number(v));

export function knexConfig(connectionString: string, pool: Knex.PoolConfig = { min: 0, max: 10 }): Knex.Config {
  return {
    client: 'pg',
    connection: connectionString,
    pool,
    acquireConnectionTimeout: 5_000,
    migrations: {
      directory: migrationsDirectory,
      tableName: 'knex_migrations',
      loadExtensions: ['.ts'],
    },
    seeds: {
      directory: seedsDirectory,
      loadExtensions: ['.ts'],
    },
  };
}
