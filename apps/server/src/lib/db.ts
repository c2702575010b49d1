import knexFactory, { type Knex } from 'knex';
import { knexConfig } from '@chuckkey/db';

export type Db = Knex;

export function createDb(databaseUrl: string): Db {
  return knexFactory(knexConfig(databaseUrl, { min: 0, max: 10 }));
}

/** True when PostgreSQL answers within the time limit. */
export async function databaseIsUp(db: Db, timeoutMs = 2_000): Promise<boolean> {
  try {
    await db.raw('select 1').timeout(timeoutMs, { cancel: false });
    return true;
  } catch {
    return false;
  }
}
