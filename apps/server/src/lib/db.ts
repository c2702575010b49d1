import knexFactory, { type Knex } from 'knex';
import { knexConfig } from '@chuckkey/db';
import type { Logger } from './logger';

export type Db = Knex;


/** Knex on PostgreSQL, its own warnings sent to the structured log instead of the console. */
export function createDb(databaseUrl: string, logger: Logger, max = 10): Db {
  return knexFactory({
    ...knexConfig(databaseUrl, { min: 0, max }),
    log: {
      warn: (message: unknown) => logger.warn({ detail: String(message) }, 'database warning'),
      error: (message: unknown) => logger.error({ detail: String(message) }, 'database error'),
      deprecate: (method: string, alternative: string) => logger.warn({ method, alternative }, 'knex deprecation'),
      debug: (message: unknown) => logger.debug({ detail: String(message) }, 'database debug'),
    },
  });
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
