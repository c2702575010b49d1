import knexFactory, { type Knex } from 'knex';
import { knexConfig } from './config';

export async function isSeeded(db: Knex): Promise<boolean> {
  const row = await db('shop').count<{ count: number }[]>({ count: '*' }).first();
  return Number(row?.count ?? 0) > 0;
}

function maintenanceUrl(connectionString: string): { url: string; name: string } {
  const url = new URL(connectionString);
  const name = decodeURIComponent(url.pathname.replace(/^\//, ''));
  if (!name) throw new Error('DATABASE_URL names no database.');
  url.pathname = '/postgres';
  return { url: url.toString(), name };
}

/** Drops the database named in the URL, if it exists (for test databases only). */
export async function dropDatabase(connectionString: string): Promise<void> {
  const { url, name } = maintenanceUrl(connectionString);
  const admin = knexFactory(knexConfig(url, { min: 0, max: 1 }));
  try {
    await admin.raw('drop database if exists ?? with (force)', [name]);
  } finally {
    await admin.destroy();
  }
}

/** Creates the database named in the URL when it does not exist yet (connecting to `postgres`). */
export async function ensureDatabaseExists(connectionString: string): Promise<void> {
  const { url, name } = maintenanceUrl(connectionString);
  const admin = knexFactory(knexConfig(url, { min: 0, max: 1 }));
  try {
    const found = await admin.raw('select 1 from pg_database where datname = ?', [name]);
    if (found.rows.length === 0) {
      await admin.raw('create database ??', [name]);
    }
  } finally {
    await admin.destroy();
  }
}

export interface SetupResult {
  migrations: string[];
  seeded: boolean;
}

/** Runs pending migrations, then loads the demo shop if the database has no shop yet. */
export async function setupDatabase(
  connectionString: string,
  options: { seed: boolean; log?: (line: string) => void },
): Promise<SetupResult> {
  const log = options.log ?? (() => {});
  await ensureDatabaseExists(connectionString);
  const db = knexFactory(knexConfig(connectionString, { min: 0, max: 2 }));
  try {
    const [, applied] = (await db.migrate.latest()) as [number, string[]];
    log(applied.length ? `applied ${applied.length} migration(s)` : 'schema is up to date');
    let seeded = false;
    if (options.seed && !(await isSeeded(db))) {
      log('loading the demo shop');
      await db.seed.run();
      seeded = true;
    } else if (options.seed) {
      log('demo shop already loaded; keeping its data');
    }
    // The server needs its shop row (name, time zone); a database set up without the demo
    // gets a plain one that admins rename.
    const inserted = await db('shop')
      .insert({ id: 1, name: 'Metal shop', town: '', time_zone: 'UTC' })
      .onConflict('id')
      .ignore()
      .returning('id');
    if (inserted.length) log('created the shop record (name "Metal shop", time zone UTC)');
    return { migrations: applied, seeded };
  } finally {
    await db.destroy();
  }
}
