import knexFactory from 'knex';
import { register } from 'tsx/esm/api';
import type { TestProject } from 'vitest/node';
import { dropDatabase, knexConfig, setupDatabase } from '@chuckkey/db';
import { createLogger } from '../lib/logger';
import { startMailCatcher } from '../modules/outbox/mail-catcher';

declare module 'vitest' {
  export interface ProvidedContext {
    databaseUrl: string;
    smtpUrl: string;
  }
}

/** A fresh database for the run: dropped, created and migrated; a mail catcher beside it. */
export default async function setup(project: TestProject) {
  // Knex loads migration files with import(); tsx lets this process import TypeScript.
  const unregister = register();
  const databaseUrl = process.env.DATABASE_URL;
  if (!databaseUrl) throw new Error('DATABASE_URL must name a database the server tests may drop and create (npm test sets it).');
  await dropDatabase(databaseUrl);
  await setupDatabase(databaseUrl, { seed: false });
  await unregister();

  const db = knexFactory(knexConfig(databaseUrl, { min: 0, max: 2 }));
  // Set-up leaves a plain shop record; the tests expect their own.
  await db('shop').where({ id: 1 }).update({ name: 'Test Shop', town: 'Testville', time_zone: 'UTC' });
  const catcher = await startMailCatcher({ db, logger: createLogger('silent'), port: 0 });

  project.provide('databaseUrl', databaseUrl);
  project.provide('smtpUrl', catcher.url);

  return async () => {
    await catcher.close();
    await db.destroy();
  };
}
